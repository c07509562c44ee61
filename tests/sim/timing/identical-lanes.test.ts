/**
 * Timing alike lanes once per class (shared/sim/timing/symmetry.ts: every
 * lane alike, or the classes a ragged tail makes) must give the very trace of
 * timing every lane: checked against the engine run with
 * `identicalLanes: false`, digest for digest (timing and stalls, digest.ts).
 */
import fc from 'fast-check'
import { readFileSync } from 'node:fs'
import { describe, expect, it } from 'vitest'
import { parseMachine, type MachineInput } from '../../../shared/schemas/machine'
import type { VectorOp } from '../../../shared/sim/exec/stream'
import { execute } from '../../../shared/sim/exec/execute'
import { assemble } from '../../../shared/sim/isa/assembler'
import { createTimingState, simulate } from '../../../shared/sim/timing/simulate'
import type { SimulateOptions } from '../../../shared/sim/trace/types'
import { digestRun } from './digest'
import { buildOp, buildStream, fma, unitLoad, unitStore } from './factories'

function same(stream: ReturnType<typeof buildStream>, input: MachineInput, options: SimulateOptions = {}): boolean {
  const machine = parseMachine(input)
  const once = digestRun(simulate(stream, machine, options))
  const every = digestRun(simulate(stream, machine, { ...options, identicalLanes: false }))
  expect(once).toEqual(every)
  return createTimingState(stream, machine, options).options.identicalLanes
}

