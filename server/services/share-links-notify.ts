/**
 * Keeps every process's share-link cache true: one PostgreSQL connection per
 * process LISTENs on the channel the triggers of migration 20261203183000
 * notify, and each notice drops the cache entries it names. When the
 * connection drops, caching stops (every open reads the database) until it is
 * back, with retries.
 */
import pg from 'pg'
import type { Logger } from 'pino'
import type { ShareOpens } from './share-links-open'

export const SHARE_LINK_CHANNEL = 'chimeline_share_links'

export interface ShareLinkListener {
  close(): Promise<void>
}

const RETRY_MS = { first: 500, max: 30_000 }

/** `name` is the connection's application_name, as pg_stat_activity shows it. */
export async function listenForShareLinkChanges(databaseUrl: string, opens: ShareOpens, logger: Logger, name = 'chimeline share-link notices'): Promise<ShareLinkListener> {
  let client: pg.Client | null = null
  let closed = false
  let retryMs = RETRY_MS.first
  let retry: NodeJS.Timeout | null = null

  const lost = (c: pg.Client, err?: unknown) => {
    if (client !== c) return
    client = null
    opens.setListening(false)
    c.end().catch(() => undefined)
    if (closed) return
    logger.warn({ err }, `share link change notices lost; caching stops, retrying in ${retryMs} ms`)
    retry = setTimeout(() => void connect(), retryMs)
    retry.unref()
    retryMs = Math.min(retryMs * 2, RETRY_MS.max)
  }

  async function connect(): Promise<void> {
    retry = null
    const c = new pg.Client({ connectionString: databaseUrl, keepAlive: true, application_name: name })
    client = c
    c.on('notification', (msg) => {
      if (msg.channel === SHARE_LINK_CHANNEL) opens.invalidate(msg.payload ?? '*')
    })
    c.on('error', (err) => lost(c, err))
    c.on('end', () => lost(c))
    try {
      await c.connect()
      await c.query(`LISTEN ${SHARE_LINK_CHANNEL}`)
      if (client !== c) return
      retryMs = RETRY_MS.first
      opens.setListening(true)
    } catch (err) {
      lost(c, err)
    }
  }

  await connect()
  return {
    async close() {
      closed = true
      if (retry) clearTimeout(retry)
      const c = client
      client = null
      opens.setListening(false)
      await c?.end().catch(() => undefined)
    },
  }
}
