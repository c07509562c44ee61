import { describe, expect, it } from 'vitest'
import { cycleAtPx, cycleTicks, formatCycle } from '@/lib/lanechart/ruler'
import { cycleScale } from '@/lib/lanechart/window'

describe('cycle ruler', () => {
  it.each([
    [{ start: 0, end: 120 }, 600, [0, 20, 40, 60, 80, 100]],
    [{ start: 0.5, end: 4.5 }, 800, [1, 2, 3, 4]],
    [{ start: 1000, end: 3000 }, 400, [1000, 1500, 2000, 2500]],
  ])('puts integer ticks about every 80 px in %o', (w, width, expected) => {
    expect(cycleTicks(cycleScale(w, width)).map((t) => t.cycle)).toEqual(expected)
  })

  it('places a tick in the middle of its cycle column', () => {
    const [tick] = cycleTicks(cycleScale({ start: 0, end: 4 }, 400))
    expect(tick).toEqual({ cycle: 0, x: 50, label: '0', anchor: 'middle' })
  })

  it.each([
    // Cycle 0 sits at x = 0.015 px: a centred label would hang off the left edge.
    ['the first label, at the left edge', { start: 0, end: 40_000 }, 0, 'start'],
    // Cycle 38,000 sits 18 px from the right edge of 1,200 px over 38,600 cycles: too close to centre.
    ['the last label, near the right edge', { start: 0, end: 38_600 }, -1, 'end'],
  ] as const)('hangs %s inwards', (_what, w, at, anchor) => {
    expect(cycleTicks(cycleScale(w, 1200)).at(at)!.anchor).toBe(anchor)
  })


  it.each([
    [7, '7'],
    [12480, '12,480'],
    [5_000_000, '5,000,000'],
  ])('groups the digits of cycle %i by thousands', (cycle, label) => {
    expect(formatCycle(cycle)).toBe(label)
  })

  it.each([
    [0, 0],
    [49.9, 0],
    [50, 1],
    [-20, 0],
    [10_000, 3],
  ])('a click at %f px lands on cycle %i, clamped to the run', (px, cycle) => {
    expect(cycleAtPx(cycleScale({ start: 0, end: 4 }, 200), px, 4)).toBe(cycle)
  })
})
