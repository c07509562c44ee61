/**
 * Reductions (RISC-V V 1.0 sections 14.1 and 14.3): vd[0] = vs1[0] op the
 * active elements of vs2; the rest of vd stays undisturbed; nothing is written
 * when vl = 0.
 */
import { arith, BINARY32, BINARY64, maximumNumber, minimumNumber, NV, RNE, signalingNaN, takeFlags } from './fp'
import type { Handler } from './handler'
import { requireFpSew, requireVtype, vectorRoundingMode } from './handler'
import { checkGroup, type ArchState, regGroup } from './machine'

type NumOp = (a: number, b: number) => number
type BigOp = (a: bigint, b: bigint) => bigint

const INT_REDUCTIONS: Record<string, { num: NumOp; big: BigOp; signed: boolean }> = {
  vredsum: { num: (a, b) => a + b, big: (a, b) => a + b, signed: true },
  vredand: { num: (a, b) => a & b, big: (a, b) => a & b, signed: true },
  vredor: { num: (a, b) => a | b, big: (a, b) => a | b, signed: true },
  vredxor: { num: (a, b) => a ^ b, big: (a, b) => a ^ b, signed: true },
  vredmax: { num: Math.max, big: (a, b) => (a > b ? a : b), signed: true },
  vredmaxu: { num: Math.max, big: (a, b) => (a > b ? a : b), signed: false },
  vredmin: { num: Math.min, big: (a, b) => (a < b ? a : b), signed: true },
  vredminu: { num: Math.min, big: (a, b) => (a < b ? a : b), signed: false },
}

function operands(m: ArchState, ins: Parameters<Handler>[1]): { vd: number; vs2: number; vs1: number } {
  const lmul = m.vtype.lmul
  return {
    vd: checkGroup(ins.operands.vd, 1, 'vd', ins),
    vs2: checkGroup(ins.operands.vs2, lmul, 'vs2', ins),
    vs1: checkGroup(ins.operands.vs1, 1, 'vs1', ins),
  }
}

function intReduction(def: (typeof INT_REDUCTIONS)[string]): Handler {
  return (m, ins, rec) => {
    requireVtype(m, ins)
    const { sew, lmul } = m.vtype
    const { vd, vs2, vs1 } = operands(m, ins)
    if (m.vl > 0) {
      const s2 = m.base(vs2, sew)
      if (sew === 64) {
        const v = def.signed ? m.i64 : m.u64
        let acc = v[m.base(vs1, 64)]!
        for (let i = 0; i < m.vl; i++) if (m.active(ins.operands.vm, i)) acc = def.big(acc, v[s2 + i]!)
        m.i64[m.base(vd, 64)] = acc
      } else {
        const v = m.ints(sew, def.signed)
        // Sums stay exact in a double (at most 2^16 elements of 32 bits); the store wraps them.
        let acc = v[m.base(vs1, sew)]!
        for (let i = 0; i < m.vl; i++) if (m.active(ins.operands.vm, i)) acc = def.num(acc, v[s2 + i]!)
        m.ints(sew, true)[m.base(vd, sew)] = acc
      }
    }
    if (rec.on) rec.vector(ins, { dstRegs: regGroup(vd, 1), srcRegs: [regGroup(vs2, lmul), regGroup(vs1, 1)] })
  }
}

type FpReductionKind = 'ordered' | 'unordered' | 'max' | 'min'

function fpReduction(kind: FpReductionKind): Handler {
  return (m, ins, rec) => {
    const sew = requireFpSew(m, ins)
    const lmul = m.vtype.lmul
    const { vd, vs2, vs1 } = operands(m, ins)
    // The sums round in frm (a reserved one is refused even with vl = 0); max and min do not round.
    const mode = kind === 'max' || kind === 'min' ? RNE : vectorRoundingMode(m, ins)
    if (m.vl > 0) {
      const v = sew === 64 ? m.f64 : m.f32
      // With flags wanted or another mode, each addition goes through fp.ts's exact path, which raises them.
      const flags = m.readsFpFlags
      const fmt = sew === 64 ? BINARY64 : BINARY32
      const add = flags || mode !== RNE ? (a: number, b: number) => arith('add', a, b, fmt, mode, true)
        : sew === 64 ? (a: number, b: number) => a + b : (a: number, b: number) => Math.fround(a + b)
      if (flags) takeFlags()
      const combine = kind === 'max' ? maximumNumber : kind === 'min' ? minimumNumber : add
      const s2 = m.base(vs2, sew)
      const start = v[m.base(vs1, sew)]!
      const d = m.base(vd, sew)
      let acc = start
      let active = 0
      if (kind === 'unordered' && m.unorderedSum) {
        const indices: number[] = []
        for (let i = 0; i < m.vl; i++) if (m.active(ins.operands.vm, i)) indices.push(i)
        const values = Float64Array.from(indices, (i) => v[s2 + i]!)
        active = indices.length
        acc = m.unorderedSum({ start, values, indices: Int32Array.from(indices), add, vl: m.vl, sew })
      } else {
        for (let i = 0; i < m.vl; i++) {
          if (!m.active(ins.operands.vm, i)) continue
          acc = combine(acc, v[s2 + i]!)
          active++
        }
      }
      if (flags && active > 0) {
        // A signaling NaN among the operands (vs1[0] and the active elements) is invalid.
        const bits = (i: number): bigint => (sew === 64 ? m.u64[i]! : BigInt(m.u32[i]!))
        let snan = signalingNaN(bits(m.base(vs1, sew)), sew)
        for (let i = 0; i < m.vl && !snan; i++) snan = m.active(ins.operands.vm, i) && signalingNaN(bits(s2 + i), sew)
        m.fflags |= takeFlags() | (snan ? NV : 0)
      }
      // With no active element the result is vs1[0] itself, bit for bit (as QEMU copies it).
      if (active === 0) {
        if (sew === 64) m.u64[d] = m.u64[m.base(vs1, 64)]!
        else m.u32[d] = m.u32[m.base(vs1, 32)]!
      } else if (sew === 64) m.storeF64(d, acc)
      else m.storeF32(d, acc)
    }
    if (rec.on) rec.vector(ins, { dstRegs: regGroup(vd, 1), srcRegs: [regGroup(vs2, lmul), regGroup(vs1, 1)] })
  }
}

export const reductionHandlers: Record<string, Handler> = {
  'vfredusum.vs': fpReduction('unordered'),
  'vfredosum.vs': fpReduction('ordered'),
  'vfredmax.vs': fpReduction('max'),
  'vfredmin.vs': fpReduction('min'),
}
for (const [name, def] of Object.entries(INT_REDUCTIONS)) reductionHandlers[`${name}.vs`] = intReduction(def)
