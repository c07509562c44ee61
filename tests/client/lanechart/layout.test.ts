import { describe, expect, it } from 'vitest'
import { bandY, barBox, buildLayout, chartSize, fittedTrackHeight, STALL_KIND, stripHeight, withTrackHeight, type ChartLayout } from '@/lib/lanechart/layout'
import { buildTrace, twoLaneTrace } from './buildTrace'

/** Bars of one (instruction position, lane) as [kind, start, end] sorted, for readable expectations. */
function barsOf(layout: ChartLayout, instruction: number, lane: number): [number, number, number][] {
  const out: [number, number, number][] = []
  for (let g = 0; g < layout.groups.count; g++) {
    if (layout.groups.instruction[g] !== instruction || layout.groups.lane[g] !== lane) continue
    for (let b = layout.groups.firstBar[g]!; b < layout.groups.firstBar[g + 1]!; b++) out.push([layout.bars.kind[b]!, layout.bars.start[b]!, layout.bars.end[b]!])
  }
  return out.sort((a, b) => a[0] - b[0] || a[1] - b[1])
}

describe('lane chart layout', () => {
  it('has one bar group per lane and instruction with activity, none for a config instruction or an idle lane', () => {
    const layout = buildLayout(twoLaneTrace())
    const pairs = Array.from({ length: layout.groups.count }, (_, g) => `${layout.groups.instruction[g]}@${layout.groups.lane[g]}`)
    expect(pairs).toEqual(['1@0', '1@1', '2@0', '3@0', '3@1'])
  })

  // Bars are half-open [start, end): a phase from cycle 2 to 4 inclusive is [2, 5) (common practice).
  it.each([
    { what: 'overlapping phases are cut where the next phase starts', lane: [2, 2, 2, 4, 3, 8, 7, 9], bars: [[0, 2, 3], [1, 3, 7], [2, 7, 10]] },
    { what: 'a gap between execute and write stays empty', lane: [1, 1, 2, 2, 3, 4, 8, 8], bars: [[0, 2, 3], [1, 3, 5], [2, 8, 9]] },
    { what: 'a store has no write phase', lane: [1, 1, 5, 6, 7, 7, null, null], bars: [[0, 5, 7], [1, 7, 8]] },
    { what: 'a load has no read phase', lane: [1, 1, null, null, 4, 20, 18, 21], bars: [[1, 4, 18], [2, 18, 22]] },
  ] as const)('without sub-rows, $what', ({ lane, bars }) => {
    const trace = buildTrace({ lanes: 1, cycles: 30, instructions: [{ lanes: [[...lane]] }] })
    expect(barsOf(buildLayout(trace), 0, 0)).toEqual(bars)
  })

  it('with sub-rows, every phase is drawn whole in its own row', () => {
    const layout = buildLayout(twoLaneTrace(), { subRows: true })
    expect(barsOf(layout, 1, 0)).toEqual([[0, 2, 5], [1, 3, 9], [2, 7, 10], [STALL_KIND, 3, 4]])
    expect(layout.rows.map((r) => `${r.lane}:${r.phase}`)).toEqual(['0:read', '0:execute', '0:write', '1:read', '1:execute', '1:write'])
  })

  // Greedy interval partitioning by start time uses as many tracks as the deepest overlap
  // (Kleinberg and Tardos, Algorithm Design, section 4.1, "interval partitioning").
  it.each([
    { what: 'disjoint instructions share one track', spans: [[0, 3], [4, 6], [7, 9]], tracks: 1 },
    { what: 'two in flight need two tracks', spans: [[0, 5], [3, 8], [6, 9]], tracks: 2 },
    { what: 'three overlapping at one cycle need three', spans: [[0, 9], [2, 6], [4, 5], [7, 8]], tracks: 3 },
    { what: 'an instruction may start the cycle after another ends on the same track', spans: [[0, 4], [5, 9]], tracks: 1 },
  ])('tracks: $what', ({ spans, tracks }) => {
    const trace = buildTrace({ lanes: 1, cycles: 12, instructions: spans.map(([s, e]) => ({ lanes: [[1, 1, s!, e!, null, null, null, null]] })) })
    const layout = buildLayout(trace)
    expect(layout.tracks).toBe(tracks)
    // No two groups on one track overlap.
    for (let a = 0; a < layout.groups.count; a++) {
      for (let b = a + 1; b < layout.groups.count; b++) {
        if (layout.groups.track[a] !== layout.groups.track[b]) continue
        const [sa, ea] = spans[a]!
        const [sb, eb] = spans[b]!
        expect(ea! < sb! || eb! < sa!).toBe(true)
      }
    }
  })

  it.each([
    { what: 'a stall before the first read', stall: 1, row: 'read' },
    { what: 'a stall while reading', stall: 3, row: 'read' },
    { what: 'a stall after reading, while executing', stall: 6, row: 'execute' },
    { what: 'a stall after executing', stall: 9, row: 'write' },
    { what: 'a stall after the last phase', stall: 14, row: 'write' },
  ])('with sub-rows, $what goes in the $row row', ({ stall, row }) => {
    const trace = buildTrace({ lanes: 1, cycles: 20, instructions: [{ lanes: [[1, 1, 2, 4, 3, 8, 9, 10]] }], stalls: [[0, stall, 1, 'bank', 0]] })
    const layout = buildLayout(trace, { subRows: true })
    const b = Array.from({ length: layout.bars.count }, (_, i) => i).find((i) => layout.bars.kind[i] === STALL_KIND)!
    const y = bandY(layout, layout.bars.band[b]!)
    expect(layout.rows.find((r) => y >= r.y && y < r.y + r.height)?.phase).toBe(row)
  })

  it('gives instructions of one static instruction one colour slot, in order of first appearance, and none to an instruction without bars', () => {
    const trace = buildTrace({
      lanes: 1, cycles: 10,
      instructions: [5, 7, 5, 9, 7, 3].map((staticIndex, i) => ({ staticIndex, lanes: i === 5 ? [null] : [[1, 1, i, i, null, null, null, null]] })),
    })
    const layout = buildLayout(trace)
    expect(Array.from(layout.colourOf)).toEqual([0, 1, 0, 2, 1, -1])
    expect(Array.from(layout.colourInstruction)).toEqual([0, 1, 3])
  })

  it('gives no colour to an instruction drawn only as a stall', () => {
    const trace = buildTrace({ lanes: 1, cycles: 10, instructions: [{ lanes: [null] }, { lanes: [[1, 1, 4, 4, null, null, null, null]] }], stalls: [[0, 0, 3, 'frontend', 0]] })
    const layout = buildLayout(trace)
    expect(layout.groups.count).toBe(2)
    expect(Array.from(layout.colourOf)).toEqual([-1, 0])
  })

  it('stacks lanes with a gap and tracks inside them', () => {
    const layout = buildLayout(twoLaneTrace(), { trackHeight: 10, laneGap: 4 })
    expect(layout.tracks).toBe(2)
    expect(layout.laneHeight).toBe(20)
    expect(layout.height).toBe(44)
    expect([0, 1, 2, 3].map((band) => bandY(layout, band))).toEqual([0, 10, 24, 34])
  })

  it('refuses a trace whose lane times are too short, naming the expected size', () => {
    const trace = { ...twoLaneTrace(), laneTimes: new Int32Array(8) }
    expect(() => buildLayout(trace)).toThrow(/8 values, 64 expected \(4 instructions x 2 lanes x 8\)/)
  })

  it('refuses a track height of zero', () => {
    expect(() => buildLayout(twoLaneTrace(), { trackHeight: 0 })).toThrow(/trackHeight must be positive/)
  })
})

