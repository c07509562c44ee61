/**
 * `npm run bench`: simulator speed against the machine itself, and memory.
 *   1. A bare per-cycle loop (bare-loop.ts: 6 banks arbitrated, 3 operand
 *      queues filled, an 8-stage pipeline shifted per lane) sets the yardstick
 *      in this very process; each workload's timing stage is measured in
 *      simulated lane-cycles per second as a ratio to that loop (issue 11:
 *      every workload >= 0.5). On a shared machine the load moves both by 2x
 *      within seconds, so each workload is timed in alternation with the loop
 *      (loop, workload, loop, workload, ...): the ratio is the workload's best
 *      run over the loop's best run of the same stretch, and beside it the
 *      median of the ratios of adjacent pairs, over WORKLOAD_RUNS pairs after
 *      WORKLOAD_WARMUP (the engine needs more warm-up than the loop). Each
 *      pair also times the workload as one Sweeps point does
 *      (timePreparedMetrics: no usage spans, no trace): "sweep point ratio",
 *      and the whole run without usage spans, for the "budget at the
 *      target" table (budget.ts): what a run may take at the target, and how
 *      its usage spans, the loop's work for the lanes it times and the rest of
 *      the model share it, beside the least usage trace of its own uses.
 *      Then the least model of the reductions (reduction-floor.ts: the same
 *      rules, written for that stream alone in typed arrays), timed the same
 *      way beside the loop, with the least usage recorder and without usage
 *      spans: how close any cycle-stepped model of those lanes gets to 0.5.
 *   2. The sweep API: set-up (prepareRun: assemble + execute) and one point
 *      (timePrepared) of the long stream, timed apart.
 *   3. Peak heap of a 100,000-instruction strip-mined run; target <= 256 MiB.
 *      Measured in a child process started with --expose-gc and
 *      --max-old-space-size=256, so that exceeding the target is also a crash.
 * Every figure is the median of several runs after a warm-up.
 */
import { spawnSync } from 'node:child_process'
import { loadavg } from 'node:os'
import { fileURLToPath } from 'node:url'
import { parseMachine, type Machine, type MachineInput } from '../../shared/schemas/machine'
import { prepareRun, timePrepared, timePreparedMetrics, type PreparedRun } from '../../shared/sim/run'
import { simulate } from '../../shared/sim/timing/simulate'
import type { TimingTrace } from '../../shared/sim/trace/types'
import { bareLoop } from './bare-loop'
import { budgetRow, leastTraceMs, timedLanes, usesOf } from './budget'
import { bankBound, examplePrograms, longStream, longStreamAt, memoryBound, REDUCTIONS, reductionHeavy } from './programs'
import { median } from './median'
import { reductionFloor } from './reduction-floor'

const RUNS = 7
const WARMUP = 2
/**
 * A workload's runs beside the loop: V8 reaches the engine's optimised code
 * only after 4 or 5 runs of the long stream (measured: 190, 160, 70, 35, 30,
 * then 25 to 30 ms), so 2 warm-ups left the early runs measuring the
 * compiler; sweeps time thousands of points in one warmed Worker.
 */
const WORKLOAD_RUNS = 15
const WORKLOAD_WARMUP = 5
/** Simulated cycles of one yardstick run: about as long as a workload's run. */
const BARE_CYCLES = 100_000
const TARGET_RATIO = 0.5
/** Replays (nothing, then the least usage trace) per workload, after warm-ups (budget.ts). */
const LEAST_TRACE_RUNS = 12
const LEAST_TRACE_WARMUP = 3

/** Median milliseconds of `fn` over RUNS runs after WARMUP. */
function timeIt(fn: () => void, runs = RUNS): number {
  const ms: number[] = []
  for (let i = 0; i < runs + WARMUP; i++) {
    const t0 = performance.now()
    fn()
    if (i >= WARMUP) ms.push(performance.now() - t0)
  }
  return median(ms)
}

function prepare(name: string, text: string, machine: Machine): PreparedRun {
  const p = prepareRun({ program: text }, { vlen: machine.vlen })
  if (!p.ok) throw new Error(`${name}: ${p.error.message}`)
  return p.prepared
}

