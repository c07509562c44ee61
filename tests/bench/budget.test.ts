import { describe, expect, it } from 'vitest'
import { budgetRow, usesOf } from '../../scripts/bench/budget'
import type { ResourceInfo, TimingTrace } from '../../shared/sim/trace/types'

/** A trace holding only what usesOf reads: its cycles, resources and usage rows. */
function traceOf(resources: ResourceInfo['kind'][], rows: { resource: number; start: number; length: number; amount: number; instruction: number }[], cycles: number): TimingTrace {
  return {
    cycles,
    resources: resources.map((kind, id) => ({ id, kind, name: `${kind} ${id}`, lane: kind === 'bus' ? null : 0, capacity: 1 })),
    usage: {
      count: rows.length,
      resource: Uint32Array.from(rows, (r) => r.resource),
      start: Int32Array.from(rows, (r) => r.start),
      length: Int32Array.from(rows, (r) => r.length),
      amount: Uint16Array.from(rows, (r) => r.amount),
      instruction: Int32Array.from(rows, (r) => r.instruction),
    },
  } as unknown as TimingTrace
}

describe('usesOf: the uses behind usage rows (scripts/bench/budget.ts)', () => {
  it('gives a lane resource amount x length uses, a bus one use a cycle, in cycle order', () => {
    // Rows as SpanRecorder writes them: bank 0 used twice a cycle by instruction 4 over cycles 2..4
    // (a 2-port bank), the unit once at cycle 3 by instruction 5, the bus moving 512 bits at cycles 1..2.
    const trace = traceOf(['bank', 'unit', 'bus'], [
      { resource: 2, start: 1, length: 2, amount: 512, instruction: 3 },
      { resource: 0, start: 2, length: 3, amount: 2, instruction: 4 },
      { resource: 1, start: 3, length: 1, amount: 1, instruction: 5 },
    ], 6)
    const u = usesOf(trace)
    // By hand: 2 bus uses + 2 x 3 bank uses + 1 unit use = 9.
    expect(u.count).toBe(9)
    expect(Array.from(u.cycle)).toEqual([1, 2, 2, 2, 3, 3, 3, 4, 4])
    expect(Array.from(u.resource)).toEqual([2, 2, 0, 0, 0, 0, 1, 0, 0])
    expect(Array.from(u.inst)).toEqual([3, 3, 4, 4, 4, 4, 5, 4, 4])
    expect(u.resources).toBe(3)
  })

  it('keeps the uses of a row that reaches past the last cycle of the run', () => {
    // A divider's beat at cycle 4 holds its unit for 3 cycles (one row of length 3) in a run of 5 cycles.
    const u = usesOf(traceOf(['unit'], [{ resource: 0, start: 4, length: 3, amount: 1, instruction: 1 }], 5))
    expect(u.count).toBe(3)
    expect(Array.from(u.cycle)).toEqual([4, 5, 6])
  })
})

describe('budgetRow: how a run must spend its time at the target (scripts/bench/budget.ts)', () => {
  it('splits the time allowed at 0.5 into usage spans, the loop work of the timed lanes and what is left', () => {
    // The loop: 800,000 lane-cycles in 16 ms, 20 ns a lane-cycle. A run of 1,000 cycles on 8 lanes is
    // credited 8,000 lane-cycles, 0.16 ms at the loop's rate, so 0.32 ms at 0.5. Timing 2 lanes costs at
    // least 2,000 x 20 ns = 0.04 ms of loop work; its usage spans cost 1.0 - 0.9 = 0.1 ms; the least trace 0.02.
    const b = budgetRow({ lanes: 8, timed: 2, cycles: 1000, bareMs: 16, bareLaneCycles: 800_000, runMs: 1.0, noUsageMs: 0.9, leastUsageMs: 0.02, target: 0.5 })
    expect(b.atTarget).toBeCloseTo(0.32, 12)
    expect(b.loopWork).toBeCloseTo(0.04, 12)
    expect(b.usage).toBeCloseTo(0.1, 12)
    expect(b.left).toBeCloseTo(0.32 - 0.1 - 0.04, 12)
    expect(b.leftLeast).toBeCloseTo(0.32 - 0.02 - 0.04, 12)
    expect(b.restNow).toBeCloseTo(1.0 - 0.1 - 0.04, 12)
  })

  it('counts no negative cost when the run without usage spans happened to be slower', () => {
    const b = budgetRow({ lanes: 8, timed: 8, cycles: 1000, bareMs: 16, bareLaneCycles: 800_000, runMs: 1.0, noUsageMs: 1.1, leastUsageMs: 0, target: 0.5 })
    expect(b.usage).toBe(0)
  })
})
