/**
 * `npm run bench:sweep`: the sweeps of issue 16 on this machine, in Node.
 *   - the vl curve: 64 vfmacc.vv at e64, AVL = 1..256 x issue = serial,staggered (512 points);
 *   - the accumulator curve: one vfredusum.vs, AVL = 8..256:8 x reductionAccumulators = 1,2,4,8 (128 points);
 *   - the heavy grid: the 1,000-instruction long stream, AVL = 8..256:8 x the three issue policies (96 points).
 * Each runs on one thread in this process (the yardstick: lane-cycles per
 * second of the single-thread engine, measured in the same run), then on 1
 * and 2 worker threads as the CLI runs it. The process and each thread first
 * run one whole untimed copy of the grid (copyOf), as the server's long-lived
 * workers have run sweeps before: V8 optimises code over the first second or
 * so of a thread's work, and after sixteen warm-up points two threads, each
 * with half the grid, still paid that cost twice over for one thread's once
 * (the two-copies check below, on threads warmed by the timed runs, gave
 * 1.95x where the split grid gave 1.2x). The threads' start-up (the tsx loader
 * and that copy) is printed apart. Parallel
 * efficiency = lane-cycles per second per worker / the single-thread rate. Figures vary with the load
 * of the shared machine (printed); the ratios measured in one run less so.
 * The threads' figures must equal the single thread's, point by point.
 */
import { loadavg } from 'node:os'
import { isDeepStrictEqual } from 'node:util'
import { sweepDefinitionSchema, type SweepDefinition } from '../../shared/schemas/sweep'
import { runSweep } from '../../shared/sweep/runSweep'
import { runOnPool, startSweepThreads } from '../../server/cli/sweepThreads'
import { FMA_CURVE, REDUCTION_CURVE } from '../../tests/sweep/programs'
import { heavyGrid } from './programs'
import { allPoints, copyOf, laneCycles, resolveOrThrow } from './sweep-helpers'

const GRIDS: { name: string; definition: SweepDefinition }[] = [
  { name: 'vl curve (512 points)', definition: sweepDefinitionSchema.parse({ program: FMA_CURVE, parameters: [{ path: 'AVL', spec: '1..256' }, { path: 'issue', spec: 'serial,staggered' }] }) },
  { name: 'accumulator curve (128 points)', definition: sweepDefinitionSchema.parse({ program: REDUCTION_CURVE, parameters: [{ path: 'AVL', spec: '8..256:8' }, { path: 'reductionAccumulators', spec: '1,2,4,8' }] }) },
  { name: 'heavy grid (96 points)', definition: sweepDefinitionSchema.parse(heavyGrid()) },
]

const WARM_UP = 2

const fmt = (x: number, d = 2) => x.toFixed(d)

/**
 * What two threads of this work get from the machine: each of the two runs the
 * whole grid at once (a definition with another point limit, so that neither
 * finds the programs the split run prepared), against one thread's time for
 * the grid alone. Their ratio bounds the two-thread efficiency whatever the
 * split: shared caches, memory and the host's cores, not the sweep's code.
 */
async function ceiling(pool: ReturnType<typeof startSweepThreads>, definition: SweepDefinition, oneThreadS: number): Promise<string> {
  const copy = copyOf(definition, 1)
  const indexes = allPoints(resolveOrThrow(copy))
  const t0 = performance.now()
  await Promise.all([0, 1].map(() => pool.run({ definition: copy, indexes, deadline: Date.now() + 600_000 })))
  const both = (performance.now() - t0) / 1000
  return `two whole copies at once ${fmt(both)} s against ${fmt(oneThreadS)} s for one: two threads get ${fmt((2 * oneThreadS) / both)}x one thread's rate, an efficiency ceiling of ${fmt(oneThreadS / both)}`
}
const ceilings: string[] = []

const loadBefore = loadavg()[0] ?? 0
console.log('| sweep | runner | start-up s | wall s | first point ms | points/s | lane-cycles/s per worker | efficiency |')
console.log('| --- | --- | ---: | ---: | ---: | ---: | ---: | ---: |')
for (const g of GRIDS) {
  const sweep = resolveOrThrow(g.definition)
  const warmUp = copyOf(g.definition, WARM_UP)
  const warmSweep = resolveOrThrow(warmUp)
  const warmIndexes = allPoints(warmSweep)
  runSweep(warmSweep)
  let first: number | null = null
  const t0 = performance.now()
  const single = runSweep(sweep, { onPoint: () => (first ??= performance.now() - t0) })
  const singleS = (performance.now() - t0) / 1000
  const failed = single.points.filter((p) => p.status !== 'ok')
  if (failed.length) throw new Error(`${g.name}: ${failed.length} points failed, e.g. ${failed[0]?.error?.message}`)
  const rate = laneCycles(single.points) / singleS
  console.log(`| ${g.name} | 1 thread in process | | ${fmt(singleS)} | ${fmt(first ?? 0, 0)} | ${fmt(single.points.length / singleS, 1)} | ${fmt(rate / 1e6)} M | 1 |`)
  let oneThreadS = 0
  for (const workers of [1, 2]) {
    const t0 = performance.now()
    const pool = startSweepThreads(workers)
    try {
      await Promise.all(Array.from({ length: workers }, () => pool.run({ definition: warmUp, indexes: warmIndexes, deadline: Date.now() + 600_000 })))
      const t1 = performance.now()
      const threaded = await runOnPool(pool, workers, g.definition, sweep)
      const s = (performance.now() - t1) / 1000
      if (!isDeepStrictEqual(threaded.points, single.points)) throw new Error(`${g.name}: the ${workers}-thread figures differ from the single thread's`)
      const perWorker = laneCycles(threaded.points) / s / workers
      console.log(`| ${g.name} | ${workers} worker thread${workers > 1 ? 's' : ''} | ${fmt((t1 - t0) / 1000)} | ${fmt(s)} | | ${fmt(threaded.points.length / s, 1)} | ${fmt(perWorker / 1e6)} M | ${fmt(perWorker / rate)} |`)
      if (workers === 1) oneThreadS = s
      else ceilings.push(`${g.name}: ${await ceiling(pool, g.definition, oneThreadS)}`)
    } finally {
      await pool.destroy()
    }
  }
}
console.log(`\n${ceilings.join('\n')}`)
console.log(`\nload average (1 min): ${fmt(loadBefore)} before, ${fmt(loadavg()[0] ?? 0)} after; start-up: starting the threads (tsx loader) and one whole copy of the grid on each, before the clock`)
