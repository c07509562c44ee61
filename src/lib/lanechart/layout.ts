/**
 * Bars of the Lane chart from a timing trace, as an immutable table (typed
 * arrays, so that a run of a thousand instructions on many lanes stays cheap
 * to draw and to search).
 *
 * - A bar group is one instruction in one lane: its phase bars and its stall
 *   bars. Groups exist for every (instruction, lane) with a phase time or a
 *   stall; a lane with no active element and no stall has none.
 * - Instructions overlap in a lane (several in flight, pipelined units), so
 *   each group gets a track inside its lane (greedy interval packing); every
 *   lane has as many tracks as the busiest lane, so that lanes line up.
 * - Without sub-rows a group is one bar cut into read / execute / write
 *   segments at the start of the next phase (phases overlap: the execute phase
 *   begins while later elements are still read). With sub-rows every phase is
 *   drawn whole in its own sub-row.
 * - A stall goes in the row of the phase the lane waits to finish: the first
 *   phase of the instruction in that lane that has not ended by the stall's
 *   first cycle (before its first read: the read sub-row).
 * - A lane can be stalled while its instruction still progresses (reading one
 *   operand while another is refused its port, docs/model.md "Stalls"), so a
 *   stall may overlap its own instruction's phase bars. The stall is cut
 *   where it meets them: the cycles outside every phase bar of its row are a
 *   full-height stall bar, the cycles over a phase bar a *strip*, a thin bar
 *   along the bottom of that phase bar (stripHeight), so that the phase stays
 *   readable and clickable and the hatching still shows the stall. Every
 *   piece keeps the index of its stall span, so the whole span can be named.
 *
 * Bars are half-open cycle intervals `[start, end)`: a phase from cycle 3 to
 * cycle 5 inclusive is `[3, 6)`.
 *
 * @example
 *   const layout = buildLayout(trace, { subRows: false, trackHeight: 10 })
 *   layout.groupCount // one per lane and instruction with activity
 */
import { STALL_REASONS, LANE_FIELD_COUNT, NO_CYCLE, type TimingTrace } from '@shared/sim/trace/types'

export const PHASES = ['read', 'execute', 'write'] as const
export type Phase = (typeof PHASES)[number]
/** Bar kinds: the three phases by their index in PHASES, then stalls. */
export const STALL_KIND = 3
export type BarKind = 0 | 1 | 2 | typeof STALL_KIND

export interface LayoutOptions {
  /** One sub-row per phase in every lane (default false). */
  subRows?: boolean
  /** Height of one track in pixels (default 10). */
  trackHeight?: number
  /** Space between lanes in pixels (default 4). */
  laneGap?: number
}

export interface ChartRow {
  lane: number
  /** The phase of a sub-row, null for a lane drawn as one row. */
  phase: Phase | null
  y: number
  height: number
}

/** Bars as columns; bar i is `[start[i], end[i])` in band `band[i]`, part of group `group[i]`. */
export interface BarTable {
  readonly count: number
  readonly start: Int32Array
  readonly end: Int32Array
  readonly kind: Uint8Array
  /** Index into STALL_REASONS for stalls, 0 otherwise. */
  readonly reason: Uint8Array
  /** For a stall bar, its span's index in trace.stalls (a span cut in pieces gives each the same); -1 for a phase. */
  readonly stall: Int32Array
  /** 1 for a stall strip: a stall drawn thin over a phase bar of its own group. */
  readonly strip: Uint8Array
  readonly group: Int32Array
  readonly band: Int32Array
}

/** Bar groups as columns: group g is instruction `instruction[g]` (its position in trace.instructions) in `lane[g]`. */
export interface GroupTable {
  readonly count: number
  readonly instruction: Int32Array
  readonly lane: Int32Array
  readonly track: Int32Array
  /** Bars of group g are `firstBar[g] .. firstBar[g + 1] - 1`. */
  readonly firstBar: Int32Array
}

/** Compressed lists: the items of list j are `items[offsets[j] .. offsets[j + 1] - 1]`. */
export interface IndexLists {
  readonly offsets: Int32Array
  readonly items: Int32Array
}

