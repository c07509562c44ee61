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
 */
import type { Machine } from '../../shared/schemas/machine'
import type { DynamicStream } from '../../shared/sim/exec/stream'
import { lanePlan } from '../../shared/sim/timing/symmetry'

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
  /** The workload's run, and the same without usage spans. */
  runMs: number
  noUsageMs: number
  target: number
}

export interface Budget {
  /** Milliseconds the run may take at the target, and their parts. */
  atTarget: number
  usage: number
  loopWork: number
  left: number
  /** What the rest takes now: the run less its usage spans and the loop's work. */
  restNow: number
}

export function budgetRow(x: BudgetInput): Budget {
  const perLaneCycle = x.bareMs / x.bareLaneCycles
  const atTarget = (x.lanes * x.cycles * perLaneCycle) / x.target
  const usage = Math.max(0, x.runMs - x.noUsageMs)
  const loopWork = x.timed * x.cycles * perLaneCycle
  return { atTarget, usage, loopWork, left: atTarget - usage - loopWork, restNow: x.runMs - usage - loopWork }
}