interface Workload { name: string; text: string; machine: MachineInput }
const WORKLOADS: Workload[] = [
  { name: 'long stream, vl 256 (symmetric)', text: longStream(), machine: {} },
  { name: 'long stream, vl 250 (ragged)', text: longStreamAt(250), machine: {} },
  { name: 'reduction-heavy (1,000 vfredusum)', text: reductionHeavy(), machine: {} },
  { name: 'memory-bound (loads and stores)', text: memoryBound(), machine: {} },
  { name: 'bank-bound (4 FMAs, 4 banks)', text: bankBound(), machine: { rfBanks: 4 } },
]

interface Row { name: string; cycles: number; laneCycles: number; ms: number; rate: number }

interface PairedRow extends Row {
  /** The loop's best rate in the same stretch, the workload's best rate over it, and the median of adjacent pairs' ratios. */
  bareRate: number
  ratio: number
  pairedRatio: number
  /** The same workload timed as a Sweeps point (metrics only): its best rate over the loop's best. */
  pointRatio: number
  /** Lanes its run times (one per class of alike lanes), and medians of pairs: the loop's milliseconds, the run's, and the run's without usage spans. */
  timed: number
  bareMedianMs: number
  medianMs: number
  noUsageMs: number
  /** The least usage trace of the run's own uses (budget.ts). */
  leastUsageMs: number
}

/**
 * Alternates the bare loop with `parts`, timed one after another (loop,
 * parts, loop, parts, ...), over WORKLOAD_RUNS pairs after WORKLOAD_WARMUP,
 * so that the loop and the parts see the same load: the loop's milliseconds
 * and each part's, after the warm-ups.
 */
function besideLoop(lanes: number, parts: (() => void)[]): { bareMs: number[]; partMs: number[][] } {
  let sink = 0
  const bareMs: number[] = []
  const partMs = parts.map((): number[] => [])
  for (let i = 0; i < WORKLOAD_RUNS + WORKLOAD_WARMUP; i++) {
    const t0 = performance.now()
    sink += bareLoop(lanes, BARE_CYCLES)
    let t = performance.now()
    const kept = i >= WORKLOAD_WARMUP
    if (kept) bareMs.push(t - t0)
    for (let k = 0; k < parts.length; k++) {
      ;(parts[k] as () => void)()
      const now = performance.now()
      if (kept) (partMs[k] as number[]).push(now - t)
      t = now
    }
  }
  if (sink < 0) throw new Error('unreachable: keeps the loop alive')
  return { bareMs, partMs }
}

/** A part's rate over the loop's, for `laneCycles` of it against the loop's: best over best, and the median of adjacent pairs. */
function ratioToLoop(laneCycles: number, ms: number[], bareLaneCycles: number, bareMs: number[]): { ratio: number; pairedRatio: number } {
  const ratio = (m: number, bare: number) => laneCycles / m / (bareLaneCycles / bare)
  return { ratio: ratio(Math.min(...ms), Math.min(...bareMs)), pairedRatio: median(ms.map((m, i) => ratio(m, bareMs[i] as number))) }
}

function workloadRow(w: Workload, lanes: number): PairedRow {
  const machine = parseMachine(w.machine)
  const p = prepare(w.name, w.text, machine)
  // The last run's trace: its cycles, and the uses for the least usage trace (read after the timing).
  const last: { trace?: TimingTrace } = {}
  const { bareMs, partMs } = besideLoop(lanes, [
    () => {
      const r = simulate(p.stream, machine)
      if (r.error) throw new Error(`${w.name}: ${r.error.message}`)
      last.trace = r.trace
    },
    () => {
      // What runPoint (shared/sweep/runPoint.ts) times for one point of a sweep.
      const point = timePreparedMetrics(p, machine, { recordUsage: false })
      if (!point.ok) throw new Error(`${w.name} as a sweep point: ${point.error.message}`)
    },
    () => {
      // The same run without usage spans: what recording them costs in place (budget.ts).
      const noUsage = simulate(p.stream, machine, { recordUsage: false })
      if (noUsage.error) throw new Error(`${w.name} without usage spans: ${noUsage.error.message}`)
    },
  ])
  const [ms, pointMs, noUsageMs] = partMs as [number[], number[], number[]]
  const trace = last.trace as TimingTrace
  const cycles = trace.cycles
  const laneCycles = cycles * machine.lanes
  const bareLaneCycles = lanes * BARE_CYCLES
  const best = Math.min(...ms)
  const bareRate = bareLaneCycles / (Math.min(...bareMs) / 1000)
  const { ratio, pairedRatio } = ratioToLoop(laneCycles, ms, bareLaneCycles, bareMs)
  return {
    name: w.name, cycles, laneCycles, ms: best, rate: laneCycles / (best / 1000), bareRate, ratio, pairedRatio,
    pointRatio: ratioToLoop(laneCycles, pointMs, bareLaneCycles, bareMs).ratio,
    timed: timedLanes(p.stream, machine), bareMedianMs: median(bareMs), medianMs: median(ms), noUsageMs: median(noUsageMs),
    leastUsageMs: leastTraceMs(usesOf(trace), LEAST_TRACE_RUNS, LEAST_TRACE_WARMUP),
  }
}

