import { describe, expect, it } from 'vitest'
import { chartLabel, describeHit } from '@/lib/lanechart/describe'
import { hitTest } from '@/lib/lanechart/hit'
import { buildLayout } from '@/lib/lanechart/layout'
import { buildTrace, twoLaneTrace } from './buildTrace'

describe('chart words', () => {
  it.each([
    [8, 120, 12, 'Lane chart: 8 lanes, 120 cycles, 12 instructions'],
    [1, 1, 1, 'Lane chart: 1 lane, 1 cycle, 1 instruction'],
    [16, 12480, 1000, 'Lane chart: 16 lanes, 12,480 cycles, 1,000 instructions'],
  ])('summarises a run of %i lanes, %i cycles, %i instructions for screen readers', (lanes, cycles, n, label) => {
    const trace = buildTrace({ lanes, cycles, instructions: Array.from({ length: n }, () => ({ lanes: [] })) })
    expect(chartLabel(trace)).toBe(label)
  })

  it('describes a hovered phase bar with the lane record of its instruction', () => {
    const trace = twoLaneTrace()
    const layout = buildLayout(trace)
    const info = describeHit(trace, layout, hitTest(layout, 5, 5)!)
    expect(info).toEqual({
      index: 1, text: 'vfadd.vv v8, v8, v16', lane: 0, elements: 2, beats: 2,
      read: { start: 2, end: 4 }, execute: { start: 3, end: 8 }, write: { start: 7, end: 9 },
      phase: 'execute', stall: null,
    })
  })

  it('describes a hovered stall with its reason and cycles', () => {
    const trace = twoLaneTrace()
    const layout = buildLayout(trace)
    const info = describeHit(trace, layout, hitTest(layout, 4.5, 15)!)
    expect(info.stall).toEqual({ reason: 'raw', start: 4, end: 5 })
    expect(info.phase).toBeNull()
    expect(info.write).toEqual({ start: 11, end: 11 })
  })

  it('describes a phase bar with a stall strip on it as that phase, naming the whole stall span', () => {
    // One lane: a raw stall from cycle 1 to 6 while the lane reads from cycle 3 (full bar 1-2, strip 3-6).
    const trace = buildTrace({ lanes: 1, cycles: 12, instructions: [{ lanes: [[2, 2, 3, 8, 4, 9, 9, 10]] }], stalls: [[0, 1, 6, 'raw', 0]] })
    const layout = buildLayout(trace, { trackHeight: 10 })
    const onStrip = describeHit(trace, layout, hitTest(layout, 3.5, 9)!)
    expect([onStrip.phase, onStrip.stall]).toEqual(['read', { reason: 'raw', start: 1, end: 6 }])
    const before = describeHit(trace, layout, hitTest(layout, 1.5, 5)!)
    expect([before.phase, before.stall]).toEqual([null, { reason: 'raw', start: 1, end: 6 }])
    expect(describeHit(trace, layout, hitTest(layout, 7.5, 5)!).stall).toBeNull()
  })
})
