/** Random dynamic streams and machines for the timing properties (fast-check), shared by the invariant and golden tests. */
import fc from 'fast-check'
import type { VectorOp } from '../../../shared/sim/exec/stream'
import { parseMachine } from '../../../shared/schemas/machine'
import { buildOp, fma, unitLoad, unitStore } from './factories'

const reg = fc.integer({ min: 1, max: 7 }).map((r) => r * 4)

/** One op of every shape the engine times, at vector length vl. */
export const opArb = (vl: number): fc.Arbitrary<VectorOp> =>
  fc.oneof(
    fc.tuple(reg, reg, reg).map(([d, a, b]) => buildOp({ vl, dstRegs: [d], srcRegs: [[a], [b]], text: `vfadd.vv v${d}, v${a}, v${b}` })),
    fc.tuple(reg, reg, reg).map(([d, a, b]) => fma(d, a, b, vl)),
    fc.tuple(reg, reg).map(([d, a]) => buildOp({ op: 'vmul.vx', unit: 'mul', flopsPerElement: 0, vl, dstRegs: [d], srcRegs: [[a]] })),
    fc.tuple(reg, reg).map(([d, a]) => buildOp({ op: 'vdiv.vx', unit: 'div', flopsPerElement: 0, vl, dstRegs: [d], srcRegs: [[a]] })),
    reg.map((d) => unitLoad(d, vl)),
    reg.map((s) => unitStore(s, vl)),
    fc.tuple(reg, reg).map(([d, a]) => buildOp({ op: 'vfredusum.vs', shape: 'reduction', vl, dstRegs: [d], srcRegs: [[a], [1]] })),
    fc.tuple(reg, reg).map(([d, a]) => buildOp({ op: 'vfredosum.vs', shape: 'ordered-reduction', vl, dstRegs: [d], srcRegs: [[a], [1]] })),
    fc.tuple(reg, reg, fc.integer({ min: 1, max: 5 })).map(([d, a, k]) =>
      buildOp({ op: 'vslideup.vi', shape: 'permutation', unit: 'alu', flopsPerElement: 0, vl, dstRegs: [d], srcRegs: [[a]], sourceIndex: Int32Array.from({ length: vl }, (_, i) => (i >= k ? i - k : -1)) }),
    ),
    reg.map((a) => buildOp({ op: 'vfmv.f.s', shape: 'scalar-result', scalarResult: true, flopsPerElement: 0, vl, dstRegs: [], srcRegs: [[a]] })),
  )

export interface RandomMachine {
  lanes: number
  vl: number
  issue: 'serial' | 'lockstep' | 'staggered'
  chaining: boolean
  rfBanks: number
  rfPortsPerBank: number
}

/** A machine and a stream of 1 to 12 ops at one vl. */
export const caseArb = fc
  .record({
    lanes: fc.constantFrom(1, 2, 3, 4, 8),
    vl: fc.integer({ min: 0, max: 64 }),
    issue: fc.constantFrom('serial', 'lockstep', 'staggered' as const),
    chaining: fc.boolean(),
    rfBanks: fc.integer({ min: 1, max: 8 }),
    rfPortsPerBank: fc.integer({ min: 1, max: 2 }),
  })
  .chain((c) => fc.record({ c: fc.constant(c as RandomMachine), ops: fc.array(opArb(c.vl), { minLength: 1, maxLength: 12 }) }))

export function machineOf(c: RandomMachine, interLane: 'ring' | 'tree' = 'ring') {
  return parseMachine({ lanes: c.lanes, vlen: 4096, issue: c.issue, chaining: c.chaining, rfBanks: c.rfBanks, rfPortsPerBank: c.rfPortsPerBank, memLatency: 5, interLane })
}
