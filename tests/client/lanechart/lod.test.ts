import { describe, expect, it } from 'vitest'
import { bandCount, buildLayout } from '@/lib/lanechart/layout'
import { barsDrawList, colourKey, drawList, instructionBars, keyKind, keySlot, MIXED_SLOT } from '@/lib/lanechart/lod'
import { cycleScale } from '@/lib/lanechart/window'
import { buildTrace, twoLaneTrace } from './buildTrace'

/** One lane, `n` back-to-back one-cycle instructions of `statics` distinct static instructions. */
function stream(n: number, statics: number) {
  return buildTrace({
    lanes: 1, cycles: n,
    instructions: Array.from({ length: n }, (_, i) => ({ staticIndex: i % statics, lanes: [[1, 1, i, i, null, null, null, null]] })),
  })
}

describe('level of detail', () => {
  it('draws every bar as it is when zoomed in, in pixels', () => {
    const layout = buildLayout(twoLaneTrace())
    const list = drawList(layout, cycleScale({ start: 0, end: 20 }, 200), { only: 'phases' })
    expect(list.count).toBe(layout.phaseBands.items.length)
    // Instruction 1 lane 0: read [2, 3) at 10 px a cycle.
    const r = Array.from({ length: list.count }, (_, i) => i).find((i) => list.x[i] === 20 && list.y[i] === 0)!
    expect([list.w[r], list.h[r], keyKind(list.key[r]!), keySlot(list.key[r]!)]).toEqual([10, 10, 0, layout.colourOf[1]! + 1])
    expect(list.bar[r]).toBeGreaterThanOrEqual(0)
  })

  it.each([
    [{ start: 0, end: 2 }, 0],
    [{ start: 2, end: 3 }, 2],
    [{ start: 16, end: 20 }, 0],
  ])('leaves out bars outside the window %o', (w, count) => {
    const layout = buildLayout(twoLaneTrace())
    expect(drawList(layout, cycleScale(w, 100), { only: 'phases' }).count).toBe(count)
  })

  it('sums sub-pixel bars per pixel column: at most one rectangle per column and band, never the mixed grey', () => {
    const layout = buildLayout(stream(10_000, 7))
    const list = drawList(layout, cycleScale({ start: 0, end: 10_000 }, 500))
    expect(list.count).toBeLessThanOrEqual(bandCount(layout) * 500)
    expect(Array.from(list.key, keySlot).every((slot) => slot !== MIXED_SLOT)).toBe(true)
    expect(Array.from(list.bar).every((b) => b === -1)).toBe(true)
    // The columns tile the plot with no gap: 500 pixels in all.
    expect(Array.from(list.w).reduce((a, w) => a + w, 0)).toBeCloseTo(500, 6)
  })

  it('colours each zoomed-out pixel column by the instruction covering most of it (issue 10: a long run was a grey smear)', () => {
    // Blocks of 10 cycles: static instruction A for 7 one-cycle bars, then B for 3. At 10 cycles a pixel
    // every column is 70 % A, so the whole band is one rectangle in A's read colour.
    const n = 1000
    const trace = buildTrace({
      lanes: 1, cycles: n,
      instructions: Array.from({ length: n }, (_, i) => ({ staticIndex: i % 10 < 7 ? 0 : 1, lanes: [[1, 1, i, i, null, null, null, null]] })),
    })
    const layout = buildLayout(trace)
    const list = drawList(layout, cycleScale({ start: 0, end: n }, 100), { only: 'phases' })
    expect(list.count).toBe(1)
    expect(list.key[0]).toBe(colourKey(layout.colourOf[0]! + 1, 0))
    expect(list.w[0]).toBeCloseTo(100, 6)
  })

  it('draws zoomed-out stalls as a density: a column\'s height is its stalled share', () => {
    // One lane stalled 2 cycles in every 10, with no phase under it: at 10 cycles a pixel each column is 20 % stall.
    const n = 1000
    const stalls = Array.from({ length: n / 10 }, (_, k) => [0, k * 10 + 8, 2, 'raw', 0] as [number, number, number, 'raw', number])
    const trace = buildTrace({ lanes: 1, cycles: n, instructions: [{ lanes: [[1, 1, n - 1, n - 1, null, null, null, null]] }], stalls })
    const layout = buildLayout(trace, { trackHeight: 20 })
    const list = drawList(layout, cycleScale({ start: 0, end: n - 10 }, 99), { only: 'stalls' })
    expect(list.count).toBeGreaterThan(0)
    for (let r = 0; r < list.count; r++) {
      expect(keyKind(list.key[r]!)).toBe(3)
      expect(list.h[r]).toBe(4) // 20 px × 0.2
      expect(list.y[r]! + list.h[r]!).toBe(20) // from the bottom of the track
    }
  })

  it('keeps the colour of merged bars of one static instruction', () => {
    const layout = buildLayout(stream(1000, 1))
    const list = drawList(layout, cycleScale({ start: 0, end: 1000 }, 100))
    expect(list.count).toBe(1)
    expect(list.key[0]).toBe(colourKey(1, 0))
  })

  it('does not merge sub-pixel bars that are more than a pixel apart', () => {
    const trace = buildTrace({ lanes: 1, cycles: 1000, instructions: [0, 500, 999].map((c) => ({ lanes: [[1, 1, c, c, null, null, null, null]] })) })
    const list = drawList(buildLayout(trace), cycleScale({ start: 0, end: 1000 }, 100))
    expect(list.count).toBe(3)
    // Each is widened to the one-pixel minimum.
    expect(Array.from(list.w)).toEqual([1, 1, 1])
  })

  it('draws stalls after phases, so that the hatching lies on top', () => {
    const layout = buildLayout(twoLaneTrace())
    const list = drawList(layout, cycleScale({ start: 0, end: 20 }, 200))
    const kinds = Array.from(list.key, keyKind)
    expect(kinds.slice(-2)).toEqual([3, 3])
    expect(kinds.slice(0, -2).every((k) => k < 3)).toBe(true)
  })

  it('draws a stall strip along the bottom of the phase bar it lies on, after the full stalls', () => {
    // twoLaneTrace: the bank stall of instruction 1 in cycle 3 lies on its execute segment.
    const layout = buildLayout(twoLaneTrace(), { trackHeight: 10 })
    const list = drawList(layout, cycleScale({ start: 0, end: 20 }, 200))
    const last = list.count - 1
    expect([list.x[last], list.y[last], list.w[last], list.h[last], keyKind(list.key[last]!)]).toEqual([30, 6, 10, 4, 3])
    expect(layout.bars.strip[list.bar[last]!]).toBe(1)
  })

  it('lists every bar of an instruction across lanes for the selection', () => {
    const layout = buildLayout(twoLaneTrace())
    // Instruction 1: three segments in lane 0, a stall there, three segments in lane 1.
    expect(instructionBars(layout, 1)).toHaveLength(7)
    expect(instructionBars(layout, 0)).toEqual([])
    expect(instructionBars(layout, 99)).toEqual([])
  })

  it('refuses a minimum width of zero', () => {
    expect(() => drawList(buildLayout(twoLaneTrace()), cycleScale({ start: 0, end: 20 }, 200), { minWidth: 0 })).toThrow(/minWidth must be positive/)
  })
})

describe('selection draw list', () => {
  it('gives the visible bars of an instruction unmerged, at least a pixel wide', () => {
    const layout = buildLayout(twoLaneTrace())
    const list = barsDrawList(layout, cycleScale({ start: 0, end: 2000 }, 200), instructionBars(layout, 1))
    expect(list.count).toBe(7)
    expect(Math.min(...list.w)).toBe(1)
    expect(barsDrawList(layout, cycleScale({ start: 15, end: 20 }, 200), instructionBars(layout, 1)).count).toBe(0)
  })
})
