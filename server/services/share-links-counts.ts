/**
 * Open counts of share links, gathered in memory and written in one
 * statement every few seconds and when the process stops, so an open costs
 * no database write. An open counted late is fine; the opens gathered since
 * the last write are lost if the process dies without stopping (a crash, a
 * kill -9): the README says so.
 */
import type { Logger } from 'pino'
import type { Sequelize } from 'sequelize'

export interface OpenCounter {
  /** Counts one open of the link now. */
  record(linkId: string): void
  /** Writes what was counted so far; a failed write keeps its counts for the next one. */
  flush(): Promise<void>
  /** Stops the timer and writes what is left. */
  close(): Promise<void>
}

/** Adds each link's count and moves its last open forward (never back: writes of two processes may cross). */
const FLUSH_SQL = `
UPDATE share_links AS sl
SET open_count = sl.open_count + v.n, last_opened_at = GREATEST(sl.last_opened_at, v.at)
FROM unnest($1::uuid[], $2::int[], $3::timestamptz[]) AS v(id, n, at)
WHERE sl.id = v.id`

interface Pending {
  n: number
  /** Time of the last open, ms since the epoch. */
  at: number
}

export function createOpenCounter(sequelize: Sequelize, logger: Logger, everyMs: number): OpenCounter {
  let counts = new Map<string, Pending>()
  // One write at a time, in order: a flush asked for during a write runs after it.
  let chain: Promise<void> = Promise.resolve()

  const add = (into: Map<string, Pending>, id: string, n: number, at: number) => {
    const p = into.get(id)
    if (p) {
      p.n += n
      p.at = Math.max(p.at, at)
    } else {
      into.set(id, { n, at })
    }
  }

  async function write(): Promise<void> {
    if (counts.size === 0) return
    const batch = counts
    counts = new Map()
    const ids: string[] = []
    const ns: number[] = []
    const ats: string[] = []
    for (const [id, p] of batch) {
      ids.push(id)
      ns.push(p.n)
      ats.push(new Date(p.at).toISOString())
    }
    try {
      await sequelize.query(FLUSH_SQL, { bind: [ids, ns, ats] })
    } catch (err) {
      for (const [id, p] of batch) add(counts, id, p.n, p.at)
      logger.warn({ err, links: batch.size }, 'share link open counts not written; kept for the next flush')
    }
  }

  const flush = () => (chain = chain.then(write))
  const timer = everyMs > 0 ? setInterval(() => void flush(), everyMs) : null
  // The timer alone must not keep a process alive; close() writes the rest.
  timer?.unref()

  return {
    record(linkId) {
      add(counts, linkId, 1, Date.now())
    },
    flush,
    async close() {
      if (timer) clearInterval(timer)
      await flush()
    },
  }
}