export interface ChartLayout {
  readonly laneCount: number
  readonly cycles: number
  readonly subRows: boolean
  /** Sub-rows per lane: 3 with sub-rows, else 1. */
  readonly rowsPerLane: number
  readonly tracks: number
  readonly trackHeight: number
  readonly laneGap: number
  readonly laneHeight: number
  readonly height: number
  readonly rows: readonly ChartRow[]
  readonly bars: BarTable
  readonly groups: GroupTable
  /** Phase bars of each band (lane x sub-row x track), sorted by start; they never overlap within a band. */
  readonly phaseBands: IndexLists
  /** Full-height stall bars of each band, sorted by start; they overlap no phase bar of the band. */
  readonly stallBands: IndexLists
  /** Stall strips of each band, sorted by start; each lies inside a phase bar of its group. */
  readonly stripBands: IndexLists
  /** Groups of each instruction (by position in trace.instructions). */
  readonly groupsByInstruction: IndexLists
  /** Colour slot of each instruction: the rank of its static instruction among those drawn; -1 when it has no phase bars. */
  readonly colourOf: Int32Array
  /** The static instructions in colour order: position of their first dynamic instance. */
  readonly colourInstruction: Int32Array
  readonly instructionCount: number
}

interface PendingBar {
  start: number
  end: number
  kind: BarKind
  reason: number
  subRow: number
  stall: number
  strip: boolean
}

/**
 * Cuts stall span `k` over `[start, end)` against the phase bars already
 * pushed for its group in the same sub-row: pieces outside them are full
 * stall bars, pieces over them strips.
 */
function pushStall(pending: PendingBar[], first: number, k: number, start: number, end: number, reason: number, subRow: number) {
  const covers: [number, number][] = []
  for (let b = first; b < pending.length; b++) {
    const p = pending[b]!
    if (p.kind !== STALL_KIND && p.subRow === subRow && p.end > start && p.start < end) covers.push([Math.max(p.start, start), Math.min(p.end, end)])
  }
  covers.sort((a, b) => a[0] - b[0])
  let at = start
  const piece = (s: number, e: number, strip: boolean) => {
    if (e > s) pending.push({ start: s, end: e, kind: STALL_KIND, reason, subRow, stall: k, strip })
  }
  for (const [cs, ce] of covers) {
    if (ce <= at) continue
    piece(at, cs, false)
    piece(Math.max(at, cs), ce, true)
    at = ce
  }
  piece(at, end, false)
}

function phaseTimes(trace: TimingTrace, i: number, lane: number): [number, number][] {
  const base = (i * trace.laneCount + lane) * LANE_FIELD_COUNT
  const t = trace.laneTimes
  const out: [number, number][] = []
  for (let p = 0; p < 3; p++) {
    const s = t[base + 2 + 2 * p] ?? NO_CYCLE
    const e = t[base + 3 + 2 * p] ?? NO_CYCLE
    out.push(s === NO_CYCLE || e === NO_CYCLE ? [NO_CYCLE, NO_CYCLE] : [s, e])
  }
  return out
}

/** The sub-row a stall starting at `cycle` belongs to: the first phase not ended by then. */
function stallPhase(phases: [number, number][], cycle: number): number {
  let last = -1
  for (let p = 0; p < 3; p++) {
    const [s, e] = phases[p]!
    if (s === NO_CYCLE) continue
    last = p
    if (e >= cycle) return p
  }
  return last === -1 ? 0 : last
}

function lists(count: number, keyOf: (i: number) => number, n: number, order?: (a: number, b: number) => number): IndexLists {
  const offsets = new Int32Array(count + 1)
  for (let i = 0; i < n; i++) offsets[keyOf(i) + 1]!++
  for (let j = 0; j < count; j++) offsets[j + 1]! += offsets[j]!
  const fill = offsets.slice(0, count)
  const items = new Int32Array(n)
  for (let i = 0; i < n; i++) items[fill[keyOf(i)]!++] = i
  if (order) for (let j = 0; j < count; j++) items.subarray(offsets[j]!, offsets[j + 1]!).sort(order)
  return { offsets, items }
}

