/**
 * Vector floating point for SEW 32 (binary32) and SEW 64 (binary64): RISC-V V
 * 1.0 section 13, canonical NaN results. Add, subtract, multiply, divide, the
 * fused multiply-adds, square root and the single-width conversions round in
 * the dynamic rounding mode (frm, V 1.0 section 13.1; a reserved frm is an
 * illegal instruction), on fp.ts's exact path unless it is round to nearest
 * even. When the
 * program can read fflags (ArchState.readsFpFlags), the element-wise
 * arithmetic, FMA, square root, compares, min/max and single-width
 * conversions accrue IEEE 754 exception flags as the scalar instructions do
 * (V 1.0 section 13.1), through fp.ts's exact path.
 */
import type { Instruction } from '../isa/types'
import { arith, BINARY32, BINARY64, floatToInt, type FloatFormat, fusedMultiplyAdd as fma, intToFloat, maximumNumber, minimumNumber, NV, RNE, type RoundingMode, signalingNaN, takeFlags } from './fp'
import type { Handler } from './handler'
import { checkMaskOverlap, operand, requireFpSew, vectorRoundingMode } from './handler'
import { checkGroup, type ArchState, regGroup } from './machine'
import { copyOrMerge, writeMaskBits } from './vint'

type Form = 'vv' | 'vf'
/** a = vs2[i], b = vs1[i] or f[rs1], d = vd[i]; returns the result rounded to fmt in `mode`. */
type FpFn = (a: number, b: number, d: number, fmt: FloatFormat, mode: RoundingMode) => number

interface FpDef {
  /** The result in round to nearest even (fast), or in `mode` where it takes one. */
  fn: FpFn
  /** The result in `mode` through fp.ts's exact path, which raises the exception flags (when fn's fast path does not). */
  exact?: FpFn
  forms: Form[]
  readsDest?: boolean
  /** vfmin and vfmax do not round. */
  exactResult?: boolean
}

const round = (fmt: FloatFormat, x: number): number => (fmt === BINARY32 ? Math.fround(x) : x)

const fmaForms: Form[] = ['vv', 'vf']
const FP_OPS: Record<string, FpDef> = {
  vfadd: { fn: (a, b, _d, f) => round(f, a + b), exact: (a, b, _d, f, r) => arith('add', a, b, f, r, true), forms: ['vv', 'vf'] },
  vfsub: { fn: (a, b, _d, f) => round(f, a - b), exact: (a, b, _d, f, r) => arith('sub', a, b, f, r, true), forms: ['vv', 'vf'] },
  vfrsub: { fn: (a, b, _d, f) => round(f, b - a), exact: (a, b, _d, f, r) => arith('sub', b, a, f, r, true), forms: ['vf'] },
  vfmul: { fn: (a, b, _d, f) => round(f, a * b), exact: (a, b, _d, f, r) => arith('mul', a, b, f, r, true), forms: ['vv', 'vf'] },
  vfdiv: { fn: (a, b, _d, f) => round(f, a / b), exact: (a, b, _d, f, r) => arith('div', a, b, f, r, true), forms: ['vv', 'vf'] },
  vfrdiv: { fn: (a, b, _d, f) => round(f, b / a), exact: (a, b, _d, f, r) => arith('div', b, a, f, r, true), forms: ['vf'] },
  vfmin: { fn: (a, b) => minimumNumber(a, b), forms: ['vv', 'vf'], exactResult: true },
  vfmax: { fn: (a, b) => maximumNumber(a, b), forms: ['vv', 'vf'], exactResult: true },
  // V 1.0 section 13.6; the negations apply to the product and the addend
  // before the single rounding, as -(vs1 x vs2) - vd is defined.
  vfmacc: { fn: (a, b, d, f, r) => fma(b, a, d, f, r), forms: fmaForms, readsDest: true },
  vfnmacc: { fn: (a, b, d, f, r) => fma(-b, a, -d, f, r), forms: fmaForms, readsDest: true },
  vfmsac: { fn: (a, b, d, f, r) => fma(b, a, -d, f, r), forms: fmaForms, readsDest: true },
  vfnmsac: { fn: (a, b, d, f, r) => fma(-b, a, d, f, r), forms: fmaForms, readsDest: true },
  vfmadd: { fn: (a, b, d, f, r) => fma(b, d, a, f, r), forms: fmaForms, readsDest: true },
  vfnmadd: { fn: (a, b, d, f, r) => fma(-b, d, -a, f, r), forms: fmaForms, readsDest: true },
  vfmsub: { fn: (a, b, d, f, r) => fma(b, d, -a, f, r), forms: fmaForms, readsDest: true },
  vfnmsub: { fn: (a, b, d, f, r) => fma(-b, d, a, f, r), forms: fmaForms, readsDest: true },
}

