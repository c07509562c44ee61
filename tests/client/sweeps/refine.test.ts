/** Brush to refine: the values a brushed range becomes, worked out by hand. */
import { describe, expect, it } from 'vitest'
import { REFINE_MAX_VALUES, refineSpec } from '@/lib/sweeps/refine'

describe('refining a brushed range', () => {
  it('takes every integer inside the range when they fit', () => {
    // Every 8 before; 16..33 inside the brush: 18 values, finer than the 3 run there (16, 24, 32).
    expect(refineSpec([8, 16, 24, 32, 40], 15.2, 33.9)).toBe('16..33')
  })

  it(`keeps at most ${REFINE_MAX_VALUES} values with the smallest whole step`, () => {
    // 1..256 brushed whole: 255 / 63 rounds up to a step of 5 (1, 6, ..., 256: 52 values).
    expect(refineSpec([1, 256], 1, 256)).toBe('1..256:5')
  })

  it('refuses a range with nothing finer to run, and non-numeric values', () => {
    expect(refineSpec([1, 2, 3, 4], 1.5, 3.5)).toBe(null)
    expect(refineSpec([4, 5], 4.2, 4.8)).toBe(null)
    expect(refineSpec(['serial', 'staggered'], 0, 1)).toBe(null)
  })

  it('spreads 64 values over a range of fractional values', () => {
    const spec = refineSpec([0.5, 1.5], 0.5, 1.5)?.split(',').map(Number) ?? []
    expect(spec).toHaveLength(REFINE_MAX_VALUES)
    expect(spec[0]).toBe(0.5)
    expect(spec[63]).toBe(1.5)
  })
})
