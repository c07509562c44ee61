import { describe, expect, it } from 'vitest'
import { dependencyArrows } from '@/lib/lanechart/dependencies'
import { buildLayout } from '@/lib/lanechart/layout'
import { buildTrace, twoLaneTrace } from './buildTrace'

const trace = twoLaneTrace()
const pairs = [{ from: 1, to: 2 }, { from: 2, to: 3 }]

describe('dependency arrows', () => {
  it('draws nothing without a selection', () => {
    expect(dependencyArrows(trace, buildLayout(trace), pairs, null)).toEqual([])
  })

  it('draws, for the selected consumer, one arrow per lane where both are active, from first write to first read', () => {
    const layout = buildLayout(trace, { trackHeight: 10 })
    // Instruction 2 is active in lane 0 only; 1 writes from cycle 7, 2 reads from 6 (track 1).
    expect(dependencyArrows(trace, layout, pairs, 2)).toEqual([
      { from: 1, to: 2, lane: 0, fromCycle: 7.5, fromY: 5, toCycle: 6.5, toY: 15 },
      { from: 2, to: 3, lane: 0, fromCycle: 11.5, fromY: 15, toCycle: 12.5, toY: 5 },
    ])
  })

  it('uses the write and read sub-rows when the lanes have sub-rows', () => {
    const layout = buildLayout(trace, { trackHeight: 10, subRows: true })
    const [arrow] = dependencyArrows(trace, layout, [{ from: 1, to: 3 }], 1)
    // Lane 0: 2 tracks a sub-row; write row starts at 40, read row at 0.
    expect(arrow).toMatchObject({ fromY: 45, toY: 5, fromCycle: 7.5, toCycle: 12.5 })
  })

  it('points at the first read after the producer wrote, not at an earlier read of another operand', () => {
    const t = buildTrace({
      lanes: 1, cycles: 30,
      instructions: [
        { lanes: [[1, 1, null, null, 2, 9, 10, 12]] },
        { lanes: [[1, 1, 4, 20, 5, 22, 23, 24]] },
      ],
    })
    const [arrow] = dependencyArrows(t, buildLayout(t), [{ from: 0, to: 1 }], 1)
    // The consumer starts reading at 4 (its other operand); the produced word is first written at 10, read at 11.
    expect(arrow).toMatchObject({ fromCycle: 10.5, toCycle: 11.5 })
  })

  it('skips pairs that name instructions the trace does not have', () => {
    expect(dependencyArrows(trace, buildLayout(trace), [{ from: 1, to: 42 }], 1)).toEqual([])
  })
})
