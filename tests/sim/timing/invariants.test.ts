import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { simulate } from '../../../shared/sim/timing/simulate'
import type { TimingTrace } from '../../../shared/sim/trace/types'
import { expandUsage, laneTiming } from '../../../shared/sim/trace/types'
import { caseArb, machineOf } from './arbitraries'
import { buildStream, fma } from './factories'
import { parseMachine } from '../../../shared/schemas/machine'

// Model properties (common practice): checked on random streams of every shape.

function usePerCycle(trace: TimingTrace): Map<number, Map<number, number>> {
  const byRes = new Map<number, Map<number, number>>()
  // One span a row: a row may stand for alike lanes (UsageSpans.copies).
  const u = expandUsage(trace.usage)
  for (let i = 0; i < u.count; i++) {
    const r = u.resource[i]!
    const m = byRes.get(r) ?? new Map<number, number>()
    byRes.set(r, m)
    for (let c = u.start[i]!; c < u.start[i]! + u.length[i]!; c++) m.set(c, (m.get(c) ?? 0) + u.amount[i]!)
  }
  return byRes
}

describe.each(['ring', 'tree'] as const)('timing invariants on random streams (fast-check), interLane %s', (interLane) => {
  it('finishes every run, with every lane phase ordered: read before execute before write', () => {
    fc.assert(
      fc.property(caseArb, ({ c, ops }) => {
        const { trace, error } = simulate(buildStream(ops), machineOf(c, interLane))
        expect(error).toBeUndefined()
        for (const ins of trace.instructions) {
          expect(ins.complete).not.toBeNull()
          for (let l = 0; l < c.lanes; l++) {
            const t = laneTiming(trace, ins.index, l)
            if (t.readStart === null) continue
            expect(t.readStart).toBeLessThanOrEqual(t.readEnd!)
            expect(t.execStart!).toBeLessThanOrEqual(t.execEnd!)
            expect(t.writeStart!).toBeLessThanOrEqual(t.writeEnd!)
            expect(t.readStart).toBeLessThanOrEqual(t.execStart!)
            expect(t.execStart!).toBeLessThanOrEqual(t.writeStart!)
            expect(t.readEnd!).toBeLessThanOrEqual(t.execEnd!)
            expect(t.execEnd!).toBeLessThanOrEqual(t.writeEnd!)
            expect(t.writeEnd!).toBeLessThan(trace.cycles)
          }
        }
      }),
      { numRuns: 150 },
    )
  })

  it('never uses a port, unit, bus or ring link beyond its capacity in any cycle', () => {
    fc.assert(
      fc.property(caseArb, ({ c, ops }) => {
        const { trace } = simulate(buildStream(ops), machineOf(c, interLane))
        for (const [r, cycles] of usePerCycle(trace)) {
          const cap = trace.resources[r]!.capacity
          for (const used of cycles.values()) expect(used).toBeLessThanOrEqual(cap)
        }
      }),
      { numRuns: 150 },
    )
  })

  it('never lets a consumer read an element before its producer wrote it, chaining on and off', () => {
    fc.assert(
      fc.property(caseArb, ({ c, ops }) => {
        const stream = buildStream(ops)
        const { trace } = simulate(stream, machineOf(c, interLane))
        const lastWriter = new Map<number, number>()
        for (const op of stream.ops) {
          for (const g of op.srcRegs) {
            const p = lastWriter.get(g[0]!)
            if (p === undefined) continue
            const prod = stream.ops[p]!
            if (prod.shape !== 'elementwise' || op.shape !== 'elementwise' || op.memory) continue
            for (let l = 0; l < c.lanes; l++) {
              const pt = laneTiming(trace, p, l)
              const ct = laneTiming(trace, op.seq, l)
              if (ct.readStart === null || pt.writeStart === null) continue
              // The last word is read no earlier than the cycle after it was written; with a single
              // source operand the first word bounds the start the same way.
              expect(ct.readEnd!).toBeGreaterThan(pt.writeEnd!)
              if (op.srcRegs.length === 1) expect(ct.readStart).toBeGreaterThan(pt.writeStart)
              if (!c.chaining) expect(ct.readEnd!).toBeGreaterThan(trace.instructions[p]!.complete!)
            }
          }
          for (const r of op.dstRegs) lastWriter.set(r, op.seq)
        }
      }),
      { numRuns: 150 },
    )
  })

  it('ends a run at the cycle limit with a clear error and the partial trace', () => {
    const ops = Array.from({ length: 50 }, (_, i) => fma(8 + (i % 4), 1, 2, 64))
    const { trace, error } = simulate(buildStream(ops), parseMachine({}), { cycleLimit: 100 })
    expect(error).toEqual({ code: 'cycle-limit', message: 'the run exceeded the cycle limit of 100 cycles' })
    expect(trace.cycles).toBeLessThanOrEqual(100)
    expect(trace.instructions.some((i) => i.complete === null)).toBe(true)
  })

  it('ends a run at the trace-size limit with a clear error', () => {
    const ops = Array.from({ length: 50 }, (_, i) => fma(8 + (i % 4), 1, 2, 64))
    const { error } = simulate(buildStream(ops), parseMachine({}), { traceLimit: 500 })
    expect(error?.code).toBe('trace-limit')
    expect(error?.message).toMatch(/limit of 500 spans/)
  })
})
