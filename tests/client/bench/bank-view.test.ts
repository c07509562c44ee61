/**
 * Issue 10: the register file's banks on screen. Word w of register p sits in
 * bank (p + w) mod banks (docs/model.md, the handbook's register-file layout);
 * the port use and the collisions come from the run's usage and stall spans.
 */
import { describe, expect, it } from 'vitest'
import { STALL_REASONS } from '@shared/sim/trace/types'
import { bankHeat, bankOfWord, collisionsOf, wordsPerLane } from '@/lib/bench/bankView'
import { run } from './fixtures'

describe('the bank view', () => {
  it('places word w of register p in bank (p + w) mod banks', () => {
    expect(bankOfWord(8, 3, 5)).toBe(1) // 11 mod 5, by hand
    expect(bankOfWord(8, 0, 4)).toBe(0)
    expect([0, 1, 2, 3, 4].map((w) => bankOfWord(2, w, 4))).toEqual([2, 3, 0, 1, 2])
  })

  // Two operands v16 and v24 on 8 banks with one port each: word w of both falls in bank (16 + w) mod 8 = (24 + w) mod 8,
  // so every read of the pair meets itself in one bank (by hand): the instruction is refused a port.
  const trace = run('    li a0, 256\n    vsetvli t0, a0, e64, m8, ta, ma\n    vfadd.vv v8, v16, v24\n', { rfBanks: 8, rfPortsPerBank: 1, vlen: 16384 }).trace

  it('counts words a lane holds: VLEN / 64 / lanes', () => {
    expect(wordsPerLane(trace)).toBe(16384 / 64 / 8)
  })

  it('sums port use per bank between 0 and 1 and counts the bank stalls as denials', () => {
    const heat = bankHeat(trace, { start: 0, end: trace.cycles }, 16)
    expect(heat.banks).toBe(8)
    expect(Array.from(heat.use).every((v) => v >= 0 && v <= 1)).toBe(true)
    expect(heat.peak).toBeGreaterThan(0)
    const bankStalls = Array.from({ length: trace.stalls.count }, (_, i) => i).filter((i) => trace.stalls.reason[i] === STALL_REASONS.indexOf('bank'))
    const stalled = bankStalls.reduce((a, i) => a + trace.stalls.length[i]!, 0)
    expect(stalled).toBeGreaterThan(0)
    expect(Array.from(heat.denied).reduce((a, v) => a + v, 0)).toBeCloseTo(stalled, 6)
  })

  it('lists where the instruction was refused a bank', () => {
    const add = trace.instructions.find((i) => i.op === 'vfadd.vv')!
    const c = collisionsOf(trace, add.index)
    expect(c.length).toBeGreaterThan(0)
    expect(c[0]!.length).toBeGreaterThan(0)
  })
})
