/** Hand-built dynamic streams for the timing tests (the shape shared/sim/exec produces). */
import type { DynamicStream, VectorOp } from '../../../shared/sim/exec/stream'
import { parseMachine, type Machine, type MachineInput } from '../../../shared/schemas/machine'

let nextSeq = 0

/** One vector op; by default a vfadd.vv v3, v1, v2 at vl 16, e64, m1. */
export function buildOp(overrides: Partial<VectorOp> = {}): VectorOp {
  return {
    seq: nextSeq++,
    staticIndex: 0,
    op: 'vfadd.vv',
    text: 'vfadd.vv v3, v1, v2',
    scalarBefore: 0,
    isConfig: false,
    vl: 16,
    sew: 64,
    lmul: 1,
    eew: 64,
    masked: false,
    unit: 'fpu',
    shape: 'elementwise',
    flopsPerElement: 1,
    dstRegs: [3],
    srcRegs: [[1], [2]],
    scalarResult: false,
    ...overrides,
  }
}

/** A stream of the given ops, renumbered in order. */
export function buildStream(ops: VectorOp[], scalarAfter = 0): DynamicStream {
  const renumbered = ops.map((o, i) => ({ ...o, seq: i, staticIndex: i }))
  return { ops: renumbered, scalarAfter, dynamicCount: ops.length + scalarAfter }
}

/** Ports and banks ample enough that no request is ever denied. */
export function ampleMachine(input: MachineInput = {}): Machine {
  return parseMachine({ rfBanks: 16, rfPortsPerBank: 4, ...input })
}

export const fma = (vd: number, vs1: number, vs2: number, vl: number, extra: Partial<VectorOp> = {}) =>
  buildOp({ op: 'vfmacc.vv', text: `vfmacc.vv v${vd}, v${vs1}, v${vs2}`, vl, flopsPerElement: 2, dstRegs: [vd], srcRegs: [[vs2], [vs1], [vd]], ...extra })

export function unitLoad(vd: number, vl: number, base = 0x1000, eew: 8 | 16 | 32 | 64 = 64, extra: Partial<VectorOp> = {}): VectorOp {
  return buildOp({
    op: `vle${eew}.v`, text: `vle${eew}.v v${vd}, (a0)`, vl, eew, sew: eew, unit: 'load', shape: 'memory', flopsPerElement: 0,
    dstRegs: [vd], srcRegs: [],
    memory: { pattern: 'unit', isStore: false, addresses: Float64Array.from({ length: vl }, (_, i) => base + i * (eew / 8)) },
    ...extra,
  })
}

export function unitStore(vs: number, vl: number, base = 0x8000, eew: 8 | 16 | 32 | 64 = 64): VectorOp {
  return buildOp({
    op: `vse${eew}.v`, text: `vse${eew}.v v${vs}, (a1)`, vl, eew, sew: eew, unit: 'store', shape: 'memory', flopsPerElement: 0,
    dstRegs: [], srcRegs: [[vs]],
    memory: { pattern: 'unit', isStore: true, addresses: Float64Array.from({ length: vl }, (_, i) => base + i * (eew / 8)) },
  })
}
