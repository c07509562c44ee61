/**
 * The server sweeps' job queue: pg-boss on the app's own PostgreSQL. A sweep
 * is queued as chunks of point indexes, one job each; worker processes
 * (server/worker.ts) take them. A job whose worker dies is retried once its
 * expiry passes; points are written once per (sweep, index), so a retried
 * chunk adds nothing twice. pg-boss starts on the first use, so a process
 * that never queues a sweep runs none of its maintenance.
 */
import PgBoss from 'pg-boss'

export const SWEEP_QUEUE = 'sweep-chunks'
/**
 * PostgreSQL NOTIFY channel raised once a sweep's chunks are queued: an idle
 * worker LISTENs and fetches at once instead of at its next poll (pg-boss
 * polls every 0.5 s at the most often; polling still covers a lost listener).
 */
export const SWEEP_QUEUED_CHANNEL = 'chimeline_sweep_chunks'
/** The most points a job carries: a cancel is seen soon. */
const SWEEP_CHUNK_POINTS = 16

/**
 * Points a job carries for a sweep of `points`: about a 16th of the sweep, so
 * that two or more workers end close together (the heavy grid's 96 points in
 * six chunks of 16 left one worker idle for most of the last, up to 0.45 s;
 * a 32nd, one program a chunk there, measured no better: each chunk costs
 * the queue a few queries), at most SWEEP_CHUNK_POINTS.
 */
export const serverChunkSize = (points: number) => Math.max(1, Math.min(SWEEP_CHUNK_POINTS, Math.ceil(points / 16)))

export interface SweepChunkJob {
  sweepId: string
  indexes: number[]
}

/** Starts pg-boss on the database and makes sure the sweep queue exists. */
export async function startBoss(databaseUrl: string): Promise<PgBoss> {
  const boss = new PgBoss({ connectionString: databaseUrl, max: 2 })
  await boss.start()
  if (!(await boss.getQueue(SWEEP_QUEUE))) {
    // A chunk is short; one whose worker died is taken again after 5 minutes, twice at most.
    await boss.createQueue(SWEEP_QUEUE, { name: SWEEP_QUEUE, retryLimit: 2, expireInSeconds: 300 })
  }
  return boss
}

export interface SweepQueue {
  /**
   * Queues the chunks, one job each (shared/sweep/order.ts chunkPrograms:
   * whole programs, so that a worker prepares each once), to be taken in the
   * order given: jobs inserted together share their creation time and take
   * random ids, so the order is set by their priorities.
   */
  enqueue(sweepId: string, chunks: readonly number[][]): Promise<void>
  close(): Promise<void>
}

export function createSweepQueue(databaseUrl: string): SweepQueue {
  let boss: Promise<PgBoss> | null = null
  return {
    async enqueue(sweepId, chunks) {
      const b = await (boss ??= startBoss(databaseUrl))
      await b.insert(chunks.map((indexes, k) => ({ name: SWEEP_QUEUE, data: { sweepId, indexes }, priority: chunks.length - k })))
      await b.getDb().executeSql(`NOTIFY ${SWEEP_QUEUED_CHANNEL}`, [])
    },
    async close() {
      if (boss) await (await boss).stop({ graceful: false, wait: true })
    },
  }
}