describe('track height', () => {
  it('re-heights a layout without moving its bars between bands', () => {
    const layout = buildLayout(twoLaneTrace(), { trackHeight: 10 })
    const taller = withTrackHeight(layout, 20)
    expect(taller.bars).toBe(layout.bars)
    expect(taller.height).toBe(2 * 40 + 4)
    expect(taller.rows.map((r) => r.y)).toEqual([0, 44])
    expect(bandY(taller, 3)).toBe(44 + 20)
  })

  it.each([
    { lanes: 2, target: 400, expected: 14, why: 'few tracks stop at 14 px' },
    { lanes: 2, target: 44, expected: 10, why: 'a tight target shares the height out' },
    { lanes: 2, target: 10, expected: 4, why: 'a tiny target stops at 4 px' },
  ])('fits the track height to the target: $why', ({ target, expected }) => {
    expect(fittedTrackHeight(buildLayout(twoLaneTrace()), target)).toBe(expected)
  })
})

describe('stalls over their own instruction', () => {
  /** Stall bars of the only group as [start, end, strip]. */
  const stallsOf = (layout: ChartLayout) =>
    Array.from({ length: layout.bars.count }, (_, b) => b)
      .filter((b) => layout.bars.kind[b] === STALL_KIND)
      .map((b) => [layout.bars.start[b]!, layout.bars.end[b]!, layout.bars.strip[b]!])

  // The saxpy case of the engine's stall rule (docs/model.md "Stalls"): a raw stall from cycle 12 to 44
  // while the lane reads from cycle 27 to 46; here reads 27-46, execute 28-50, write 48-51.
  const lane = [3, 3, 27, 46, 28, 50, 48, 51] as const
  const stalled = () => buildTrace({ lanes: 1, cycles: 60, instructions: [{ lanes: [[...lane]] }], stalls: [[0, 12, 33, 'raw', 0]] })

  it('cuts a stall where it meets a phase bar: full height before it, a strip over it', () => {
    const layout = buildLayout(stalled())
    expect(stallsOf(layout)).toEqual([[12, 27, 0], [27, 28, 1], [28, 45, 1]])
    // Every piece names the one stall span it comes from.
    expect(Array.from(layout.bars.stall).filter((k) => k !== -1)).toEqual([0, 0, 0])
    expect(Array.from(layout.stallBands.items).map((b) => layout.bars.start[b])).toEqual([12])
    expect(Array.from(layout.stripBands.items).map((b) => layout.bars.start[b])).toEqual([27, 28])
  })

  it('with sub-rows, cuts it against the row it is drawn in only', () => {
    // The stall starts before reading ends, so it goes in the read row and meets only the read bar.
    expect(stallsOf(buildLayout(stalled(), { subRows: true }))).toEqual([[12, 27, 0], [27, 45, 1]])
  })

  it('keeps a stall that meets no phase bar whole and full height', () => {
    const trace = buildTrace({ lanes: 1, cycles: 60, instructions: [{ lanes: [[...lane]] }], stalls: [[0, 52, 3, 'bank', 0]] })
    expect(stallsOf(buildLayout(trace))).toEqual([[52, 55, 0]])
  })

  it('draws a strip along the bottom of its track, two fifths of it and at least 2 pixels', () => {
    const layout = buildLayout(stalled(), { trackHeight: 10 })
    const strip = Array.from(layout.stripBands.items)[0]!
    expect(barBox(layout, strip)).toEqual({ y: 6, h: 4 })
    expect(barBox(layout, Array.from(layout.stallBands.items)[0]!)).toEqual({ y: 0, h: 10 })
    expect([4, 10, 14].map(stripHeight)).toEqual([2, 4, 6])
  })
})

