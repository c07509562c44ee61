/**
 * The cycle window of the Lane chart as a value: `[start, end)` in cycles
 * (fractions allowed while zooming), never mutated; every operation returns a
 * new window, clamped to the run. The zoom behaviour in the component binds
 * these to wheel, drag and keys; the conversions to and from a d3-zoom
 * transform live here so that they can be tested without a DOM.
 *
 * @example
 *   const w = zoomWindow(fitWindow(120), 2, 60, { cycles: 120 }) // { start: 30, end: 90 }
 */

export interface CycleWindow {
  readonly start: number
  readonly end: number
}

export interface WindowBounds {
  /** Cycles in the run: the window never leaves [0, cycles). */
  cycles: number
  /** The narrowest window, in cycles (default 4): a cycle never grows wider than a quarter of the plot. */
  minSpan?: number
}

export const DEFAULT_MIN_SPAN = 4

/** The whole run; an empty run still gets one cycle so that scales stay finite. */
export function fitWindow(cycles: number): CycleWindow {
  return { start: 0, end: Math.max(1, cycles) }
}

function total(bounds: WindowBounds): number {
  return Math.max(1, bounds.cycles)
}

/** The window moved and narrowed or widened as little as needed to fit the run and the minimum span. */
export function clampWindow(w: CycleWindow, bounds: WindowBounds): CycleWindow {
  if (!Number.isFinite(w.start) || !Number.isFinite(w.end)) throw new RangeError(`window must be finite, got [${w.start}, ${w.end})`)
  const max = total(bounds)
  const minSpan = Math.min(bounds.minSpan ?? DEFAULT_MIN_SPAN, max)
  const span = Math.min(max, Math.max(minSpan, w.end - w.start))
  const start = Math.min(max - span, Math.max(0, w.start))
  return { start, end: start + span }
}

/** Zooms by `factor` (> 1 narrows) keeping the cycle `anchor` where it is on screen. */
export function zoomWindow(w: CycleWindow, factor: number, anchor: number, bounds: WindowBounds): CycleWindow {
  if (!(factor > 0) || !Number.isFinite(factor)) throw new RangeError(`zoom factor must be a positive number, got ${factor}`)
  const start = anchor - (anchor - w.start) / factor
  const end = anchor + (w.end - anchor) / factor
  const zoomed = clampWindow({ start, end }, bounds)
  // At the minimum span the clamp would slide the window; keep the anchor in place instead.
  if (zoomed.end - zoomed.start > end - start) {
    const keep = (anchor - w.start) / (w.end - w.start || 1)
    const span = zoomed.end - zoomed.start
    return clampWindow({ start: anchor - keep * span, end: anchor - keep * span + span }, bounds)
  }
  return zoomed
}

/** Moves the window by `delta` cycles (positive: later), stopping at the ends of the run. */
export function panWindow(w: CycleWindow, delta: number, bounds: WindowBounds): CycleWindow {
  return clampWindow({ start: w.start + delta, end: w.end + delta }, bounds)
}

/** True when two windows agree to a thousandth of a cycle (a round trip through pixels stays "equal"). */
export function sameWindow(a: CycleWindow | null, b: CycleWindow | null): boolean {
  if (!a || !b) return a === b
  return Math.abs(a.start - b.start) < 1e-3 && Math.abs(a.end - b.end) < 1e-3
}

/** Cycles to pixels and back for one window on a plot `width` pixels wide. */
export interface CycleScale {
  readonly window: CycleWindow
  readonly width: number
  /** Pixels per cycle. */
  readonly k: number
  toPx(cycle: number): number
  toCycle(px: number): number
}

export function cycleScale(w: CycleWindow, width: number): CycleScale {
  const span = w.end - w.start
  if (!(span > 0)) throw new RangeError(`window must be non-empty, got [${w.start}, ${w.end})`)
  const k = width / span
  return {
    window: w,
    width,
    k,
    toPx: (cycle) => (cycle - w.start) * k,
    toCycle: (px) => w.start + px / k,
  }
}

/** A d3-zoom transform (x translation and scale k) over a base scale mapping [0, cycles) onto [0, width). */
export interface ZoomTransformValue {
  readonly k: number
  readonly x: number
}

export function windowToTransform(w: CycleWindow, cycles: number, width: number): ZoomTransformValue {
  const span = w.end - w.start
  return { k: Math.max(1, cycles) / span, x: (-w.start * width) / span }
}

export function transformToWindow(t: ZoomTransformValue, cycles: number, width: number): CycleWindow {
  const perPx = Math.max(1, cycles) / width
  return { start: (-t.x / t.k) * perPx, end: ((width - t.x) / t.k) * perPx }
}
