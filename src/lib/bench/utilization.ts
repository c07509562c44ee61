/**
 * Words and scales for the Bench's utilization bars (lanes, units, banks,
 * buses): a percentage as the cards print it, the top of a scale that keeps
 * small fractions visible, and which columns of a row of bars get a label.
 *
 * @example
 *   utilizationScale([0.037, 0.051, 0.014]) // 0.1: the bars are drawn against 0 to 10 %
 */

/** Tops a scale may take: round numbers, so that a reader can take a bar's height in. */
export const SCALE_TOPS = [0.05, 0.1, 0.2, 0.5, 1] as const

/** A fraction as a percentage: one decimal below 10 %, none above. */
export function percent(v: number): string {
  if (!Number.isFinite(v)) throw new RangeError(`a utilization must be a finite number, got ${v}`)
  const p = 100 * v
  return `${p.toFixed(p < 10 ? 1 : 0)}%`
}

/** The smallest round top at or above every value (values above 1 are drawn full). */
export function utilizationScale(values: readonly number[]): number {
  const max = values.reduce((m, v) => Math.max(m, v), 0)
  return SCALE_TOPS.find((top) => max <= top) ?? 1
}

/**
 * Whether column `i` of `n` prints its number under the bar: every one up to
 * `room` columns, else every other (the first always), so that two-digit
 * labels do not run together. Every column still names itself to a screen
 * reader and on hover.
 */
export function labelled(i: number, n: number, room = 8): boolean {
  return n <= room || i % 2 === 0
}