describe('identical lanes timed once', () => {
  it.each(['long-stream.s', 'bank-conflicts.s', 'stripmine.s'])('gives the trace of every lane timed for %s, on the default machine and under each issue policy', (file) => {
    const asm = assemble(readFileSync(`examples/${file}`, 'utf8'))
    if (!asm.ok) throw new Error(asm.errors[0]?.message)
    const ex = execute(asm.program, { vlen: 8192 })
    if (!ex.ok) throw new Error(ex.error.message)
    const used = (['staggered', 'lockstep', 'serial'] as const).map((issue) => same(ex.stream, { issue }))
    // long-stream and bank-conflicts keep every lane alike; the strip-mined loop has a 3-element tail.
    if (file !== 'stripmine.s') expect(used).toEqual([true, true, true])
  })

  it('is not used where lanes meet or differ within a class: a mask, a reduction, every lane its own class', () => {
    const m = parseMachine({ lanes: 4 })
    expect(createTimingState(buildStream([buildOp({ vl: 8, masked: true })]), m).options.identicalLanes).toBe(false)
    expect(createTimingState(buildStream([buildOp({ vl: 8, op: 'vfredusum.vs', shape: 'reduction' })]), m).options.identicalLanes).toBe(false)
    // Remainders 1, 2 and 3 cut 4 lanes into 4 classes: nothing to gain.
    expect(createTimingState(buildStream([1, 2, 3].map((r) => buildOp({ vl: 8 + r }))), m).options.identicalLanes).toBe(false)
    expect(createTimingState(buildStream([buildOp({ vl: 8 })]), m).options.identicalLanes).toBe(true)
  })

  it('times one lane per class of a ragged tail: vl = q x L + r puts lanes below r in one class, the rest in another', () => {
    // On 8 lanes vl 250 = 31 x 8 + 2 gives lanes 0-1 32 elements and lanes 2-7 31 (timing model section 1).
    const s = createTimingState(buildStream([buildOp({ vl: 250 }), buildOp({ vl: 253 })]), parseMachine({ lanes: 8 }))
    // Remainders 2 and 5: classes 0-1, 2-4 and 5-7.
    expect(Array.from(s.plan?.first ?? [])).toEqual([0, 2, 5])
    expect(Array.from(s.plan?.size ?? [])).toEqual([2, 3, 3])
    // The timed ops give each timed lane its class's elements: 32, 31, 31 and 32, 32, 31.
    expect(s.stream.ops.map((op) => op.vl)).toEqual([31 * 3 + 1, 31 * 3 + 2])
  })

  const reg = fc.integer({ min: 1, max: 7 }).map((r) => r * 4)
  const symmetricOp = (vl: number): fc.Arbitrary<VectorOp> =>
    fc.oneof(
      fc.tuple(reg, reg, reg).map(([d, a, b]) => buildOp({ vl, dstRegs: [d], srcRegs: [[a], [b]], text: `vfadd.vv v${d}, v${a}, v${b}` })),
      fc.tuple(reg, reg, reg).map(([d, a, b]) => fma(d, a, b, vl)),
      fc.tuple(reg, reg).map(([d, a]) => buildOp({ op: 'vmul.vx', unit: 'mul', flopsPerElement: 0, vl, dstRegs: [d], srcRegs: [[a]] })),
      fc.tuple(reg, reg).map(([d, a]) => buildOp({ op: 'vdiv.vx', unit: 'div', flopsPerElement: 0, vl, dstRegs: [d], srcRegs: [[a]] })),
      reg.map((d) => unitLoad(d, vl)),
      reg.map((s) => unitStore(s, vl)),
    )

  it('gives the trace of every lane timed on random streams whose lanes all do the same, limits included (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.record({
          lanes: fc.constantFrom(2, 4, 8),
          k: fc.integer({ min: 0, max: 8 }),
          issue: fc.constantFrom('serial', 'lockstep', 'staggered' as const),
          chaining: fc.boolean(),
          rfBanks: fc.integer({ min: 1, max: 8 }),
          rfPortsPerBank: fc.integer({ min: 1, max: 2 }),
          limits: fc.constantFrom({}, { cycleLimit: 60 }, { traceLimit: 300 }, { recordUsage: false }),
        }).chain((c) => fc.record({ c: fc.constant(c), ops: fc.array(symmetricOp(c.k * c.lanes), { minLength: 1, maxLength: 10 }) })),
        ({ c, ops }) => {
          const used = same(buildStream(ops), { lanes: c.lanes, vlen: 4096, issue: c.issue, chaining: c.chaining, rfBanks: c.rfBanks, rfPortsPerBank: c.rfPortsPerBank, memLatency: 5 }, c.limits)
          expect(used).toBe(true)
        },
      ),
      { numRuns: 150 },
    )
  })

  it('gives the trace of every lane timed on random streams with ragged tails, one or two memory ports, limits included (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.record({
          lanes: fc.constantFrom(3, 4, 8),
          issue: fc.constantFrom('serial', 'lockstep', 'staggered' as const),
          chaining: fc.boolean(),
          rfBanks: fc.integer({ min: 1, max: 8 }),
          rfPortsPerBank: fc.integer({ min: 1, max: 2 }),
          memoryPorts: fc.constantFrom(1, 2),
          limits: fc.constantFrom({}, { cycleLimit: 60 }, { traceLimit: 300 }, { recordUsage: false }),
        }).chain((c) => fc.record({ c: fc.constant(c), ops: fc.array(fc.integer({ min: 0, max: 40 }).chain((vl) => symmetricOp(vl)), { minLength: 1, maxLength: 10 }) })),
        ({ c, ops }) => {
          // Buses of 3 x 64 bits give 3 lanes a row of FP64 elements a cycle (the schema wants powers of two: set after parsing).
          const machine = { ...parseMachine({ lanes: c.lanes, vlen: 4096, issue: c.issue, chaining: c.chaining, rfBanks: c.rfBanks, rfPortsPerBank: c.rfPortsPerBank, memoryPorts: c.memoryPorts, memLatency: 5 }), ...(c.lanes === 3 ? { loadBusBits: 192, storeBusBits: 192 } : {}) }
          const stream = buildStream(ops)
          expect(digestRun(simulate(stream, machine, c.limits))).toEqual(digestRun(simulate(stream, machine, { ...c.limits, identicalLanes: false })))
        },
      ),
      { numRuns: 200 },
    )
  })
})