/** The least model of the reductions beside the loop, timed and judged as workloadRow times a workload. */
function floorRow(lanes: number, recordUsage: boolean): { cycles: number; ms: number; ratio: number; pairedRatio: number } {
  let cycles = 0
  const { bareMs, partMs } = besideLoop(lanes, [() => (cycles = reductionFloor(defaults, REDUCTIONS, recordUsage).cycles)])
  const ms = partMs[0] as number[]
  return { cycles, ms: Math.min(...ms), ...ratioToLoop(cycles * defaults.lanes, ms, lanes * BARE_CYCLES, bareMs) }
}

function bareRow(lanes: number, cycles: number): Row {
  let sink = 0
  const ms = timeIt(() => (sink += bareLoop(lanes, cycles)))
  if (sink < 0) throw new Error('unreachable: keeps the loop alive')
  return { name: `bare loop (${lanes} lanes)`, cycles, laneCycles: lanes * cycles, ms, rate: (lanes * cycles) / (ms / 1000) }
}

interface HeapFigures { instructions: number; cycles: number; peakHeapMiB: number; retainedMiB: number; seconds: number; error?: string }

function heapRun(limitMiB: number): HeapFigures | { failed: string } {
  const script = fileURLToPath(new URL('./heap.ts', import.meta.url))
  const child = spawnSync(process.execPath, ['--expose-gc', `--max-old-space-size=${limitMiB}`, '--import', 'tsx', script], { encoding: 'utf8', maxBuffer: 64 * 1024 * 1024 })
  if (child.status === 0) return JSON.parse(child.stdout) as HeapFigures
  const oom = /heap out of memory|Allocation failed/.test(child.stderr)
  return { failed: oom ? `out of memory under a ${limitMiB} MiB heap` : `exit ${child.status ?? child.signal}: ${child.stderr.trim().split('\n').pop()}` }
}

/** Under the target's limit; when that fails, once more with room to spare, to report the real peak. */
function heap(): { within: HeapFigures | { failed: string }; unbounded?: HeapFigures | { failed: string } } {
  const within = heapRun(256)
  return 'failed' in within ? { within, unbounded: heapRun(4096) } : { within }
}

const fmt = (n: number, digits = 1) => n.toLocaleString('en-US', { maximumFractionDigits: digits })

function table(rows: string[][]): void {
  const widths = rows[0]!.map((_, c) => Math.max(...rows.map((r) => r[c]!.length)))
  for (const [i, r] of rows.entries()) {
    console.log(r.map((cell, c) => cell.padEnd(widths[c]!)).join('  '))
    if (i === 0) console.log(widths.map((w) => '-'.repeat(w)).join('  '))
  }
  console.log()
}

/**
 * Times every example and kernel three times before the workloads, so that
 * V8 has seen every instruction kind, as a Worker or server process that has
 * run a few programs has: the engine is measured as users get it, not as a
 * process that only ever timed one kind (docs/model.md "Speed").
 */
function mixedWarmUp(machine: Machine): number {
  const programs = examplePrograms().map((text, i) => prepare(`example ${i}`, text, machine))
  for (let k = 0; k < 3; k++) for (const p of programs) simulate(p.stream, machine)
  return programs.length
}

const loadBefore = loadavg()[0]!
const defaults = parseMachine({})
const mixed = mixedWarmUp(defaults)
const bare = bareRow(defaults.lanes, 500_000)
const rows = WORKLOADS.map((w) => workloadRow(w, defaults.lanes))
table([
  [`workload (timing stage alone, best of ${WORKLOAD_RUNS})`, 'cycles', 'time', 'lane-cycles/s', 'bare loop beside it', 'ratio', 'paired ratio (median)', `>= ${TARGET_RATIO}`, 'sweep point ratio'],
  [`${bare.name}, alone (median of ${RUNS})`, fmt(bare.cycles, 0), `${fmt(bare.ms)} ms`, `${fmt(bare.rate / 1e6)} M`, '', '', '', '', ''],
  ...rows.map((r) => [r.name, fmt(r.cycles, 0), `${fmt(r.ms)} ms`, `${fmt(r.rate / 1e6)} M`, `${fmt(r.bareRate / 1e6)} M`, fmt(r.ratio, 2), fmt(r.pairedRatio, 2), r.ratio >= TARGET_RATIO ? 'yes' : 'no', fmt(r.pointRatio, 2)]),
])

