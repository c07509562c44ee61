/**
 * A sweep worker: takes chunks of server sweeps from the pg-boss queue, runs
 * their points with the shared point runner and writes each point once
 * (ON CONFLICT DO NOTHING), so a chunk retried after a worker died adds
 * nothing twice. A cancelled sweep's remaining chunks are dropped; a sweep
 * past its time limit is stopped with a message; the last point marks it done.
 */
import pg from 'pg'
import type PgBoss from 'pg-boss'
import type { Logger } from 'pino'
import { QueryTypes, type Sequelize } from 'sequelize'
import type { SweepPointResult } from '../shared/schemas/sweep'
import { resolveSweep } from '../shared/sweep/resolve'
import { createPointRunner } from '../shared/sweep/runPoint'
import { Sweep } from './models'
import { SWEEP_QUEUE, SWEEP_QUEUED_CHANNEL, startBoss, type SweepChunkJob } from './services/sweeps-queue'
import { insertPoints } from './services/sweeps'

/** How often a running chunk looks at its sweep's status (a cancel). */
const STATUS_CHECK_MS = 1000
/** How often a running chunk writes the points it has run (the client follows progress by them). */
const WRITE_EVERY_MS = 250

export interface SweepWorker {
  stop(): Promise<void>
}

async function runChunk(sequelize: Sequelize, runners: Map<string, ReturnType<typeof createPointRunner>>, job: SweepChunkJob, logger: Logger): Promise<void> {
  let sweep = await Sweep.findByPk(job.sweepId)
  if (!sweep || sweep.status === 'cancelled' || sweep.status === 'stopped') return
  if (sweep.status === 'queued') await Sweep.update({ status: 'running' }, { where: { id: sweep.id, status: 'queued' } })
  let runner = runners.get(sweep.id)
  if (!runner) {
    const resolved = resolveSweep(sweep.definition)
    if (!resolved.ok) {
      await sweep.update({ status: 'stopped', message: resolved.issues.map((i) => i.message).join('; ') })
      return
    }
    runner = createPointRunner(resolved.sweep)
    // One sweep's programs at a time per worker: chunks of one sweep come together.
    runners.clear()
    runners.set(sweep.id, runner)
  }
  const limitMs = sweep.definition.limits.timeLimitMs
  let checked = Date.now()
  // Points are written in batches at most WRITE_EVERY_MS apart, without waiting for one write's answer before running
  // the next point: an awaited INSERT a point was about a tenth of the heavy grid's time, and with two workers the
  // database's own work came out of theirs. The chunk ends once every write has landed.
  const writes: Promise<void>[] = []
  let failed: unknown = null
  let batch: SweepPointResult[] = []
  let wroteAt = Date.now()
  const send = () => {
    if (batch.length > 0) writes.push(insertPoints({ sequelize }, job.sweepId, batch).catch((e: unknown) => void (failed ??= e)))
    batch = []
    wroteAt = Date.now()
  }
  const written = async () => {
    send()
    await Promise.all(writes)
    if (failed) throw failed
  }
  for (const index of job.indexes) {
    if (Date.now() - checked > STATUS_CHECK_MS) {
      checked = Date.now()
      sweep = await Sweep.findByPk(job.sweepId)
      if (!sweep || sweep.status !== 'running') return written()
    }
    if (Date.now() - sweep.createdAt.getTime() > limitMs) {
      await written()
      await Sweep.update({ status: 'stopped', message: `the sweep reached its time limit of ${limitMs / 1000} s (counted from when it was queued); the points done are kept` }, { where: { id: job.sweepId, status: 'running' } })
      return
    }
    batch.push(runner.run(index))
    if (Date.now() - wroteAt >= WRITE_EVERY_MS) {
      send()
      // One turn of the event loop sends the write before the next point runs.
      await new Promise<void>((resolve) => setImmediate(resolve))
    }
  }
  await written()
  // Which process ran which chunk: operators spread workers over machines by these lines.
  logger.info({ sweep: job.sweepId, first: job.indexes[0], points: job.indexes.length, pid: process.pid }, 'chunk done')
  const [row] = await sequelize.query<{ n: string }>('SELECT count(*) AS n FROM sweep_points WHERE sweep_id = :id', { replacements: { id: job.sweepId }, type: QueryTypes.SELECT })
  if (Number(row?.n ?? 0) >= sweep.planned) {
    await Sweep.update({ status: 'done' }, { where: { id: job.sweepId, status: 'running' } })
    logger.info({ sweep: job.sweepId, points: sweep.planned }, 'sweep done')
  }
}

/** Starts taking chunks; the models must be bound to `sequelize` (connect()). */
export async function startSweepWorker(options: { databaseUrl: string; sequelize: Sequelize; logger: Logger }): Promise<SweepWorker> {
  const boss: PgBoss = await startBoss(options.databaseUrl)
  const runners = new Map<string, ReturnType<typeof createPointRunner>>()
  let workerId = ''
  workerId = await boss.work<SweepChunkJob>(SWEEP_QUEUE, { batchSize: 1, pollingIntervalSeconds: 0.5 }, async (jobs) => {
    for (const job of jobs) await runChunk(options.sequelize, runners, job.data, options.logger)
    // pg-boss waits out the rest of its polling interval after a job; a chunk often takes less than that, and the next
    // one waiting in the queue would wait with it (two workers spent a third of the heavy grid so). Fetch again at once.
    if (workerId) boss.notifyWorker(workerId)
  })
  // Woken when chunks are queued (sweeps-queue.ts); if the listener fails, pg-boss's polling still finds them.
  const listener = new pg.Client({ connectionString: options.databaseUrl })
  listener.on('error', (err) => options.logger.warn({ err }, 'the sweep queue listener failed; polling every 0.5 s'))
  listener.on('notification', () => boss.notifyWorker(workerId))
  await listener.connect()
  await listener.query(`LISTEN ${SWEEP_QUEUED_CHANNEL}`)
  return {
    async stop() {
      await listener.end().catch(() => undefined)
      await boss.stop({ graceful: true, wait: true, timeout: 10_000 })
    },
  }
}
