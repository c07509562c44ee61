import { describe, expect, it } from 'vitest'
import { explainStalls } from '@/lib/bench/stallExplanation'
import { STALL_REASONS } from '@shared/sim/trace/types'
import { handTrace, run } from './fixtures'

const BANK = STALL_REASONS.indexOf('bank')
const RAW = STALL_REASONS.indexOf('raw')
const two = [
  { text: 'vfmacc.vv v4,v8,v12', lanes: [[4, 4, 1, 4, 2, 9, 6, 9], [4, 4, 1, 4, 2, 9, 6, 9]] as [number, number, number, number, number, number, number, number][] },
  { text: 'vfadd.vv v5,v4,v4', lanes: [[4, 4, 10, 13, 11, 18, 15, 18], [4, 4, 10, 13, 11, 18, 15, 18]] as [number, number, number, number, number, number, number, number][] },
]

describe('explainStalls', () => {
  it('names the lane and instruction that waited longest for the most common reason', () => {
    const trace = handTrace(two, [
      { lane: 0, start: 2, length: 20, reason: BANK, instruction: 0 },
      { lane: 0, start: 30, length: 11, reason: BANK, instruction: 0 },
      { lane: 1, start: 2, length: 9, reason: BANK, instruction: 1 },
      { lane: 1, start: 12, length: 25, reason: RAW, instruction: 1 },
    ])
    const e = explainStalls(trace)!
    expect(e).toMatchObject({ reason: 'bank', lane: 0, instruction: 0, cycles: 31, reasonCycles: 40, totalCycles: 65 })
    expect(e.sentence).toBe('lane 0 waits 31 cycles on bank conflicts in vfmacc.vv v4,v8,v12 (#0); 40 of 65 stall cycles over all lanes are bank conflicts.')
  })

  it('breaks a tie between lanes in favour of the lower lane', () => {
    const trace = handTrace(two, [
      { lane: 1, start: 2, length: 5, reason: RAW, instruction: 1 },
      { lane: 0, start: 2, length: 5, reason: RAW, instruction: 1 },
    ])
    expect(explainStalls(trace)?.lane).toBe(0)
  })

  it('says nothing when no lane ever waited', () => {
    expect(explainStalls(handTrace(two))).toBeNull()
  })

  it('explains a real run: the dot product waits longest on the ring (timing model section 8: L - 1 ring steps)', () => {
    const src = `    li a0, 64\n    vsetvli t0, a0, e64, m1, ta, ma\n    vfmv.s.f v1, fa0\n    vfredusum.vs v2, v8, v1\n`
    const e = explainStalls(run(src, { lanes: 8 }).trace)
    expect(e?.reason).toBe('ring')
    expect(e?.sentence).toMatch(/^lane \d+ waits \d+ cycles? for the ring in vfredusum\.vs/)
  })
})
