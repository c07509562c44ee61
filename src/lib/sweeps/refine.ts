/**
 * Brushing a range of the line chart re-runs it finer: the x parameter's
 * values become the integers (or numbers) inside the brushed range, at most
 * `REFINE_MAX_VALUES` of them, with the smallest whole step that fits (and
 * never coarser than the values it had there).
 *
 * @example
 *   refineSpec([8, 16, 24, 32, 40], 15.2, 33.9) // '16..33' (was every 8; now every 1)
 */
import type { SweepValue } from '@shared/schemas/sweep'

export const REFINE_MAX_VALUES = 64

/** The new SPEC for a brushed range [lo, hi] of a numeric parameter's values, or null when the range holds no room for a finer grid. */
export function refineSpec(values: readonly SweepValue[], lo: number, hi: number): string | null {
  const nums = values.filter((v): v is number => typeof v === 'number')
  if (nums.length !== values.length || !(hi > lo)) return null
  const integers = nums.every((v) => Number.isInteger(v))
  const inside = nums.filter((v) => v >= lo && v <= hi)
  if (integers) {
    const a = Math.ceil(lo)
    const b = Math.floor(hi)
    if (b <= a) return null
    const step = Math.max(1, Math.ceil((b - a) / (REFINE_MAX_VALUES - 1)))
    const count = Math.floor((b - a) / step) + 1
    // Nothing finer than what was run there: say so instead of running the same points again.
    if (count <= inside.length) return null
    return step === 1 ? `${a}..${b}` : `${a}..${b}:${step}`
  }
  const step = (hi - lo) / (REFINE_MAX_VALUES - 1)
  return Array.from({ length: REFINE_MAX_VALUES }, (_, k) => Number((lo + k * step).toPrecision(6))).join(',')
}
