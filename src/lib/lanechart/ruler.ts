/**
 * The cycle ruler: integer cycle ticks for a view, about one label every
 * `spacing` pixels, labelled at the middle of their cycle column (cycle c
 * covers [c, c + 1)). Numbers are grouped by thousands ("12,480") so that
 * long runs stay readable.
 *
 * @example
 *   cycleTicks(cycleScale({ start: 0, end: 120 }, 600)) // [0, 20, 40, ..., 100]
 */
import { ticks } from 'd3'
import type { CycleScale } from './window'
import { formatInteger } from '@/utils/format'

export interface Tick {
  cycle: number
  /** Pixel of the middle of the cycle column. */
  x: number
  label: string
  /** How to anchor the label so that it stays on the plot: at the edges it hangs inwards. */
  anchor: 'start' | 'middle' | 'end'
}

/** Half the width of a label, in pixels, taken as 7 px a character of the 11 px mono face. */
const halfLabel = (label: string) => label.length * 3.5

export function formatCycle(cycle: number): string {
  return formatInteger(cycle)
}

export function cycleTicks(scale: CycleScale, spacing = 80): Tick[] {
  if (!(spacing > 0)) throw new RangeError(`tick spacing must be positive, got ${spacing}`)
  const { start, end } = scale.window
  const count = Math.max(1, Math.floor(scale.width / spacing))
  const out: Tick[] = []
  for (const c of ticks(Math.ceil(start), Math.floor(end - 1e-9), count)) {
    if (!Number.isInteger(c) || c < start || c >= end) continue
    const x = scale.toPx(c + 0.5)
    const label = formatCycle(c)
    const anchor = x < halfLabel(label) ? 'start' : x > scale.width - halfLabel(label) ? 'end' : 'middle'
    out.push({ cycle: c, x, label, anchor })
  }
  return out
}

/** The cycle column under a pixel: floor of the cycle, clamped to the run. */
export function cycleAtPx(scale: CycleScale, px: number, cycles: number): number {
  return Math.max(0, Math.min(Math.max(0, cycles - 1), Math.floor(scale.toCycle(px))))
}