/** The f[rs1] operand at SEW (binary32 values must be NaN-boxed). */
function fScalar(m: ArchState, ins: Instruction, sew: 32 | 64): number {
  const rs1 = operand(ins, 'rs1')
  return sew === 64 ? m.f[rs1]! : m.f32Operand(rs1)
}

function fScalarBits(m: ArchState, ins: Instruction, sew: 32 | 64): bigint {
  const rs1 = operand(ins, 'rs1')
  return sew === 64 ? m.fBits[rs1]! : BigInt(m.f32OperandBits(rs1))
}

/** Element `i` of the register file at SEW is a signaling NaN. */
function signalingAt(m: ArchState, i: number, sew: 32 | 64): boolean {
  return signalingNaN(sew === 64 ? m.u64[i]! : BigInt(m.u32[i]!), sew)
}

function fpOp(def: FpDef, form: Form): Handler {
  return (m, ins, rec) => {
    const sew = requireFpSew(m, ins)
    const lmul = m.vtype.lmul
    const vm = ins.operands.vm
    const vd = checkGroup(ins.operands.vd, lmul, 'vd', ins)
    const vs2 = checkGroup(ins.operands.vs2, lmul, 'vs2', ins)
    const vs1 = form === 'vv' ? checkGroup(ins.operands.vs1, lmul, 'vs1', ins) : 0
    checkMaskOverlap(ins, vd)
    const fmt = sew === 64 ? BINARY64 : BINARY32
    const v = sew === 64 ? m.f64 : m.f32
    const k = form === 'vf' ? fScalar(m, ins, sew) : 0
    const d = m.base(vd, sew)
    const s2 = m.base(vs2, sew)
    const s1 = m.base(vs1, sew)
    const flags = m.readsFpFlags
    const mode = def.exactResult ? RNE : vectorRoundingMode(m, ins)
    const fn = ((flags || mode !== RNE) && def.exact) || def.fn
    if (flags) takeFlags()
    const kSignaling = flags && form === 'vf' && signalingNaN(fScalarBits(m, ins, sew), sew)
    for (let i = 0; i < m.vl; i++) {
      if (!m.active(vm, i)) continue
      if (flags && (kSignaling || signalingAt(m, s2 + i, sew) || (form === 'vv' && signalingAt(m, s1 + i, sew)) || (def.readsDest && signalingAt(m, d + i, sew)))) m.fflags |= NV
      const r = fn(v[s2 + i]!, form === 'vv' ? v[s1 + i]! : k, def.readsDest ? v[d + i]! : 0, fmt, mode)
      if (sew === 64) m.storeF64(d + i, r)
      else m.storeF32(d + i, r)
    }
    if (flags) m.fflags |= takeFlags()
    if (rec.on) {
      const srcRegs = [regGroup(vs2, lmul)]
      if (form === 'vv') srcRegs.push(regGroup(vs1, lmul))
      if (def.readsDest) srcRegs.push(regGroup(vd, lmul))
      rec.vector(ins, { dstRegs: regGroup(vd, lmul), srcRegs })
    }
  }
}