describe('chart size from the window height', () => {
  it.each([
    { height: 800, target: 336, maxTrack: 14, why: 'a 1280x800 laptop keeps the 14 px tracks' },
    { height: 1080, target: 454, maxTrack: 18, why: 'a 1080p screen grows a little' },
    { height: 2160, target: 907, maxTrack: 28, why: '4K takes about 42 % of the height, tracks to 28 px' },
    { height: 500, target: 300, maxTrack: 14, why: 'a short window stops at 300 px' },
    { height: 4320, target: 1100, maxTrack: 28, why: 'an 8K window stops at 1100 px' },
  ])('$why', ({ height, target, maxTrack }) => {
    expect(chartSize(height, false)).toEqual({ target, maxTrack })
  })

  it('gives sub-rows 40 % more height with the same tracks', () => {
    expect(chartSize(800, true)).toEqual({ target: 470, maxTrack: 14 })
  })

  it('refuses a window of no height', () => {
    expect(() => chartSize(0, false)).toThrow(/viewport height must be positive/)
  })

  it('lets tracks grow to the given maximum only', () => {
    const layout = buildLayout(twoLaneTrace())
    expect(fittedTrackHeight(layout, 900, 28)).toBe(28)
    expect(fittedTrackHeight(layout, 900)).toBe(14)
  })
})
