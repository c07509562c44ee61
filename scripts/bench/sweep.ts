/**
 * `npm run bench:sweep`: the sweeps of issue 16 on this machine, in Node.
 *   - the vl curve: 64 vfmacc.vv at e64, AVL = 1..256 x issue = serial,staggered (512 points);
 *   - the accumulator curve: one vfredusum.vs, AVL = 8..256:8 x reductionAccumulators = 1,2,4,8 (128 points);
 *   - the heavy grid: the 1,000-instruction long stream, AVL = 8..256:8 x the three issue policies (96 points).
 * Each runs on one thread in this process (the yardstick: lane-cycles per
 * second of the single-thread engine, measured in the same run), then on 1
 * and 2 worker threads as the CLI runs it. The process and the threads are
 * warmed (each runs four points of the grid's program, warmUpOf) before the
 * clock starts, as the server's long-lived workers are; the threads' start-up
 * is printed apart. Parallel
 * efficiency = lane-cycles per second per worker / the single-thread rate. Figures vary with the load
 * of the shared machine (printed); the ratios measured in one run less so.
 * The threads' figures must equal the single thread's, point by point.
 */
import { loadavg } from 'node:os'
import { isDeepStrictEqual } from 'node:util'
import { defaultMachine } from '../../shared/schemas/machine'
import { sweepDefinitionSchema, type SweepDefinition, type SweepPointResult } from '../../shared/schemas/sweep'
import { resolveSweep, type ResolvedSweep } from '../../shared/sweep/resolve'
import { runSweep } from '../../shared/sweep/runSweep'
import { runOnPool, startSweepThreads } from '../../server/cli/sweepThreads'
import { FMA_CURVE, REDUCTION_CURVE } from '../../tests/sweep/programs'
import { longStream } from './programs'

/** The long stream; its vector length is the symbol AVL (`.equ AVL, 256` in examples/long-stream.s). */
const LONG_STREAM_AVL = longStream()

const GRIDS: { name: string; definition: SweepDefinition }[] = [
  { name: 'vl curve (512 points)', definition: sweepDefinitionSchema.parse({ program: FMA_CURVE, parameters: [{ path: 'AVL', spec: '1..256' }, { path: 'issue', spec: 'serial,staggered' }] }) },
  { name: 'accumulator curve (128 points)', definition: sweepDefinitionSchema.parse({ program: REDUCTION_CURVE, parameters: [{ path: 'AVL', spec: '8..256:8' }, { path: 'reductionAccumulators', spec: '1,2,4,8' }] }) },
  { name: 'heavy grid (96 points)', definition: sweepDefinitionSchema.parse({ program: LONG_STREAM_AVL, parameters: [{ path: 'AVL', spec: '8..256:8' }, { path: 'issue', spec: 'serial,lockstep,staggered' }] }) },
]

/**
 * Points of a grid's own program at other vector lengths, run before the
 * clock starts, in this process and on each thread alike: the tsx loader
 * compiles the simulator and V8 optimises the code paths the grid takes. A
 * thread keeps only the programs of the definition it ran last, so the timed
 * grid prepares all of its own.
 */
const warmUpOf = (d: SweepDefinition): SweepDefinition => sweepDefinitionSchema.parse({ ...d, parameters: [{ path: 'AVL', spec: '12,36,60,84' }] })

const laneCycles = (points: SweepPointResult[]) => points.reduce((n, p) => n + (p.figures?.cycles ?? 0) * defaultMachine.lanes, 0)
const fmt = (x: number, d = 2) => x.toFixed(d)

function resolve(d: SweepDefinition): ResolvedSweep {
  const r = resolveSweep(d)
  if (!r.ok) throw new Error(r.issues.map((i) => i.message).join('; '))
  return r.sweep
}

const loadBefore = loadavg()[0] ?? 0
console.log('| sweep | runner | start-up s | wall s | first point ms | points/s | lane-cycles/s per worker | efficiency |')
console.log('| --- | --- | ---: | ---: | ---: | ---: | ---: | ---: |')
for (const g of GRIDS) {
  const sweep = resolve(g.definition)
  const warmUp = warmUpOf(g.definition)
  runSweep(resolve(warmUp))
  let first: number | null = null
  const t0 = performance.now()
  const single = runSweep(sweep, { onPoint: () => (first ??= performance.now() - t0) })
  const singleS = (performance.now() - t0) / 1000
  const failed = single.points.filter((p) => p.status !== 'ok')
  if (failed.length) throw new Error(`${g.name}: ${failed.length} points failed, e.g. ${failed[0]?.error?.message}`)
  const rate = laneCycles(single.points) / singleS
  console.log(`| ${g.name} | 1 thread in process | | ${fmt(singleS)} | ${fmt(first ?? 0, 0)} | ${fmt(single.points.length / singleS, 1)} | ${fmt(rate / 1e6)} M | 1 |`)
  for (const workers of [1, 2]) {
    const t0 = performance.now()
    const pool = startSweepThreads(workers)
    try {
      await Promise.all(Array.from({ length: workers }, () => pool.run({ definition: warmUp, indexes: [0, 1, 2, 3], deadline: Date.now() + 600_000 })))
      const t1 = performance.now()
      const threaded = await runOnPool(pool, workers, g.definition, sweep)
      const s = (performance.now() - t1) / 1000
      if (!isDeepStrictEqual(threaded.points, single.points)) throw new Error(`${g.name}: the ${workers}-thread figures differ from the single thread's`)
      const perWorker = laneCycles(threaded.points) / s / workers
      console.log(`| ${g.name} | ${workers} worker thread${workers > 1 ? 's' : ''} | ${fmt((t1 - t0) / 1000)} | ${fmt(s)} | | ${fmt(threaded.points.length / s, 1)} | ${fmt(perWorker / 1e6)} M | ${fmt(perWorker / rate)} |`)
    } finally {
      await pool.destroy()
    }
  }
}
console.log(`\nload average (1 min): ${fmt(loadBefore)} before, ${fmt(loadavg()[0] ?? 0)} after; start-up: starting the threads (tsx loader) and their four warm-up points, before the clock`)