/**
 * Element-wise unary operation on vs2, with integer or FP views chosen by the
 * caller. With `rounds`, the body gets frm (a reserved one is refused before
 * any element, as for the binary operations); otherwise round to nearest even.
 */
function unaryOp(body: (m: ArchState, sew: 32 | 64, d: number, s2: number, i: number, mode: RoundingMode) => void, rounds = false): Handler {
  return (m, ins, rec) => {
    const sew = requireFpSew(m, ins)
    const lmul = m.vtype.lmul
    const vd = checkGroup(ins.operands.vd, lmul, 'vd', ins)
    const vs2 = checkGroup(ins.operands.vs2, lmul, 'vs2', ins)
    checkMaskOverlap(ins, vd)
    const mode = rounds ? vectorRoundingMode(m, ins) : RNE
    const d = m.base(vd, sew)
    const s2 = m.base(vs2, sew)
    if (m.readsFpFlags) takeFlags()
    for (let i = 0; i < m.vl; i++) if (m.active(ins.operands.vm, i)) body(m, sew, d + i, s2 + i, i, mode)
    if (m.readsFpFlags) m.fflags |= takeFlags()
    if (rec.on) rec.vector(ins, { dstRegs: regGroup(vd, lmul), srcRegs: [regGroup(vs2, lmul)] })
  }
}

const vfsqrt = unaryOp((m, sew, d, s, _i, mode) => {
  if (!m.readsFpFlags && mode === RNE) return sew === 64 ? m.storeF64(d, Math.sqrt(m.f64[s]!)) : m.storeF32(d, Math.fround(Math.sqrt(m.f32[s]!)))
  if (m.readsFpFlags && signalingAt(m, s, sew)) m.fflags |= NV
  const r = arith('sqrt', sew === 64 ? m.f64[s]! : m.f32[s]!, 0, sew === 64 ? BINARY64 : BINARY32, mode, true)
  return sew === 64 ? m.storeF64(d, r) : m.storeF32(d, r)
}, true)

/** vfcvt.{x,xu}.f.v in frm and the rtz forms: saturating, NaN gives the largest integer. */
function toInt(signed: boolean, truncate: boolean): Handler {
  return unaryOp((m, sew, d, s, _i, mode) => {
    if (sew === 64) m.u64[d] = BigInt.asUintN(64, floatToInt(m.f64[s]!, 64, signed, truncate, mode))
    else m.u32[d] = Number(BigInt.asUintN(32, floatToInt(m.f32[s]!, 32, signed, truncate, mode)))
  }, !truncate)
}

/**
 * vfcvt.f.{x,xu}.v in frm. In round to nearest even a 32-bit integer is exact
 * in a double, so Math.fround rounds once, and Number(bigint) rounds a 64-bit
 * integer to nearest even (ECMA-262, "the Number value for x").
 */
function fromInt(signed: boolean): Handler {
  return unaryOp((m, sew, d, s, _i, mode) => {
    // With flags wanted or another mode, intToFloat rounds exactly (and raises inexact).
    if (m.readsFpFlags || mode !== RNE) {
      const r = intToFloat(sew === 64 ? (signed ? m.i64[s]! : m.u64[s]!) : BigInt(signed ? m.i32[s]! : m.u32[s]!), sew === 64 ? BINARY64 : BINARY32, mode)
      if (sew === 64) m.f64[d] = r
      else m.f32[d] = r
    } else if (sew === 64) m.f64[d] = Number(signed ? m.i64[s]! : m.u64[s]!)
    else m.f32[d] = Math.fround(signed ? m.i32[s]! : m.u32[s]!)
  }, true)
}

