/**
 * What to draw for one view: the bars inside the cycle window, in pixels,
 * with level of detail. Within a band, consecutive bars narrower than
 * `minWidth` pixels that lie within `minWidth` of each other are merged into
 * one rectangle, so that a zoomed-out run of thousands of bars draws at most
 * about one rectangle per pixel column and band. A merged rectangle keeps the
 * colour of its bars when they all share one, else it takes the MIXED slot.
 *
 * Colour keys: `key = slot * 4 + kind`, where slot 0 is MIXED and slot s > 0
 * is colour slot s - 1 of the layout, kind 0..2 a phase and 3 a stall.
 *
 * @example
 *   const list = drawList(layout, cycleScale(window, 800))
 *   for (let r = 0; r < list.count; r++) ctx.fillRect(list.x[r], list.y[r], list.w[r], list.h[r])
 */
import { bandCount, bandY, barBox, stripHeight, type ChartLayout, type IndexLists } from './layout'
import type { CycleScale } from './window'

export const MIXED_SLOT = 0

export interface DrawList {
  readonly count: number
  readonly x: Float32Array
  readonly y: Float32Array
  readonly w: Float32Array
  readonly h: Float32Array
  readonly key: Int32Array
  /** A bar index when the rectangle is one bar, -1 for a merged one. */
  readonly bar: Int32Array
}

export interface DrawListOptions {
  /** Bars narrower than this (pixels) are merged with their neighbours (default 1). */
  minWidth?: number
  /** Only bars of these kinds: 'phases' or 'stalls' (default both, stalls after phases). */
  only?: 'phases' | 'stalls'
}

export function colourKey(slot: number, kind: number): number {
  return slot * 4 + kind
}

export function keySlot(key: number): number {
  return key >> 2
}

export function keyKind(key: number): number {
  return key & 3
}

/** Index of the first bar in `items[from..to)` whose end is after `cycle` (bars in a band are sorted and disjoint). */
function firstEndingAfter(layout: ChartLayout, items: Int32Array, from: number, to: number, cycle: number): number {
  let lo = from
  let hi = to
  while (lo < hi) {
    const mid = (lo + hi) >> 1
    if (layout.bars.end[items[mid]!]! <= cycle) lo = mid + 1
    else hi = mid
  }
  return lo
}

class Builder {
  x: number[] = []
  y: number[] = []
  w: number[] = []
  h: number[] = []
  key: number[] = []
  bar: number[] = []
  push(x: number, y: number, w: number, h: number, key: number, bar: number) {
    this.x.push(x)
    this.y.push(y)
    this.w.push(w)
    this.h.push(h)
    this.key.push(key)
    this.bar.push(bar)
  }
  done(): DrawList {
    return {
      count: this.x.length,
      x: Float32Array.from(this.x),
      y: Float32Array.from(this.y),
      w: Float32Array.from(this.w),
      h: Float32Array.from(this.h),
      key: Int32Array.from(this.key),
      bar: Int32Array.from(this.bar),
    }
  }
}

/** `strips`: the bands hold stall strips, drawn along the bottom of the track. */
function addBands(layout: ChartLayout, bands: IndexLists, scale: CycleScale, minWidth: number, out: Builder, strips = false) {
  const { bars, groups } = layout
  const { start: w0, end: w1 } = scale.window
  const h = strips ? stripHeight(layout.trackHeight) : layout.trackHeight
  for (let band = 0; band < bandCount(layout); band++) {
    const from = bands.offsets[band]!
    const to = bands.offsets[band + 1]!
    if (from === to) continue
    const y = bandY(layout, band) + layout.trackHeight - h
    // Run being merged: pixel extent, its key (or -1 once mixed), its bar when it has only one.
    let runX0 = 0
    let runX1 = -Infinity
    let runKey = -2
    let runBars = 0
    let runBar = -1
    const flush = () => {
      if (runBars === 0) return
      out.push(runX0, y, Math.max(minWidth, runX1 - runX0), h, runKey, runBars === 1 ? runBar : -1)
      runBars = 0
    }
    for (let j = firstEndingAfter(layout, bands.items, from, to, w0); j < to; j++) {
      const b = bands.items[j]!
      const s = bars.start[b]!
      if (s >= w1) break
      const x0 = scale.toPx(s)
      const x1 = scale.toPx(bars.end[b]!)
      const kind = bars.kind[b]!
      const slot = layout.colourOf[groups.instruction[bars.group[b]!]!]! + 1
      const key = colourKey(slot, kind)
      if (x1 - x0 >= minWidth) {
        flush()
        out.push(x0, y, x1 - x0, h, key, b)
        continue
      }
      if (runBars > 0 && x0 - runX1 < minWidth) {
        runX1 = Math.max(runX1, x1)
        if (runKey !== key) runKey = colourKey(MIXED_SLOT, keyKind(runKey) === kind ? kind : 1)
        runBars++
      } else {
        flush()
        runX0 = x0
        runX1 = x1
        runKey = key
        runBar = b
        runBars = 1
      }
    }
    flush()
  }
}

/** The rectangles of the view: phases, then full stalls, then the stall strips that lie on phase bars. */
export function drawList(layout: ChartLayout, scale: CycleScale, options: DrawListOptions = {}): DrawList {
  const minWidth = options.minWidth ?? 1
  if (!(minWidth > 0)) throw new RangeError(`minWidth must be positive, got ${minWidth}`)
  const out = new Builder()
  if (options.only !== 'stalls') addBands(layout, layout.phaseBands, scale, minWidth, out)
  if (options.only !== 'phases') {
    addBands(layout, layout.stallBands, scale, minWidth, out)
    addBands(layout, layout.stripBands, scale, minWidth, out, true)
  }
  return out.done()
}

/** The bars of one instruction (by position in trace.instructions), for drawing a selection on top. */
export function instructionBars(layout: ChartLayout, position: number): number[] {
  const { groupsByInstruction: gi, groups } = layout
  if (position < 0 || position >= layout.instructionCount) return []
  const out: number[] = []
  for (let j = gi.offsets[position]!; j < gi.offsets[position + 1]!; j++) {
    const g = gi.items[j]!
    for (let b = groups.firstBar[g]!; b < groups.firstBar[g + 1]!; b++) out.push(b)
  }
  return out
}

/** Given bars (e.g. one instruction's) as they are, without merging, in the order given: for drawing a selection on top. */
export function barsDrawList(layout: ChartLayout, scale: CycleScale, bars: readonly number[]): DrawList {
  const out = new Builder()
  const { start: w0, end: w1 } = scale.window
  for (const b of bars) {
    const s = layout.bars.start[b]!
    const e = layout.bars.end[b]!
    if (e <= w0 || s >= w1) continue
    const slot = layout.colourOf[layout.groups.instruction[layout.bars.group[b]!]!]! + 1
    const x0 = scale.toPx(s)
    const box = barBox(layout, b)
    out.push(x0, box.y, Math.max(1, scale.toPx(e) - x0), box.h, colourKey(slot, layout.bars.kind[b]!), b)
  }
  return out.done()
}
