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
/** Points a job carries: small enough that a cancel is seen soon, large enough that queue overhead stays small. */
export const SWEEP_CHUNK_POINTS = 16

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
  /** Queues the points in chunks of SWEEP_CHUNK_POINTS taken along `order` (shared/sweep/order.ts: one program's points together, so that a worker prepares it once). */
  enqueue(sweepId: string, order: readonly number[]): Promise<void>
  close(): Promise<void>
}

export function createSweepQueue(databaseUrl: string): SweepQueue {
  let boss: Promise<PgBoss> | null = null
  return {
    async enqueue(sweepId, order) {
      const b = await (boss ??= startBoss(databaseUrl))
      const jobs: { name: string; data: SweepChunkJob }[] = []
      for (let start = 0; start < order.length; start += SWEEP_CHUNK_POINTS) jobs.push({ name: SWEEP_QUEUE, data: { sweepId, indexes: order.slice(start, start + SWEEP_CHUNK_POINTS) } })
      await b.insert(jobs)
    },
    async close() {
      if (boss) await (await boss).stop({ graceful: false, wait: true })
    },
  }
}
