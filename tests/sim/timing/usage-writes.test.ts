import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { simulate } from '../../../shared/sim/timing/simulate'
import { traceJsonSchema, traceToJson } from '../../../shared/sim/trace/schema'
import type { TimingTrace } from '../../../shared/sim/trace/types'
import { expandUsage, laneTiming, usageWritesAt } from '../../../shared/sim/trace/types'
import { caseArb, machineOf } from './arbitraries'
import { ampleMachine, buildOp, buildStream, fma } from './factories'

interface PortUses {
  reads: number[]
  writes: number[]
}

/** Per (instruction, lane): the cycles of each bank-port read and write, from the usage spans. */
function portUses(trace: TimingTrace): Map<string, PortUses> {
  const out = new Map<string, PortUses>()
  // One span a row: a row may stand for alike lanes (UsageSpans.copies).
  const u = expandUsage(trace.usage)
  for (let i = 0; i < u.count; i++) {
    const res = trace.resources[u.resource[i]!]!
    if (res.kind !== 'bank') continue
    const key = `${u.instruction[i]}:${res.lane}`
    const p = out.get(key) ?? { reads: [], writes: [] }
    out.set(key, p)
    for (let c = u.start[i]!; c < u.start[i]! + u.length[i]!; c++) {
      const w = usageWritesAt(u, i, c)!
      expect(w).toBeGreaterThanOrEqual(0)
      expect(w).toBeLessThanOrEqual(u.amount[i]!)
      for (let k = 0; k < w; k++) p.writes.push(c)
      for (let k = w; k < u.amount[i]!; k++) p.reads.push(c)
    }
  }
  return out
}

describe('bank-port uses tell reads from writes (UsageSpans.writes)', () => {
  it('places, for element-wise ops on random streams, every read in the lane read phase and every write in its write phase, one a word', () => {
    // The phase times are the handbook's (section 10); a read or write moves one 64-bit word (section 5).
    fc.assert(
      fc.property(caseArb, ({ c, ops }) => {
        const { trace } = simulate(buildStream(ops), machineOf(c))
        const uses = portUses(trace)
        for (const ins of trace.instructions) {
          if (ins.shape !== 'elementwise' || ins.unit === 'load' || ins.unit === 'store') continue
          const sources = ops[ins.index]!.srcRegs.length
          for (let l = 0; l < c.lanes; l++) {
            const t = laneTiming(trace, ins.index, l)
            const p = uses.get(`${ins.index}:${l}`) ?? { reads: [], writes: [] }
            expect(p.reads.length).toBe(t.elements * sources)
            expect(p.writes.length).toBe(t.elements)
            if (t.elements === 0) continue
            expect(Math.min(...p.reads)).toBe(t.readStart)
            expect(Math.max(...p.reads)).toBe(t.readEnd)
            expect(Math.min(...p.writes)).toBe(t.writeStart)
            expect(Math.max(...p.writes)).toBe(t.writeEnd)
          }
        }
      }),
      { numRuns: 150 },
    )
  })

  it('keeps one span where one instruction alternates reads and writes on a bank, and spells the writes out in the JSON form', () => {
    // One bank, ports ample: the FMA's reads and writes of every cycle land in bank 0.
    const m = ampleMachine({ lanes: 1, rfBanks: 1, rfPortsPerBank: 4 })
    const { trace } = simulate(buildStream([fma(8, 1, 2, 40)]), m)
    const json = traceJsonSchema.parse(traceToJson(trace))
    const bank = trace.resources.find((r) => r.kind === 'bank')!.id
    const perCycle = new Map<number, { amount: number; writes: number }>()
    for (const s of json.usage.filter((x) => x.resource === bank)) {
      for (let k = 0; k < s.length; k++) perCycle.set(s.start + k, { amount: s.amount, writes: s.writes?.[k] ?? 0 })
    }
    const t = laneTiming(trace, 0, 0)
    // Reads in 1..40 (three words a cycle), writes in 2+D..41+D (one a cycle): handbook section 5.
    for (let c = t.readStart!; c <= t.writeEnd!; c++) {
      const reads = c <= t.readEnd! ? 3 : 0
      const writes = c >= t.writeStart! ? 1 : 0
      expect(perCycle.get(c), `cycle ${c}`).toEqual({ amount: reads + writes, writes })
    }
  })

  it('keeps one span per busy stretch of one instruction on a single-port bank, reads and writes mixed, and says which was which', () => {
    // One bank with one port, D = 4 (handbook sections 5 and 6), vfneg.v at vl 8 on one lane: words 0..4
    // are read in cycles 1..5 (beats 2..6, results ready 6..10); from cycle 6 the writes take the port
    // (writes first), words 0..4 are written in 6..10; the port is free in 11..13 for reads of words 5..7
    // (beats 12..14), whose results are written in 16..18. Two busy stretches: two spans, not four.
    const m = ampleMachine({ lanes: 1, rfBanks: 1, rfPortsPerBank: 1 })
    const { trace } = simulate(buildStream([buildOp({ vl: 8, srcRegs: [[1]], op: 'vfneg.v', text: 'vfneg.v v3, v1' })]), m)
    const u = trace.usage
    const bank = trace.resources.find((r) => r.kind === 'bank')!.id
    const spans = Array.from({ length: u.count }, (_, i) => i).filter((i) => u.resource[i] === bank)
    expect(spans.map((i) => [u.start[i], u.length[i]])).toEqual([[1, 13], [16, 3]])
    const kinds = spans.map((i) => Array.from({ length: u.length[i]! }, (_, k) => (usageWritesAt(u, i, u.start[i]! + k) ? 'W' : 'R')).join(''))
    expect(kinds).toEqual(['RRRRRWWWWWRRR', 'WWW'])
  })
})