export function buildLayout(trace: TimingTrace, options: LayoutOptions = {}): ChartLayout {
  const subRows = options.subRows ?? false
  const trackHeight = options.trackHeight ?? 10
  const laneGap = options.laneGap ?? 4
  if (!(trackHeight > 0)) throw new RangeError(`trackHeight must be positive, got ${trackHeight}`)
  const laneCount = trace.laneCount
  const n = trace.instructions.length
  if (trace.laneTimes.length < n * laneCount * LANE_FIELD_COUNT) {
    throw new RangeError(`trace.laneTimes holds ${trace.laneTimes.length} values, ${n * laneCount * LANE_FIELD_COUNT} expected (${n} instructions x ${laneCount} lanes x ${LANE_FIELD_COUNT})`)
  }
  const rowsPerLane = subRows ? 3 : 1

  // Stall spans by (instruction, lane); the stall's instruction is an InstructionTrace.index.
  const positionOf = new Map<number, number>()
  trace.instructions.forEach((ins, pos) => positionOf.set(ins.index, pos))
  const stallsOf = new Map<number, number[]>()
  const s = trace.stalls
  for (let k = 0; k < s.count; k++) {
    const pos = positionOf.get(s.instruction[k] ?? -1)
    const lane = s.lane[k] ?? 0
    if (pos === undefined || lane >= laneCount || (s.length[k] ?? 0) <= 0) continue
    const key = pos * laneCount + lane
    const list = stallsOf.get(key)
    if (list) list.push(k)
    else stallsOf.set(key, [k])
  }

  // Groups in instruction order, then lane order; their bars contiguous.
  const gInstr: number[] = []
  const gLane: number[] = []
  const gFirst: number[] = []
  const gSpan: [number, number][] = []
  const pending: PendingBar[] = []
  for (let i = 0; i < n; i++) {
    for (let lane = 0; lane < laneCount; lane++) {
      const phases = phaseTimes(trace, i, lane)
      const stallIds = stallsOf.get(i * laneCount + lane) ?? []
      const first = pending.length
      if (subRows) {
        phases.forEach(([ps, pe], p) => {
          if (ps !== NO_CYCLE && pe >= ps) pending.push({ start: ps, end: pe + 1, kind: p as BarKind, reason: 0, subRow: p, stall: -1, strip: false })
        })
      } else {
        let prevEnd = -Infinity
        for (let p = 0; p < 3; p++) {
          const [ps, pe] = phases[p]!
          if (ps === NO_CYCLE) continue
          let next = Infinity
          for (let q = p + 1; q < 3; q++) if (phases[q]![0] !== NO_CYCLE) { next = phases[q]![0]; break }
          const start = Math.max(ps, prevEnd)
          const end = Math.min(pe + 1, next)
          if (end > start) {
            pending.push({ start, end, kind: p as BarKind, reason: 0, subRow: 0, stall: -1, strip: false })
            prevEnd = end
          }
        }
      }
      for (const k of stallIds) {
        const start = s.start[k] ?? 0
        pushStall(pending, first, k, start, start + (s.length[k] ?? 0), s.reason[k] ?? 0, subRows ? stallPhase(phases, start) : 0)
      }
      if (pending.length === first) continue
      let lo = Infinity
      let hi = -Infinity
      for (let b = first; b < pending.length; b++) {
        lo = Math.min(lo, pending[b]!.start)
        hi = Math.max(hi, pending[b]!.end)
      }
      gInstr.push(i)
      gLane.push(lane)
      gFirst.push(first)
      gSpan.push([lo, hi])
    }
  }
  const groupCount = gInstr.length

  // Tracks: per lane, groups by start; each takes the lowest track free by then.
  const track = new Int32Array(groupCount)
  let tracks = 1
  const byLane = lists(laneCount, (g) => gLane[g]!, groupCount, (a, b) => gSpan[a]![0] - gSpan[b]![0] || a - b)
  for (let lane = 0; lane < laneCount; lane++) {
    const free: number[] = []
    for (let j = byLane.offsets[lane]!; j < byLane.offsets[lane + 1]!; j++) {
      const g = byLane.items[j]!
      const [lo, hi] = gSpan[g]!
      let t = free.findIndex((end) => end <= lo)
      if (t === -1) t = free.push(hi) - 1
      else free[t] = hi
      track[g] = t
    }
    tracks = Math.max(tracks, free.length)
  }

  const count = pending.length
  const bars = {
    count,
    start: new Int32Array(count),
    end: new Int32Array(count),
    kind: new Uint8Array(count),
    reason: new Uint8Array(count),
    stall: new Int32Array(count),
    strip: new Uint8Array(count),
    group: new Int32Array(count),
    band: new Int32Array(count),
  }
  const firstBar = new Int32Array(groupCount + 1)
  for (let g = 0; g < groupCount; g++) {
    const from = gFirst[g]!
    const to = g + 1 < groupCount ? gFirst[g + 1]! : count
    firstBar[g] = from
    for (let b = from; b < to; b++) {
      const p = pending[b]!
      bars.start[b] = p.start
      bars.end[b] = p.end
      bars.kind[b] = p.kind
      bars.reason[b] = p.reason
      bars.stall[b] = p.stall
      bars.strip[b] = p.strip ? 1 : 0
      bars.group[b] = g
      bars.band[b] = (gLane[g]! * rowsPerLane + p.subRow) * tracks + track[g]!
    }
  }
  firstBar[groupCount] = count

  const bandCount = laneCount * rowsPerLane * tracks
  const byStart = (a: number, b: number) => bars.start[a]! - bars.start[b]! || a - b
  const phaseIds: number[] = []
  const stallIds: number[] = []
  const stripIds: number[] = []
  for (let b = 0; b < count; b++) (bars.kind[b] !== STALL_KIND ? phaseIds : bars.strip[b] ? stripIds : stallIds).push(b)
  const bandLists = (ids: number[]) => {
    const l = lists(bandCount, (j) => bars.band[ids[j]!]!, ids.length, (a, b) => byStart(ids[a]!, ids[b]!))
    // The lists hold positions in ids; store bar indices instead.
    l.items.forEach((j, at) => (l.items[at] = ids[j]!))
    return l
  }
  const phaseBands = bandLists(phaseIds)
  const stallBands = bandLists(stallIds)
  const stripBands = bandLists(stripIds)

  const groupsByInstruction = lists(n, (g) => gInstr[g]!, groupCount)

  // Only instructions with phase bars take a colour: a vset* drawn nowhere, or only as
  // the grey of a stall, would waste a colour-blind-safe slot.
  const hasPhase = new Uint8Array(n)
  for (let b = 0; b < count; b++) if (bars.kind[b] !== STALL_KIND) hasPhase[gInstr[bars.group[b]!]!] = 1
  const colourOf = new Int32Array(n).fill(-1)
  const slotOfStatic = new Map<number, number>()
  const colourInstruction: number[] = []
  trace.instructions.forEach((ins, pos) => {
    if (!hasPhase[pos]) return
    let slot = slotOfStatic.get(ins.staticIndex)
    if (slot === undefined) {
      slot = colourInstruction.push(pos) - 1
      slotOfStatic.set(ins.staticIndex, slot)
    }
    colourOf[pos] = slot
  })

  const rowHeight = tracks * trackHeight
  const laneHeight = rowHeight * rowsPerLane
  const rows: ChartRow[] = []
  for (let lane = 0; lane < laneCount; lane++) {
    for (let r = 0; r < rowsPerLane; r++) {
      rows.push({ lane, phase: subRows ? PHASES[r]! : null, y: lane * (laneHeight + laneGap) + r * rowHeight, height: rowHeight })
    }
  }

  return {
    laneCount,
    cycles: trace.cycles,
    subRows,
    rowsPerLane,
    tracks,
    trackHeight,
    laneGap,
    laneHeight,
    height: laneCount === 0 ? 0 : laneCount * laneHeight + (laneCount - 1) * laneGap,
    rows,
    bars,
    groups: { count: groupCount, instruction: Int32Array.from(gInstr), lane: Int32Array.from(gLane), track, firstBar },
    phaseBands,
    stallBands,
    stripBands,
    groupsByInstruction,
    colourOf,
    colourInstruction: Int32Array.from(colourInstruction),
    instructionCount: n,
  }
}

