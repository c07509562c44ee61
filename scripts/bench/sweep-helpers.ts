/** What the sweep benchmarks (sweep.ts, sweep-server.ts) share. */
import { defaultMachine } from '../../shared/schemas/machine'
import { sweepDefinitionSchema, type SweepDefinition, type SweepPointResult } from '../../shared/schemas/sweep'
import { programOrder } from '../../shared/sweep/order'
import { resolveSweep, type ResolvedSweep } from '../../shared/sweep/resolve'
import { plannedPoints } from '../../shared/sweep/runSweep'

/**
 * The grid under another definition (its point limit raised by k): a runner
 * keeps only the programs of the definition it ran last, so neither the timed
 * grid nor a copy finds programs another one prepared.
 */
export const copyOf = (d: SweepDefinition, k: number): SweepDefinition => sweepDefinitionSchema.parse({ ...d, limits: { ...d.limits, maxPoints: (d.limits?.maxPoints ?? 10_000) + k } })

/** Simulated lane-cycles of a sweep's points on the default machine's lanes. */
export const laneCycles = (points: SweepPointResult[]) => points.reduce((n, p) => n + (p.figures?.cycles ?? 0) * defaultMachine.lanes, 0)

export function resolveOrThrow(d: SweepDefinition): ResolvedSweep {
  const r = resolveSweep(d)
  if (!r.ok) throw new Error(r.issues.map((i) => i.message).join('; '))
  return r.sweep
}

/** Every point of a resolved sweep, in the order runners take them. */
export const allPoints = (sweep: ResolvedSweep): number[] => programOrder(sweep, plannedPoints(sweep))