// How a run at the target would have to spend its time (budget.ts).
table([
  ['budget at the target (medians of the pairs)', 'timed lanes', 'run', 'at 0.5', 'usage spans in the run', 'the least usage trace', "the loop's work for the timed lanes", 'left at 0.5 for the rest', 'left with the least trace', 'the rest now'],
  ...rows.map((r) => {
    const b = budgetRow({ lanes: defaults.lanes, timed: r.timed, cycles: r.cycles, bareMs: r.bareMedianMs, bareLaneCycles: defaults.lanes * BARE_CYCLES, runMs: r.medianMs, noUsageMs: r.noUsageMs, leastUsageMs: r.leastUsageMs, target: TARGET_RATIO })
    const ms = (x: number) => `${fmt(x)} ms`
    return [r.name, String(r.timed), ms(r.medianMs), ms(b.atTarget), ms(b.usage), ms(r.leastUsageMs), ms(b.loopWork), ms(b.left), ms(b.leftLeast), ms(b.restNow)]
  }),
])

// The least model of the reductions (reduction-floor.ts) beside the engine's row.
const engineReductions = rows.find((r) => r.name.startsWith('reduction-heavy')) as PairedRow
table([
  [`1,000 vfredusum.vs, vl 256 (best of ${WORKLOAD_RUNS} beside the loop)`, 'cycles', 'time', 'ratio', 'paired ratio (median)', `>= ${TARGET_RATIO}`],
  ['the engine, usage spans recorded', fmt(engineReductions.cycles, 0), `${fmt(engineReductions.ms)} ms`, fmt(engineReductions.ratio, 2), fmt(engineReductions.pairedRatio, 2), engineReductions.ratio >= TARGET_RATIO ? 'yes' : 'no'],
  ...([true, false] as const).map((recordUsage) => {
    const f = floorRow(defaults.lanes, recordUsage)
    const label = recordUsage ? 'the least model, least usage recorder' : 'the least model, no usage spans'
    return [label, fmt(f.cycles, 0), `${fmt(f.ms)} ms`, fmt(f.ratio, 2), fmt(f.pairedRatio, 2), f.ratio >= TARGET_RATIO ? 'yes' : 'no']
  }),
])

// The sweep API on the long stream: one set-up, then one timing per point.
const setupMs = timeIt(() => prepare('long stream', longStream(), defaults), 3)
const prepared = prepare('long stream', longStream(), defaults)
const pointMs = timeIt(() => {
  if (!timePrepared(prepared, { lanes: 8 }).ok) throw new Error('long stream: timing failed')
}, 3)
table([
  ['sweep API, long stream', 'median'],
  ['set-up: prepareRun (assemble + execute)', `${fmt(setupMs)} ms`],
  ['one point: timePrepared (validate + time)', `${fmt(pointMs)} ms`],
])

const h = heap()
const heapRow = (x: HeapFigures | { failed: string }, label: string, judge: boolean) =>
  'failed' in x
    ? ['peak heap' + label, '100,000-instruction strip-mined run', x.failed, '<= 256 MiB', 'no']
    : ['peak heap' + label, `${fmt(x.instructions, 0)} instructions, ${fmt(x.cycles, 0)} cycles, ${fmt(x.seconds)} s${x.error ? ` (${x.error})` : ''}`,
        `${fmt(x.peakHeapMiB)} MiB (retained after the run ${fmt(x.retainedMiB)} MiB)`, judge ? '<= 256 MiB' : '', judge ? (x.peakHeapMiB <= 256 ? 'yes' : 'no') : '']
const heapRows = [['measure', 'workload', 'result', 'target', 'met'], heapRow(h.within, '', true)]
if (h.unbounded) heapRows.push(heapRow(h.unbounded, ', 4 GiB allowed', false))
table(heapRows)
console.log(`before the workloads: ${mixed} examples and kernels timed 3 times each (every instruction kind)`)
console.log(`load average (1 min): ${fmt(loadBefore, 2)} before, ${fmt(loadavg()[0]!, 2)} after`)