/** Top edge in pixels of band `band` (lane x sub-row x track). */
export function bandY(layout: ChartLayout, band: number): number {
  const track = band % layout.tracks
  const row = (band - track) / layout.tracks
  const sub = row % layout.rowsPerLane
  const lane = (row - sub) / layout.rowsPerLane
  return lane * (layout.laneHeight + layout.laneGap) + (sub * layout.tracks + track) * layout.trackHeight
}

/**
 * Height of a stall strip in a track of `trackHeight` pixels: two fifths of
 * it, at least 2 pixels, so that the phase bar above it keeps most of its
 * height and the hatching still has room to show.
 */
export function stripHeight(trackHeight: number): number {
  return Math.max(2, Math.round(trackHeight * 0.4))
}

/** Where bar `b` is drawn in y: a whole track, or for a strip the bottom of it. */
export function barBox(layout: ChartLayout, b: number): { y: number; h: number } {
  const y = bandY(layout, layout.bars.band[b]!)
  if (!layout.bars.strip[b]) return { y, h: layout.trackHeight }
  const h = stripHeight(layout.trackHeight)
  return { y: y + layout.trackHeight - h, h }
}

export function bandCount(layout: ChartLayout): number {
  return layout.laneCount * layout.rowsPerLane * layout.tracks
}

