/**
 * What to draw for one view: the bars inside the cycle window, in pixels,
 * with level of detail. Within a band, bars narrower than `minWidth` pixels
 * are summed per pixel column, which takes the colour of the instruction and
 * phase covering most of it; stalls become a density (a column's height is
 * its stalled share). So a zoomed-out run of thousands of bars draws at most
 * one rectangle per pixel column and band, in colour at every zoom.
 * MIXED_SLOT (the muted colour) is kept for callers that draw a mixture.
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

/**
 * One band's bars in pixels. A bar at least `minWidth` wide is drawn as it
 * is. Narrower bars are summed per pixel column (columns `minWidth` wide):
 * the column takes the colour key that covers most of it (the dominant
 * instruction and phase), so a zoomed-out long run keeps its instruction
 * colours instead of turning into one grey smear. Stall columns (`density`)
 * are drawn as a density: their height is the stalled share of the column,
 * from the bottom of the track, not a full-height grey. Neighbouring columns
 * of one key and height are joined into one rectangle.
 */
function addBands(layout: ChartLayout, bands: IndexLists, scale: CycleScale, minWidth: number, out: Builder, mode: 'phase' | 'stall' | 'strip') {
  const { bars, groups } = layout
  const { start: w0, end: w1 } = scale.window
  const fullH = mode === 'strip' ? stripHeight(layout.trackHeight) : layout.trackHeight
  const density = mode !== 'phase'
  const cover = new Map<number, number>()
  for (let band = 0; band < bandCount(layout); band++) {
    const from = bands.offsets[band]!
    const to = bands.offsets[band + 1]!
    if (from === to) continue
    const bottom = bandY(layout, band) + layout.trackHeight
    // The rectangle waiting to be joined with the next column, if it has the same key and height.
    let px = 0
    let pw = 0
    let ph = 0
    let pkey = -1
    let pbar = -1
    const flushPending = () => {
      if (pkey >= 0) out.push(px, bottom - ph, pw, ph, pkey, pbar)
      pkey = -1
    }
    const emit = (x: number, w: number, h: number, key: number, bar: number) => {
      if (pkey === key && pbar < 0 && bar < 0 && ph === h && Math.abs(px + pw - x) < 1e-6) {
        pw += w
        return
      }
      flushPending()
      px = x
      pw = w
      ph = h
      pkey = key
      pbar = bar
    }
    // The pixel column being summed.
    let col = Number.NaN
    let covered = 0
    const closeColumn = () => {
      if (covered <= 0) return
      let best = -1
      let bestCover = -1
      for (const [k, c] of cover) {
        if (c > bestCover) {
          best = k
          bestCover = c
        }
      }
      const h = density ? Math.max(1, Math.round(fullH * Math.min(1, covered / minWidth))) : fullH
      emit(col * minWidth, minWidth, h, best, -1)
      cover.clear()
      covered = 0
    }
    for (let j = firstEndingAfter(layout, bands.items, from, to, w0); j < to; j++) {
      const b = bands.items[j]!
      const s = bars.start[b]!
      if (s >= w1) break
      const x0 = scale.toPx(s)
      const x1 = scale.toPx(bars.end[b]!)
      const slot = layout.colourOf[groups.instruction[bars.group[b]!]!]! + 1
      const key = colourKey(slot, bars.kind[b]!)
      if (x1 - x0 >= minWidth) {
        closeColumn()
        emit(x0, x1 - x0, fullH, key, b)
        continue
      }
      // A sub-pixel bar touches one column, or two when it crosses an edge.
      let a = x0
      while (a < x1) {
        const c = Math.floor(a / minWidth)
        if (c !== col) {
          closeColumn()
          col = c
        }
        const next = Math.min(x1, (c + 1) * minWidth)
        cover.set(key, (cover.get(key) ?? 0) + (next - a))
        covered += next - a
        a = next
      }
    }
    closeColumn()
    flushPending()
  }
}

/** The rectangles of the view: phases, then full stalls, then the stall strips that lie on phase bars. */
export function drawList(layout: ChartLayout, scale: CycleScale, options: DrawListOptions = {}): DrawList {
  const minWidth = options.minWidth ?? 1
  if (!(minWidth > 0)) throw new RangeError(`minWidth must be positive, got ${minWidth}`)
  const out = new Builder()
  if (options.only !== 'stalls') addBands(layout, layout.phaseBands, scale, minWidth, out, 'phase')
  if (options.only !== 'phases') {
    addBands(layout, layout.stallBands, scale, minWidth, out, 'stall')
    addBands(layout, layout.stripBands, scale, minWidth, out, 'strip')
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
