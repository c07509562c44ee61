import { describe, expect, it } from 'vitest'
import { chartSize, presentChartSize } from '@/lib/lanechart/layout'

describe('Present mode chart size', () => {
  it('at 1920x1080 gives the lanes 56 % of the height and tracks up to 64 px, against 42 % and 18 px on the Bench', () => {
    // 0.56 x 1080 = 604.8 -> 605; tracks: min(64, max(24, floor(605 / 8) = 75)) = 64.
    expect(presentChartSize(1080, false)).toEqual({ target: 605, maxTrack: 64 })
    // The Bench: 0.42 x 1080 = 453.6 -> 454; tracks: min(28, max(14, floor(454 / 24) = 18)) = 18.
    expect(chartSize(1080, false)).toEqual({ target: 454, maxTrack: 18 })
    // Sub-rows: 0.64 x 1080 = 691.2 -> 691.
    expect(presentChartSize(1080, true).target).toBe(691)
    expect(() => presentChartSize(0, false)).toThrow(RangeError)
  })
})