export function stallReasonName(code: number): string {
  return STALL_REASONS[code] ?? 'unknown'
}

/** The same bars with another track height (the chart fits its height to the lanes it shows). */
export function withTrackHeight(layout: ChartLayout, trackHeight: number): ChartLayout {
  if (!(trackHeight > 0)) throw new RangeError(`trackHeight must be positive, got ${trackHeight}`)
  if (trackHeight === layout.trackHeight) return layout
  const rowHeight = layout.tracks * trackHeight
  const laneHeight = rowHeight * layout.rowsPerLane
  return {
    ...layout,
    trackHeight,
    laneHeight,
    height: layout.laneCount === 0 ? 0 : layout.laneCount * laneHeight + (layout.laneCount - 1) * layout.laneGap,
    rows: layout.rows.map((r, i) => ({ ...r, y: r.lane * (laneHeight + layout.laneGap) + (i % layout.rowsPerLane) * rowHeight, height: rowHeight })),
  }
}

/**
 * A track height that fits the lanes into about `target` pixels, between 4
 * and `maxTrack` pixels a track (below 4 a bar cannot be hovered; above the
 * maximum it only takes room).
 */
export function fittedTrackHeight(layout: ChartLayout, target: number, maxTrack = 14): number {
  const tracks = layout.laneCount * layout.rowsPerLane * layout.tracks
  const gaps = Math.max(0, layout.laneCount - 1) * layout.laneGap
  return Math.max(4, Math.min(maxTrack, Math.floor((target - gaps) / Math.max(1, tracks))))
}

export interface ChartSize {
  /** Pixels the lanes may take. */
  target: number
  /** Tallest track, in pixels. */
  maxTrack: number
}

/**
 * How tall the lanes may be in a window `viewportHeight` pixels tall: about
 * 42 % of it (40 % more with sub-rows), between 300 and 1100 pixels, so that
 * a 1280x800 laptop keeps the chart and its scrubber in view with room below,
 * and a 4K screen does not leave the lanes a strip at the top. Tracks may
 * grow from 14 pixels (a laptop) to 28 (4K) in step, so that a short run
 * fills the taller chart too.
 */
export function chartSize(viewportHeight: number, subRows: boolean): ChartSize {
  if (!(viewportHeight > 0)) throw new RangeError(`viewport height must be positive, got ${viewportHeight}`)
  const plain = Math.min(1100, Math.max(300, Math.round(0.42 * viewportHeight)))
  return {
    target: subRows ? Math.round(plain * 1.4) : plain,
    maxTrack: Math.min(28, Math.max(14, Math.floor(plain / 24))),
  }
}

/**
 * Present mode: the chart is nearly all there is on the screen (a caption
 * of about a third below it), so the lanes take about 56 % of the window's
 * height (64 % with sub-rows) and a track may be up to 64 pixels tall:
 * thick bars for a projector.
 */
export function presentChartSize(viewportHeight: number, subRows: boolean): ChartSize {
  if (!(viewportHeight > 0)) throw new RangeError(`viewport height must be positive, got ${viewportHeight}`)
  const target = Math.round((subRows ? 0.64 : 0.56) * viewportHeight)
  return { target, maxTrack: Math.min(64, Math.max(24, Math.floor(target / 8))) }
}
