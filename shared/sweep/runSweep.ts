/**
 * The limits of a sweep and a sequential driver for one thread (the CLI with
 * one worker, the tests, a server chunk). Exceeding a limit stops the sweep
 * with a clear message and keeps the points done; a cycle limit fails only the
 * point that reached it.
 */
import type { SweepPointResult } from '../schemas/sweep'
import type { ResolvedSweep } from './resolve'
import { createPointRunner } from './runPoint'
import { programOrder } from './order'

export interface SweepOutcome {
  points: SweepPointResult[]
  /** Why the sweep stopped before its last point (a limit or a cancel), if it did. */
  stopped: string | null
}

/** Points the sweep runs: the whole grid, or the first maxPoints of it. */
export const plannedPoints = (sweep: ResolvedSweep) => Math.min(sweep.count, sweep.limits.maxPoints)

/** The message of a grid larger than the points limit. */
export function pointsLimitMessage(sweep: ResolvedSweep): string | null {
  return sweep.count > sweep.limits.maxPoints
    ? `the grid has ${sweep.count} points, over the limit of ${sweep.limits.maxPoints} points a sweep; the first ${sweep.limits.maxPoints} were run`
    : null
}

export const timeLimitMessage = (sweep: ResolvedSweep, done: number) =>
  `the sweep reached its time limit of ${sweep.limits.timeLimitMs / 1000} s after ${done} of ${plannedPoints(sweep)} points; the points done are kept`

export interface SweepDriverOptions {
  /** Milliseconds clock (default performance.now). */
  now?: () => number
  onPoint?: (point: SweepPointResult) => void
  /** Indexes to run (default: every point, in program order: shared/sweep/order.ts). Results come back in index order. */
  indexes?: Iterable<number>
}

export function runSweep(sweep: ResolvedSweep, options: SweepDriverOptions = {}): SweepOutcome {
  const now = options.now ?? (() => performance.now())
  const start = now()
  const runner = createPointRunner(sweep)
  const points: SweepPointResult[] = []
  const planned = plannedPoints(sweep)
  const indexes = options.indexes ?? programOrder(sweep, planned)
  const byIndex = () => points.sort((a, b) => a.index - b.index)
  for (const index of indexes) {
    if (now() - start > sweep.limits.timeLimitMs) return { points: byIndex(), stopped: timeLimitMessage(sweep, points.length) }
    const p = runner.run(index)
    points.push(p)
    options.onPoint?.(p)
  }
  return { points: byIndex(), stopped: pointsLimitMessage(sweep) }
}
