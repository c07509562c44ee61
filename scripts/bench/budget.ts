/**
 * How a workload's run would have to spend its time to reach the target
 * ratio to the bare loop (issue 11), beside how it spends it now.
 *
 * The run is credited with L lanes x cycles lane-cycles, but times only K
 * lanes (one per class of alike lanes, symmetry.ts; all L when none are
 * alike). At the target t it may take L x cycles / (t x the loop's rate).
 * Of that, recording usage spans takes what the same run takes more than
 * without them (measured in place, beside the loop), and a model that does
 * at least the bare loop's work per timed lane-cycle spends K x cycles of
 * the loop's lane-cycles on it. What is left is all the rest of the model
 * may cost: renaming, dispatch, checks, stall classification, phase times,
 * building the trace. A reading, not a bound: it assumes the loop's work is
 * the least a lane-cycle costs, as the loop was built to be (bare-loop.ts).
 *
 * Beside the recorder's cost in place, the least a usage trace could cost:
 * the run's own uses (its usage rows give them back: a row of a lane resource
 * of amount a over n cycles was a x n uses, a bus row one a cycle; a row
 * standing for alike lanes was recorded once) replayed in cycle order into
 * the least recorder there can be (`leastTrace`: per resource one open span,
 * extended by the same instruction's use in the next cycle, else closed into
 * a row of start, length, instruction and resource; no amounts, no write
 * marks, no totals), less the same replay into a sink that does nothing.
 */
import type { Machine } from '../../shared/schemas/machine'
import type { DynamicStream } from '../../shared/sim/exec/stream'
import { lanePlan } from '../../shared/sim/timing/symmetry'
import type { TimingTrace } from '../../shared/sim/trace/types'
import { median } from './median'

/** Lanes a run of `stream` on `machine` times: one per class of alike lanes, or all. */
export function timedLanes(stream: DynamicStream, machine: Machine): number {
  return lanePlan(stream, machine)?.first.length ?? machine.lanes
}

export interface BudgetInput {
  lanes: number
  timed: number
  cycles: number
  /** The loop's run (milliseconds) and the lane-cycles it simulated. */
  bareMs: number
  bareLaneCycles: number
  /** The workload's run, the same without usage spans, and the least usage trace of its uses. */
  runMs: number
  noUsageMs: number
  leastUsageMs: number
  target: number
}

export interface Budget {
  /** Milliseconds the run may take at the target, and their parts. */
  atTarget: number
  usage: number
  loopWork: number
  left: number
  /** What is left with the least usage trace instead of the recorder. */
  leftLeast: number
  /** What the rest takes now: the run less its usage spans and the loop's work. */
  restNow: number
}

export function budgetRow(x: BudgetInput): Budget {
  const perLaneCycle = x.bareMs / x.bareLaneCycles
  const atTarget = (x.lanes * x.cycles * perLaneCycle) / x.target
  const usage = Math.max(0, x.runMs - x.noUsageMs)
  const loopWork = x.timed * x.cycles * perLaneCycle
  return { atTarget, usage, loopWork, left: atTarget - usage - loopWork, leftLeast: atTarget - x.leastUsageMs - loopWork, restNow: x.runMs - usage - loopWork }
}

/** A run's uses of its resources, in cycle order. */
export interface Uses {
  count: number
  cycle: Int32Array
  resource: Int32Array
  inst: Int32Array
  resources: number
}

/** The uses behind a trace's usage rows (see the header). */
export function usesOf(trace: TimingTrace): Uses {
  const u = trace.usage
  const isBus = trace.resources.map((r) => r.kind === 'bus')
  const perCycle = (i: number) => (isBus[u.resource[i] as number] ? 1 : (u.amount[i] as number))
  // Rows may reach past the run's last cycle (a divider holds its unit for its latency).
  let end = trace.cycles
  for (let i = 0; i < u.count; i++) end = Math.max(end, (u.start[i] as number) + (u.length[i] as number))
  // Counting sort by cycle: rows are sorted by start, but a long row's later cycles come after other rows.
  const at = new Int32Array(end + 1)
  for (let i = 0; i < u.count; i++) {
    const s = u.start[i] as number
    const n = perCycle(i)
    for (let c = s; c < s + (u.length[i] as number); c++) at[c + 1]! += n
  }
  for (let c = 1; c <= end; c++) at[c]! += at[c - 1]!
  const count = at[end] as number
  const uses: Uses = { count, cycle: new Int32Array(count), resource: new Int32Array(count), inst: new Int32Array(count), resources: trace.resources.length }
  for (let i = 0; i < u.count; i++) {
    const s = u.start[i] as number
    const n = perCycle(i)
    for (let c = s; c < s + (u.length[i] as number); c++) {
      for (let k = 0; k < n; k++) {
        const j = at[c]!++
        uses.cycle[j] = c
        uses.resource[j] = u.resource[i] as number
        uses.inst[j] = u.instruction[i] as number
      }
    }
  }
  return uses
}

type Sink = (resource: number, cycle: number, inst: number) => void

/** The least recorder of usage spans (see the header); `rows` keeps its work alive. */
function leastTrace(resources: number): { use: Sink; rows: () => number } {
  const inst = new Int32Array(resources).fill(-1)
  const start = new Int32Array(resources)
  const end = new Int32Array(resources)
  let table = new Int32Array(4 * 4096)
  let rows = 0
  const use: Sink = (r, c, i) => {
    if (inst[r] === i && end[r] === c) {
      end[r] = c + 1
      return
    }
    const open = inst[r] as number
    if (open >= 0) {
      if ((rows + 1) * 4 > table.length) {
        const grown = new Int32Array(table.length * 2)
        grown.set(table)
        table = grown
      }
      const s = start[r] as number
      table[rows * 4] = s
      table[rows * 4 + 1] = (end[r] as number) - s
      table[rows * 4 + 2] = open
      table[rows * 4 + 3] = r
      rows++
    }
    inst[r] = i
    start[r] = c
    end[r] = c + 1
  }
  return { use, rows: () => rows }
}

function replay(uses: Uses, sink: Sink): void {
  for (let i = 0; i < uses.count; i++) sink(uses.resource[i] as number, uses.cycle[i] as number, uses.inst[i] as number)
}

/** Milliseconds the least usage trace adds to replaying `uses`: the median of `runs` pairs after `warmup`. */
export function leastTraceMs(uses: Uses, runs: number, warmup: number): number {
  let keep = 0
  const nothing: Sink = (r, c, i) => (keep += r ^ c ^ i)
  const diff: number[] = []
  for (let k = 0; k < runs + warmup; k++) {
    const t0 = performance.now()
    replay(uses, nothing)
    const t1 = performance.now()
    const least = leastTrace(uses.resources)
    replay(uses, least.use)
    keep += least.rows()
    const t2 = performance.now()
    if (k >= warmup) diff.push(t2 - t1 - (t1 - t0))
  }
  if (keep < 0) throw new Error('unreachable: keeps the replays alive')
  return Math.max(0, median(diff))
}
