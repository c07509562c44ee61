/**
 * Which bar is under the pointer. The plot position is given as a cycle
 * (fractional) and a y offset in pixels; `tolerance` (in cycles, usually two
 * pixels' worth) lets a zoomed-out bar of less than a pixel still be hit.
 * A phase bar wins over a stall: full stalls never overlap a phase bar of
 * their band, and a stall strip (a stall over its own instruction's phase,
 * see layout.ts) is reported as the hit's `stall` beside the phase bar it
 * lies on, so that a click selects what it lands on and the tooltip still
 * names the stall.
 *
 * @example
 *   const hit = hitTest(layout, scale.toCycle(px), py, { tolerance: 2 / scale.k })
 *   hit?.instruction // position in trace.instructions
 */
import { STALL_KIND, type ChartLayout, type IndexLists } from './layout'

export interface Hit {
  bar: number
  group: number
  /** Position in trace.instructions. */
  instruction: number
  lane: number
  /** 0..2 a phase (PHASES), 3 a stall. */
  kind: number
  /** The stall bar under the pointer: `bar` itself for a stall, a strip on the phase bar, or -1. */
  stall: number
}

export interface HitOptions {
  /** How far from a bar, in cycles, still counts as on it (default 0). */
  tolerance?: number
}

/** The band (lane x sub-row x track) at `y`, or -1 between lanes and outside the chart. */
export function bandAt(layout: ChartLayout, y: number): number {
  const pitch = layout.laneHeight + layout.laneGap
  if (y < 0 || layout.laneCount === 0) return -1
  const lane = Math.floor(y / pitch)
  const inLane = y - lane * pitch
  if (lane >= layout.laneCount || inLane >= layout.laneHeight) return -1
  const rowTrack = Math.floor(inLane / layout.trackHeight)
  return lane * layout.rowsPerLane * layout.tracks + rowTrack
}

function nearest(layout: ChartLayout, lists: IndexLists, band: number, cycle: number, tolerance: number): number {
  const { items, offsets } = lists
  const from = offsets[band]!
  const to = offsets[band + 1]!
  // First bar starting after `cycle`; the candidates are it and the one before.
  let lo = from
  let hi = to
  while (lo < hi) {
    const mid = (lo + hi) >> 1
    if (layout.bars.start[items[mid]!]! <= cycle) lo = mid + 1
    else hi = mid
  }
  let best = -1
  let bestDistance = Infinity
  for (const j of [lo - 1, lo]) {
    if (j < from || j >= to) continue
    const b = items[j]!
    const s = layout.bars.start[b]!
    const e = layout.bars.end[b]!
    const distance = cycle < s ? s - cycle : cycle >= e ? cycle - e : 0
    if (distance <= tolerance && distance < bestDistance) {
      best = b
      bestDistance = distance
    }
  }
  return best
}

export function hitTest(layout: ChartLayout, cycle: number, y: number, options: HitOptions = {}): Hit | null {
  const tolerance = options.tolerance ?? 0
  if (!(tolerance >= 0)) throw new RangeError(`tolerance must be zero or more, got ${tolerance}`)
  const band = bandAt(layout, y)
  if (band === -1) return null
  let bar = nearest(layout, layout.phaseBands, band, cycle, 0)
  if (bar === -1) bar = nearest(layout, layout.stallBands, band, cycle, 0)
  if (bar === -1) bar = nearest(layout, layout.phaseBands, band, cycle, tolerance)
  if (bar === -1) bar = nearest(layout, layout.stallBands, band, cycle, tolerance)
  if (bar === -1) return null
  const group = layout.bars.group[bar]!
  const kind = layout.bars.kind[bar]!
  let stall = kind === STALL_KIND ? bar : nearest(layout, layout.stripBands, band, cycle, tolerance)
  if (stall !== -1 && layout.bars.group[stall] !== group) stall = -1
  return {
    bar,
    group,
    instruction: layout.groups.instruction[group]!,
    lane: layout.groups.lane[group]!,
    kind,
    stall,
  }
}
