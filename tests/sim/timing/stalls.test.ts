import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { parseMachine } from '../../../shared/schemas/machine'
import { simulate } from '../../../shared/sim/timing/simulate'
import type { TimingTrace } from '../../../shared/sim/trace/types'
import { STALL_REASONS, laneStallAt, stallCountsAt } from '../../../shared/sim/trace/types'
import { caseArb, machineOf } from './arbitraries'
import { buildOp, buildStream } from './factories'

/** Every (lane, cycle) a stall span covers, with its reason and instruction; a lane-cycle covered twice throws. */
function stallCells(trace: TimingTrace): Map<string, { reason: number; instruction: number }> {
  const cells = new Map<string, { reason: number; instruction: number }>()
  const s = trace.stalls
  for (let i = 0; i < s.count; i++) {
    for (let c = s.start[i]!; c < s.start[i]! + s.length[i]!; c++) {
      const key = `${s.lane[i]}:${c}`
      if (cells.has(key)) throw new Error(`lane-cycle ${key} has two stall reasons`)
      cells.set(key, { reason: s.reason[i]!, instruction: s.instruction[i]! })
    }
  }
  return cells
}

const vfadd = (vs2: number, vs1: number, vl: number) => buildOp({ vl, text: `vfadd.vv v3, v${vs2}, v${vs1}`, dstRegs: [3], srcRegs: [[vs2], [vs1]] })

describe('bank stalls of a lane that also makes progress (docs/model.md "Stalls")', () => {
  // Handbook section 5: word w of physical register p is in bank (p + w) mod rfBanks, one read or write
  // per port and cycle, reads granted oldest first and, within an instruction, in operand order. Before
  // renaming, v1..v31 are physical 1..31; the destination takes physical 32 (lowest free number first).
  // With 6 single-port banks, v1 and v7 (1 and 7 mod 6 = 1) put every word w of both sources in the same
  // bank. In cycle 1 the first source reads word 0 and the second is denied: one bank stall in every lane.
  // From then on the second reads word w while the first reads word w + 1, one bank further: no conflict.
  // Beat j waits for word j of the second source (read in cycle j + 2), so beats run 3..b+2 and the run
  // takes b + D + 3 cycles, one more than the conflict-free closed form b + D + 2. Word w of the result
  // is written in cycle w + 7 (D = 4) to bank (32 + w) mod 6 = (w + 2) mod 6, while the sources read
  // words w + 6 and w + 5, banks (p + w + 6) and (p + w + 5) mod 6: a write meets a read only when
  // p = 2 or 3 (mod 6), so the pairs below (p = 1, 4, 5) have no other conflict.
  // Cycle 0 is the dispatch cycle: every lane waits for the instruction the front end is dispatching, one
  // `frontend` stall a lane (docs/model.md "Stalls": no lane-cycle before the lane's last work is idle).
  it.each([
    [1, 7],
    [4, 10],
    [5, 11],
  ])('counts exactly one bank stall cycle per lane when v%i and v%i share their banks (vl 64, 8 lanes, 6 banks)', (a, b) => {
    const m = parseMachine({ lanes: 8, rfBanks: 6, rfPortsPerBank: 1 })
    const { trace, error } = simulate(buildStream([vfadd(a, b, 64)]), m)
    expect(error).toBeUndefined()
    const beats = 64 / 8
    const D = m.units.fpu.latency
    expect(trace.cycles).toBe(beats + D + 3)
    expect(trace.metrics.stallCycles).toEqual({ ...Object.fromEntries(STALL_REASONS.map((r) => [r, 0])), bank: 8, frontend: 8 })
    expect(trace.instructions[0]!.stalls.bank).toBe(8)
    for (let l = 0; l < 8; l++) {
      expect(laneStallAt(trace, l, 0)).toEqual({ reason: 'frontend', instruction: 0 })
      expect(laneStallAt(trace, l, 1)).toEqual({ reason: 'bank', instruction: 0 })
      for (let c = 2; c < trace.cycles; c++) expect(laneStallAt(trace, l, c)).toBeNull()
    }
  })

  it.each([
    ['sources in different banks (v1, v2)', 1, 2, {}],
    ['two ports a bank (v1, v7)', 1, 7, { rfPortsPerBank: 2 }],
  ])('counts no bank stall with %s, and the run takes b + D + 2 cycles', (_name, a, b, extra) => {
    const m = parseMachine({ lanes: 8, rfBanks: 6, rfPortsPerBank: 1, ...extra })
    const { trace } = simulate(buildStream([vfadd(a as number, b as number, 64)]), m)
    expect(trace.cycles).toBe(8 + m.units.fpu.latency + 2)
    expect(trace.metrics.stallCycles.bank).toBe(0)
    // Only the dispatch cycle 0 of each lane (frontend), as above.
    expect(trace.metrics.stallCycles.frontend).toBe(8)
    expect(trace.stalls.count).toBe(8)
  })
})

describe('stall accounting on random streams (fast-check; model properties, common practice)', () => {
  it('gives each lane-cycle at most one reason, inside the run, and never more stall cycles than lanes x cycles', () => {
    fc.assert(
      fc.property(caseArb, ({ c, ops }) => {
        const { trace } = simulate(buildStream(ops), machineOf(c))
        const cells = stallCells(trace)
        for (const key of cells.keys()) {
          const [lane, cycle] = key.split(':').map(Number) as [number, number]
          expect(lane).toBeLessThan(c.lanes)
          expect(cycle).toBeLessThan(trace.cycles)
        }
        const total = Object.values(trace.metrics.stallCycles).reduce((x, y) => x + y, 0)
        expect(total).toBe(cells.size)
        expect(total).toBeLessThanOrEqual(c.lanes * trace.cycles)
      }),
      { numRuns: 150 },
    )
  })

  it('counts, per instruction and reason, at least the lane stall cycles attributed to it', () => {
    fc.assert(
      fc.property(caseArb, ({ c, ops }) => {
        const { trace } = simulate(buildStream(ops), machineOf(c))
        const attributed = new Map<string, number>()
        for (const { reason, instruction } of stallCells(trace).values()) {
          const key = `${instruction}:${STALL_REASONS[reason]}`
          attributed.set(key, (attributed.get(key) ?? 0) + 1)
        }
        for (const [key, n] of attributed) {
          const [inst, reason] = key.split(':') as [string, (typeof STALL_REASONS)[number]]
          expect(trace.instructions[Number(inst)]!.stalls[reason]).toBeGreaterThanOrEqual(n)
        }
      }),
      { numRuns: 150 },
    )
  })
})

describe('stallCountsAt', () => {
  it('names the count at offset + k after the k-th reason of STALL_REASONS, for a per-instruction row and the run totals', () => {
    const counts = Float64Array.from({ length: 3 * STALL_REASONS.length }, (_, i) => 100 + i)
    const at = STALL_REASONS.length
    const named = stallCountsAt(counts, at)
    expect(Object.keys(named).sort()).toEqual([...STALL_REASONS].sort())
    STALL_REASONS.forEach((r, k) => expect(named[r]).toBe(100 + at + k))
  })
})
