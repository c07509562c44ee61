import { describe, expect, it } from 'vitest'
import { bandAt, hitTest } from '@/lib/lanechart/hit'
import { buildLayout, STALL_KIND, stallReasonName } from '@/lib/lanechart/layout'
import { twoLaneTrace } from './buildTrace'

// twoLaneTrace with track height 10, lane gap 4: lane 0 tracks at y 0-9 and 10-19, lane 1 at 24-33 and 34-43.
const layout = buildLayout(twoLaneTrace(), { trackHeight: 10, laneGap: 4 })

describe('hit testing', () => {
  it.each([
    { what: 'the read segment of instruction 1 in lane 0', cycle: 2.5, y: 5, hit: { instruction: 1, lane: 0, kind: 0 } },
    { what: 'its execute segment', cycle: 5, y: 5, hit: { instruction: 1, lane: 0, kind: 1 } },
    { what: 'the segment under a stall strip, with the strip as its stall', cycle: 3.2, y: 5, hit: { instruction: 1, lane: 0, kind: 1 }, stall: 'bank strip' },
    { what: 'a segment with no stall on it', cycle: 4.5, y: 5, hit: { instruction: 1, lane: 0, kind: 1 }, stall: 'none' },
    { what: 'instruction 2 on the second track', cycle: 8, y: 15, hit: { instruction: 2, lane: 0, kind: 1 } },
    { what: 'the raw stall before instruction 2 reads, as its own stall', cycle: 4.5, y: 15, hit: { instruction: 2, lane: 0, kind: 3 }, stall: 'raw bar' },
    { what: 'instruction 3 in lane 1', cycle: 12.9, y: 28, hit: { instruction: 3, lane: 1, kind: 0 } },
  ])('finds $what', ({ cycle, y, hit, stall }) => {
    const found = hitTest(layout, cycle, y)
    expect(found).toMatchObject(hit)
    if (stall === undefined) return
    const s = found!.stall
    expect(s === -1 ? 'none' : `${stallReasonName(layout.bars.reason[s]!)} ${layout.bars.strip[s] ? 'strip' : 'bar'}`).toBe(stall)
    if (s !== -1 && found!.kind === STALL_KIND) expect(s).toBe(found!.bar)
  })

  it.each([
    { what: 'the gap between lanes', cycle: 5, y: 21 },
    { what: 'below the last lane', cycle: 5, y: 44 },
    { what: 'above the chart', cycle: 5, y: -1 },
    { what: 'an empty stretch of a track', cycle: 18, y: 5 },
  ])('finds nothing in $what', ({ cycle, y }) => {
    expect(hitTest(layout, cycle, y)).toBeNull()
  })

  it('reaches a bar within the tolerance, the nearest one first', () => {
    expect(hitTest(layout, 17, 5)).toBeNull()
    expect(hitTest(layout, 17, 5, { tolerance: 1.5 })).toMatchObject({ instruction: 3, kind: 1 })
  })

  it('maps y to bands lane by lane, skipping the gaps', () => {
    expect([0, 9.9, 10, 19.9, 20, 24, 43.9].map((y) => bandAt(layout, y))).toEqual([0, 0, 1, 1, -1, 2, 3])
  })

  it('refuses a negative tolerance', () => {
    expect(() => hitTest(layout, 1, 1, { tolerance: -1 })).toThrow(/tolerance/)
  })
})
