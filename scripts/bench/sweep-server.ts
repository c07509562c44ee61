/**
 * `npm run bench:sweep:server`: the heavy grid of issue 16 (the
 * 1,000-instruction long stream, AVL = 8..256:8 x the three issue policies,
 * 96 points) on 1 and 2 sweep worker processes (`server/worker.ts`, pg-boss
 * on the test cluster, as `npm run worker` runs them), against the
 * single-thread engine rate measured in this process in the same run.
 *
 * Each process first runs one whole copy of the grid (another definition, so
 * that the timed sweep prepares its own programs), as a long-lived worker has
 * run sweeps before; this process does the same before its own timed runs.
 * The load of this shared machine moves within seconds, so each of ROUNDS
 * timed runs is compared with a single-thread run of the grid right before
 * it, and the median of those ratios is printed.
 * Two figures of efficiency (lane-cycles per second per worker over the
 * single-thread rate): from the moment the sweep is queued to the last point
 * (what a user waits for), and from the first chunk taken
 * to the last one finished (pg-boss's own start and completion times): the
 * workers' parallel work. The points must equal the single thread's.
 */
import type { ChildProcess } from 'node:child_process'
import { loadavg } from 'node:os'
import { isDeepStrictEqual } from 'node:util'
import { QueryTypes } from 'sequelize'
import { sweepDefinitionSchema, type SweepDefinition, type SweepPointResult } from '../../shared/schemas/sweep'
import { runSweep } from '../../shared/sweep/runSweep'
import { loadConfig } from '../../server/config'
import { databaseUrl, testCluster } from '../../server/db/cluster'
import { Sweep } from '../../server/models'
import { createRuntime } from '../../server/runtime'
import { seedDemo } from '../../server/services/demo-seed'
import { createSweep, getSweep } from '../../server/services/sweeps'
import { prepareCluster } from '../db'
import { startWorkerProcess } from '../worker-process'
import { heavyGrid } from './programs'
import { copyOf, laneCycles, resolveOrThrow } from './sweep-helpers'
import { median } from './median'

const TITLE = 'bench:sweep:server'
/** Timed runs per worker count, each right after its own single-thread yardstick. */
const ROUNDS = 5
const grid = sweepDefinitionSchema.parse(heavyGrid())
const fmt = (x: number, d = 2) => x.toFixed(d)

const url = await prepareCluster(testCluster)
const config = loadConfig({ ...process.env, NODE_ENV: 'test', DATABASE_URL: url, SMTP_URL: '', SMTP_SINK_PORT: '0', LOG_LEVEL: 'warn' })
const runtime = await createRuntime(config)
const { workspace, owner } = await seedDemo(runtime.ctx.sequelize)

/**
 * Queues a server sweep and waits for it: ms from queue to done, and from the
 * first chunk taken to the last finished. Both end at pg-boss's completion
 * time of the last chunk, not when this process sees the sweep done, so that
 * the poll below can be slow: at 25 ms, this process and the database it asks
 * took 4 to 18% of a core from the two workers.
 */
async function runOnWorkers(definition: SweepDefinition): Promise<{ wallMs: number; workingMs: number; points: SweepPointResult[] }> {
  const t0 = Date.now()
  const s = await createSweep(runtime.ctx, owner, workspace.id, { title: TITLE, runner: 'server', definition, scenarioId: null, versionId: null, points: [], status: 'done', message: null })
  for (;;) {
    const row = await Sweep.findByPk(s.id)
    if (row?.status === 'done') break
    if (row?.status !== 'queued' && row?.status !== 'running') throw new Error(`the sweep ended ${row?.status}: ${row?.message}`)
    await new Promise((r) => setTimeout(r, 250))
  }
  const [span] = await runtime.ctx.sequelize.query<{ workingMs: number; doneAt: number }>(
    `SELECT EXTRACT(EPOCH FROM max(completed_on) - min(started_on)) * 1000 AS "workingMs", EXTRACT(EPOCH FROM max(completed_on)) * 1000 AS "doneAt"
     FROM pgboss.job WHERE name = 'sweep-chunks' AND data->>'sweepId' = :id`,
    { replacements: { id: s.id }, type: QueryTypes.SELECT },
  )
  const { points } = await getSweep(runtime.ctx, workspace.id, s.id)
  return { wallMs: Number(span?.doneAt ?? 0) - t0, workingMs: Number(span?.workingMs ?? 0), points }
}

const children: ChildProcess[] = []
try {
  const sweep = resolveOrThrow(grid)
  runSweep(resolveOrThrow(copyOf(grid, 2)))
  /** The single-thread rate, timed right before each worker run: the shared machine's load moves within seconds. */
  const singleRate = (): { s: number; rate: number; points: SweepPointResult[] } => {
    const t0 = performance.now()
    const { points } = runSweep(sweep)
    const s = (performance.now() - t0) / 1000
    return { s, rate: laneCycles(points) / s, points }
  }
  const loadBefore = loadavg()[0] ?? 0
  console.log('| runner | round | single thread s | wall s (queue to done) | working s (first chunk to last) | lane-cycles/s per worker | efficiency (queue to done) | efficiency (working) |')
  console.log('| --- | ---: | ---: | ---: | ---: | ---: | ---: | ---: |')
  const medians: string[] = []
  for (const [k, workers] of [1, 2].entries()) {
    while (children.length < workers) children.push(await startWorkerProcess(databaseUrl(testCluster)))
    // Warm every process, the new one included: each takes chunks of a copy until the copy is done.
    await runOnWorkers(copyOf(grid, 3 + k))
    const ratios: number[] = []
    for (let round = 1; round <= ROUNDS; round++) {
      const single = singleRate()
      const r = await runOnWorkers(grid)
      if (!isDeepStrictEqual(r.points, single.points)) throw new Error(`the points of ${workers} worker processes differ from the single thread's`)
      const perWorker = (ms: number) => laneCycles(r.points) / (ms / 1000) / workers
      ratios.push(perWorker(r.workingMs) / single.rate)
      const runner = `${workers} worker process${workers > 1 ? 'es' : ''}`
      console.log(`| ${runner} | ${round} | ${fmt(single.s)} | ${fmt(r.wallMs / 1000)} | ${fmt(r.workingMs / 1000)} | ${fmt(perWorker(r.workingMs) / 1e6)} M | ${fmt(perWorker(r.wallMs) / single.rate)} | ${fmt(perWorker(r.workingMs) / single.rate)} |`)
    }
    medians.push(`${workers} worker process${workers > 1 ? 'es' : ''}: median working efficiency ${fmt(median(ratios))}`)
  }
  console.log(`\n${medians.join('\n')}`)
  console.log(`\nload average (1 min): ${fmt(loadBefore)} before, ${fmt(loadavg()[0] ?? 0)} after`)
} finally {
  for (const c of children) c.kill('SIGTERM')
  await Sweep.destroy({ where: { title: TITLE } })
  await runtime.close()
}
