/**
 * The peak follows the element width (timing model section 10): a lane does
 * 2 x fpuElementsPerCycle[SEW] flops a cycle with FMAs at SEW. Defaults: one
 * FP64 and two FP32 elements a beat (common practice: a 64-bit FPU datapath
 * splits into two 32-bit ones), so 8 lanes peak at 16 FP64 or 32 FP32 flops a
 * cycle. A run's peak is the flops-weighted harmonic mean of its widths' peaks.
 */
import { describe, expect, it } from 'vitest'
import { parseMachine } from '../../../shared/schemas/machine'
import { simulate } from '../../../shared/sim/timing/simulate'
import { buildStream, fma } from './factories'

const fmaAt = (sew: 32 | 64, d: number, vl: number) => ({ ...fma(d, 1, 2, vl), sew, eew: sew })

describe('peak flops per cycle by element width', () => {
  const m = parseMachine({ lanes: 8 })

  it('is 32 for an FP32 FMA stream and 16 for FP64 on 8 lanes (8 x 2 x 2 and 8 x 2 x 1)', () => {
    const f32 = simulate(buildStream([fmaAt(32, 8, 64), fmaAt(32, 9, 64)]), m).trace.metrics
    expect(f32.peakFlopsPerCycle).toBe(32)
    expect(f32.flopsBySew).toEqual({ '16': 0, '32': 2 * 2 * 64, '64': 0 })
    const f64 = simulate(buildStream([fmaAt(64, 8, 64)]), m).trace.metrics
    expect(f64.peakFlopsPerCycle).toBe(16)
    expect(f64.peakFlopsPerCycleBySew).toEqual({ '16': 8 * 2 * 4, '32': 32, '64': 16 })
  })

  it('weights a mixed run by flops: equal FP32 and FP64 flops peak at 1 / (0.5 / 32 + 0.5 / 16) = 64 / 3', () => {
    // The flops need 0.5F / 32 + 0.5F / 16 cycles at peak, so the run's peak is F over that.
    const t = simulate(buildStream([fmaAt(32, 8, 64), fmaAt(64, 9, 64)]), m).trace.metrics
    expect(t.peakFlopsPerCycle).toBeCloseTo(64 / 3, 10)
  })

  it('follows fpuElementsPerCycle: 4 FP32 elements a beat on 4 lanes peak at 4 x 2 x 4 = 32', () => {
    const t = simulate(buildStream([fmaAt(32, 8, 64)]), parseMachine({ lanes: 4, fpuElementsPerCycle: { '32': 4 } })).trace.metrics
    expect(t.peakFlopsPerCycle).toBe(32)
  })

  it("is FP64's peak for a run without FP work", () => {
    const t = simulate(buildStream([]), m).trace.metrics
    expect(t.flops).toBe(0)
    expect(t.peakFlopsPerCycle).toBe(16)
  })
})