/** vfsgnj, vfsgnjn, vfsgnjx: sign bit only, no canonicalisation (V 1.0 section 13.12). */
function sgnjOp(kind: 'j' | 'n' | 'x', form: Form): Handler {
  return (m, ins, rec) => {
    const sew = requireFpSew(m, ins)
    const lmul = m.vtype.lmul
    const vd = checkGroup(ins.operands.vd, lmul, 'vd', ins)
    const vs2 = checkGroup(ins.operands.vs2, lmul, 'vs2', ins)
    const vs1 = form === 'vv' ? checkGroup(ins.operands.vs1, lmul, 'vs1', ins) : 0
    checkMaskOverlap(ins, vd)
    const sign = 1n << BigInt(sew - 1)
    const k = form === 'vf' ? fScalarBits(m, ins, sew) : 0n
    const d = m.base(vd, sew)
    const s2 = m.base(vs2, sew)
    const s1 = m.base(vs1, sew)
    const get = (i: number): bigint => (sew === 64 ? m.u64[i]! : BigInt(m.u32[i]!))
    for (let i = 0; i < m.vl; i++) {
      if (!m.active(ins.operands.vm, i)) continue
      const a = get(s2 + i)
      const b = form === 'vv' ? get(s1 + i) : k
      const s = kind === 'j' ? b & sign : kind === 'n' ? ~b & sign : (a ^ b) & sign
      const r = (a & ~sign) | s
      if (sew === 64) m.u64[d + i] = r
      else m.u32[d + i] = Number(r)
    }
    if (rec.on) {
      const srcRegs = [regGroup(vs2, lmul)]
      if (form === 'vv') srcRegs.push(regGroup(vs1, lmul))
      rec.vector(ins, { dstRegs: regGroup(vd, lmul), srcRegs })
    }
  }
}

type FCmp = (a: number, b: number) => boolean
/**
 * FP compares (V 1.0 section 13.13): any NaN operand makes them false, except
 * vmfne. vmfeq/vmfne are quiet (invalid only for a signaling NaN), the
 * ordered ones signal on any NaN, as feq and flt/fle do.
 */
const FCMP_OPS: Record<string, { fn: FCmp; forms: Form[]; signaling: boolean }> = {
  vmfeq: { fn: (a, b) => a === b, forms: ['vv', 'vf'], signaling: false },
  vmfne: { fn: (a, b) => a !== b, forms: ['vv', 'vf'], signaling: false },
  vmflt: { fn: (a, b) => a < b, forms: ['vv', 'vf'], signaling: true },
  vmfle: { fn: (a, b) => a <= b, forms: ['vv', 'vf'], signaling: true },
  vmfgt: { fn: (a, b) => a > b, forms: ['vf'], signaling: true },
  vmfge: { fn: (a, b) => a >= b, forms: ['vf'], signaling: true },
}

function fcmpOp(fn: FCmp, form: Form, signaling: boolean): Handler {
  return (m, ins, rec) => {
    const sew = requireFpSew(m, ins)
    const lmul = m.vtype.lmul
    const vd = checkGroup(ins.operands.vd, 1, 'vd', ins)
    const vs2 = checkGroup(ins.operands.vs2, lmul, 'vs2', ins)
    const vs1 = form === 'vv' ? checkGroup(ins.operands.vs1, lmul, 'vs1', ins) : 0
    const v = sew === 64 ? m.f64 : m.f32
    const k = form === 'vf' ? fScalar(m, ins, sew) : 0
    const s2 = m.base(vs2, sew)
    const s1 = m.base(vs1, sew)
    const bits = new Uint8Array(m.vl)
    const kSignaling = form === 'vf' && signalingNaN(fScalarBits(m, ins, sew), sew)
    for (let i = 0; i < m.vl; i++) {
      if (!m.active(ins.operands.vm, i)) continue
      const a = v[s2 + i]!
      const b = form === 'vv' ? v[s1 + i]! : k
      bits[i] = fn(a, b) ? 1 : 2
      if (m.readsFpFlags && (a !== a || b !== b)) {
        if (signaling || signalingAt(m, s2 + i, sew) || (form === 'vv' ? signalingAt(m, s1 + i, sew) : kSignaling)) m.fflags |= NV
      }
    }
    writeMaskBits(m, vd, bits)
    if (rec.on) {
      const srcRegs = [regGroup(vs2, lmul)]
      if (form === 'vv') srcRegs.push(regGroup(vs1, lmul))
      rec.vector(ins, { dstRegs: regGroup(vd, 1), srcRegs })
    }
  }
}

