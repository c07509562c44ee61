/**
 * What the results say about failed points: a failed point is a result (its
 * stage and message are in the table) but the plot leaves it out, so a curve
 * that stops short needs a word, e.g. an example whose data holds 19 elements
 * swept to AVL 256.
 */
import type { SweepPointResult } from '@shared/schemas/sweep'
import type { ResolvedSweep } from '@shared/sweep/resolve'

/** "N points failed and are not plotted; the first, AVL=20: execute: ..." or null when none failed. */
export function failureSummary(sweep: Pick<ResolvedSweep, 'parameters'>, points: readonly SweepPointResult[]): string | null {
  let first: SweepPointResult | null = null
  let n = 0
  for (const p of points) {
    if (p.status !== 'failed') continue
    n++
    if (!first || p.index < first.index) first = p
  }
  if (!first) return null
  const at = sweep.parameters.map((q, k) => `${q.path}=${String(first.values[k])}`).join(', ')
  const why = first.error ? `${first.error.stage}: ${first.error.message}` : 'failed'
  return `${n} point${n === 1 ? '' : 's'} failed and ${n === 1 ? 'is' : 'are'} not plotted (Status column); the first, ${at}: ${why}`
}