/** vfmv.v.f and vfmerge.vfm copy the f register's bits (V 1.0 sections 13.15, 13.16). */
function fMoveOp(merge: boolean): Handler {
  return (m, ins, rec) => {
    const sew = requireFpSew(m, ins)
    const lmul = m.vtype.lmul
    const vd = checkGroup(ins.operands.vd, lmul, 'vd', ins)
    const vs2 = merge ? checkGroup(ins.operands.vs2, lmul, 'vs2', ins) : 0
    copyOrMerge(m, sew, vd, vs2, -1, fScalarBits(m, ins, sew), merge)
    if (rec.on) rec.vector(ins, { dstRegs: regGroup(vd, lmul), srcRegs: merge ? [regGroup(vs2, lmul)] : [], v0IsSelector: merge })
  }
}

/** vfmv.f.s: f[rd] = vs2[0], even when vl = 0 (V 1.0 section 16.2); binary32 is NaN-boxed. */
const vfmvFS: Handler = (m, ins, rec) => {
  const sew = requireFpSew(m, ins)
  const rd = operand(ins, 'rd')
  const vs2 = operand(ins, 'vs2')
  if (sew === 64) m.fBits[rd] = m.u64[m.base(vs2, 64)]!
  else m.setF32Bits(rd, m.u32[m.base(vs2, 32)]!)
  if (rec.on) rec.vector(ins, { dstRegs: [], srcRegs: [regGroup(vs2, 1)] })
}

/** vfmv.s.f: vd[0] = f[rs1] when vl > 0. */
const vfmvSF: Handler = (m, ins, rec) => {
  const sew = requireFpSew(m, ins)
  const vd = operand(ins, 'vd')
  if (m.vl > 0) {
    const bits = fScalarBits(m, ins, sew)
    if (sew === 64) m.u64[m.base(vd, 64)] = bits
    else m.u32[m.base(vd, 32)] = Number(bits)
  }
  if (rec.on) rec.vector(ins, { dstRegs: regGroup(vd, 1), srcRegs: [] })
}

export const fpHandlers: Record<string, Handler> = {
  'vfsqrt.v': vfsqrt,
  'vfcvt.xu.f.v': toInt(false, false),
  'vfcvt.x.f.v': toInt(true, false),
  'vfcvt.rtz.x.f.v': toInt(true, true),
  'vfcvt.rtz.xu.f.v': toInt(false, true),
  'vfcvt.f.xu.v': fromInt(false),
  'vfcvt.f.x.v': fromInt(true),
  'vfmv.v.f': fMoveOp(false),
  'vfmerge.vfm': fMoveOp(true),
  'vfmv.f.s': vfmvFS,
  'vfmv.s.f': vfmvSF,
}
for (const [name, def] of Object.entries(FP_OPS)) for (const form of def.forms) fpHandlers[`${name}.${form}`] = fpOp(def, form)
for (const [name, def] of Object.entries(FCMP_OPS)) for (const form of def.forms) fpHandlers[`${name}.${form}`] = fcmpOp(def.fn, form, def.signaling)
for (const form of ['vv', 'vf'] as const) {
  fpHandlers[`vfsgnj.${form}`] = sgnjOp('j', form)
  fpHandlers[`vfsgnjn.${form}`] = sgnjOp('n', form)
  fpHandlers[`vfsgnjx.${form}`] = sgnjOp('x', form)
}
