/**
 * Vector integer arithmetic, compares, merges and moves (RISC-V V 1.0 sections
 * 11 and 16.1). Elements below 64 bits use Number arithmetic on typed-array
 * views (stores wrap to SEW bits); 64-bit elements use BigInt views.
 */
import type { Instruction, Sew } from '../isa/types'
import type { Handler } from './handler'
import { checkMaskOverlap, operand, requireVtype } from './handler'
import { checkGroup, ExecFault, type ArchState, regGroup } from './machine'

type Form = 'vv' | 'vx' | 'vi'
type NumFn = (a: number, b: number, d: number, sew: number) => number
type BigFn = (a: bigint, b: bigint, d: bigint) => bigint

interface IntDef {
  num: NumFn
  big: BigFn
  /** Read the sources as signed (true) or unsigned (false) SEW-bit integers. */
  signed: boolean
  forms: Form[]
  /** Multiply-add forms read the destination as the third operand. */
  readsDest?: boolean
}

/** The scalar operand of a .vx/.vi form, truncated to SEW bits (V 1.0 section 11.1). */
function scalar(m: ArchState, ins: Instruction, form: Form, sew: Sew, signed: boolean): bigint {
  const raw = form === 'vx' ? m.x[operand(ins, 'rs1')]! : BigInt(operand(ins, 'imm'))
  return signed ? BigInt.asIntN(sew, raw) : BigInt.asUintN(sew, raw)
}

function intOp(def: IntDef, form: Form): Handler {
  return (m, ins, rec) => {
    requireVtype(m, ins)
    const { sew, lmul } = m.vtype
    const vm = ins.operands.vm
    const vd = checkGroup(ins.operands.vd, lmul, 'vd', ins)
    const vs2 = checkGroup(ins.operands.vs2, lmul, 'vs2', ins)
    const vs1 = form === 'vv' ? checkGroup(ins.operands.vs1, lmul, 'vs1', ins) : 0
    checkMaskOverlap(ins, vd)
    const vl = m.vl
    const d = m.base(vd, sew)
    const s2 = m.base(vs2, sew)
    const s1 = m.base(vs1, sew)
    if (sew === 64) {
      const src = def.signed ? m.i64 : m.u64
      const dst = m.i64
      const k = form === 'vv' ? 0n : scalar(m, ins, form, sew, def.signed)
      for (let i = 0; i < vl; i++) {
        if (!m.active(vm, i)) continue
        dst[d + i] = def.big(src[s2 + i]!, form === 'vv' ? src[s1 + i]! : k, def.readsDest ? src[d + i]! : 0n)
      }
    } else {
      const src = m.ints(sew, def.signed)
      const dst = m.ints(sew, true)
      const k = form === 'vv' ? 0 : Number(scalar(m, ins, form, sew, def.signed))
      for (let i = 0; i < vl; i++) {
        if (!m.active(vm, i)) continue
        dst[d + i] = def.num(src[s2 + i]!, form === 'vv' ? src[s1 + i]! : k, def.readsDest ? src[d + i]! : 0, sew)
      }
    }
    if (rec.on) {
      const srcRegs = [regGroup(vs2, lmul)]
      if (form === 'vv') srcRegs.push(regGroup(vs1, lmul))
      if (def.readsDest) srcRegs.push(regGroup(vd, lmul))
      rec.vector(ins, { dstRegs: regGroup(vd, lmul), srcRegs })
    }
  }
}

const shiftMask = (b: number, sew: number): number => b & (sew - 1)
const bigShift = (b: bigint): bigint => b & 63n

/** Division results for a zero divisor and for overflow are those of V 1.0 section 11.11 (same as the M extension). */
const INT_OPS: Record<string, IntDef> = {
  vadd: { num: (a, b) => a + b, big: (a, b) => a + b, signed: true, forms: ['vv', 'vx', 'vi'] },
  vsub: { num: (a, b) => a - b, big: (a, b) => a - b, signed: true, forms: ['vv', 'vx'] },
  vrsub: { num: (a, b) => b - a, big: (a, b) => b - a, signed: true, forms: ['vx', 'vi'] },
  vand: { num: (a, b) => a & b, big: (a, b) => a & b, signed: true, forms: ['vv', 'vx', 'vi'] },
  vor: { num: (a, b) => a | b, big: (a, b) => a | b, signed: true, forms: ['vv', 'vx', 'vi'] },
  vxor: { num: (a, b) => a ^ b, big: (a, b) => a ^ b, signed: true, forms: ['vv', 'vx', 'vi'] },
  vsll: { num: (a, b, _d, sew) => a << shiftMask(b, sew), big: (a, b) => a << bigShift(b), signed: false, forms: ['vv', 'vx', 'vi'] },
  vsrl: { num: (a, b, _d, sew) => a >>> shiftMask(b, sew), big: (a, b) => a >> bigShift(b), signed: false, forms: ['vv', 'vx', 'vi'] },
  vsra: {
    num: (a, b, _d, sew) => a >> shiftMask(b, sew),
    // The shift amount is the low 6 bits of the (signed-read) operand.
    big: (a, b) => a >> (BigInt.asUintN(64, b) & 63n),
    signed: true,
    forms: ['vv', 'vx', 'vi'],
  },
  vmin: { num: (a, b) => (a < b ? a : b), big: (a, b) => (a < b ? a : b), signed: true, forms: ['vv', 'vx'] },
  vminu: { num: (a, b) => (a < b ? a : b), big: (a, b) => (a < b ? a : b), signed: false, forms: ['vv', 'vx'] },
  vmax: { num: (a, b) => (a > b ? a : b), big: (a, b) => (a > b ? a : b), signed: true, forms: ['vv', 'vx'] },
  vmaxu: { num: (a, b) => (a > b ? a : b), big: (a, b) => (a > b ? a : b), signed: false, forms: ['vv', 'vx'] },
  vmul: { num: (a, b) => Math.imul(a, b), big: (a, b) => a * b, signed: true, forms: ['vv', 'vx'] },
  vmulh: { num: mulHigh, big: (a, b) => (a * b) >> 64n, signed: true, forms: ['vv', 'vx'] },
  vmulhu: { num: mulHigh, big: (a, b) => (a * b) >> 64n, signed: false, forms: ['vv', 'vx'] },
  vdiv: {
    num: (a, b) => (b === 0 ? -1 : Math.trunc(a / b)), // -2^(SEW-1) / -1 wraps back to -2^(SEW-1) on store
    big: (a, b) => (b === 0n ? -1n : a / b),
    signed: true,
    forms: ['vv', 'vx'],
  },
  vdivu: { num: (a, b) => (b === 0 ? -1 : Math.trunc(a / b)), big: (a, b) => (b === 0n ? -1n : a / b), signed: false, forms: ['vv', 'vx'] },
  vrem: { num: (a, b) => (b === 0 ? a : a % b), big: (a, b) => (b === 0n ? a : a % b), signed: true, forms: ['vv', 'vx'] },
  vremu: { num: (a, b) => (b === 0 ? a : a % b), big: (a, b) => (b === 0n ? a : a % b), signed: false, forms: ['vv', 'vx'] },
  // vmacc vd, vs1, vs2: vd = vs1 x vs2 + vd (a = vs2, b = vs1 or rs1, d = vd)
  vmacc: { num: (a, b, d) => Math.imul(a, b) + d, big: (a, b, d) => a * b + d, signed: true, forms: ['vv', 'vx'], readsDest: true },
  vnmsac: { num: (a, b, d) => d - Math.imul(a, b), big: (a, b, d) => d - a * b, signed: true, forms: ['vv', 'vx'], readsDest: true },
  // vmadd vd, vs1, vs2: vd = vs1 x vd + vs2
  vmadd: { num: (a, b, d) => Math.imul(b, d) + a, big: (a, b, d) => b * d + a, signed: true, forms: ['vv', 'vx'], readsDest: true },
  vnmsub: { num: (a, b, d) => a - Math.imul(b, d), big: (a, b, d) => a - b * d, signed: true, forms: ['vv', 'vx'], readsDest: true },
}

/** High half of an SEW x SEW product; exact in doubles below SEW 32. */
function mulHigh(a: number, b: number, _d: number, sew: number): number {
  if (sew < 32) return Math.floor((a * b) / 2 ** sew)
  return Number((BigInt(a) * BigInt(b)) >> 32n)
}

type CmpNum = (a: number, b: number) => boolean
type CmpBig = (a: bigint, b: bigint) => boolean
interface CmpDef {
  num: CmpNum
  big: CmpBig
  signed: boolean
  forms: Form[]
}

const eq = <T>(a: T, b: T): boolean => a === b
const ne = <T>(a: T, b: T): boolean => a !== b
const lt = <T>(a: T, b: T): boolean => a < b
const le = <T>(a: T, b: T): boolean => a <= b
const gt = <T>(a: T, b: T): boolean => a > b

/** Integer compares write one mask bit per element (V 1.0 section 11.8). */
const CMP_OPS: Record<string, CmpDef> = {
  vmseq: { num: eq, big: eq, signed: true, forms: ['vv', 'vx', 'vi'] },
  vmsne: { num: ne, big: ne, signed: true, forms: ['vv', 'vx', 'vi'] },
  vmsltu: { num: lt, big: lt, signed: false, forms: ['vv', 'vx'] },
  vmslt: { num: lt, big: lt, signed: true, forms: ['vv', 'vx'] },
  vmsleu: { num: le, big: le, signed: false, forms: ['vv', 'vx', 'vi'] },
  vmsle: { num: le, big: le, signed: true, forms: ['vv', 'vx', 'vi'] },
  vmsgtu: { num: gt, big: gt, signed: false, forms: ['vx', 'vi'] },
  vmsgt: { num: gt, big: gt, signed: true, forms: ['vx', 'vi'] },
}

function cmpOp(def: CmpDef, form: Form): Handler {
  return (m, ins, rec) => {
    requireVtype(m, ins)
    const { sew, lmul } = m.vtype
    const vm = ins.operands.vm
    const vd = checkGroup(ins.operands.vd, 1, 'vd', ins)
    const vs2 = checkGroup(ins.operands.vs2, lmul, 'vs2', ins)
    const vs1 = form === 'vv' ? checkGroup(ins.operands.vs1, lmul, 'vs1', ins) : 0
    const vl = m.vl
    const s2 = m.base(vs2, sew)
    const s1 = m.base(vs1, sew)
    // Results go to a scratch copy first: vd may overlap a source group.
    const bits = new Uint8Array(vl)
    if (sew === 64) {
      const src = def.signed ? m.i64 : m.u64
      const k = form === 'vv' ? 0n : scalar(m, ins, form, sew, def.signed)
      for (let i = 0; i < vl; i++) if (m.active(vm, i)) bits[i] = def.big(src[s2 + i]!, form === 'vv' ? src[s1 + i]! : k) ? 1 : 2
    } else {
      const src = m.ints(sew, def.signed)
      const k = form === 'vv' ? 0 : Number(scalar(m, ins, form, sew, def.signed))
      for (let i = 0; i < vl; i++) if (m.active(vm, i)) bits[i] = def.num(src[s2 + i]!, form === 'vv' ? src[s1 + i]! : k) ? 1 : 2
    }
    writeMaskBits(m, vd, bits)
    if (rec.on) {
      const srcRegs = [regGroup(vs2, lmul)]
      if (form === 'vv') srcRegs.push(regGroup(vs1, lmul))
      rec.vector(ins, { dstRegs: regGroup(vd, 1), srcRegs })
    }
  }
}

/** bits[i]: 0 leaves mask bit i undisturbed, 1 sets it, 2 clears it. */
export function writeMaskBits(m: ArchState, vd: number, bits: Uint8Array): void {
  for (let i = 0; i < bits.length; i++) if (bits[i]) m.setMaskBit(vd, i, bits[i] === 1)
}

/** vmerge.v{v,x,i}m (v0 selects vs1/scalar over vs2) and vmv.v.{v,x,i} (V 1.0 sections 11.15, 11.16). */
function mergeOp(form: Form, merge: boolean): Handler {
  return (m, ins, rec) => {
    requireVtype(m, ins)
    const { sew, lmul } = m.vtype
    const vd = checkGroup(ins.operands.vd, lmul, 'vd', ins)
    const vs2 = merge ? checkGroup(ins.operands.vs2, lmul, 'vs2', ins) : 0
    const vs1 = form === 'vv' ? checkGroup(ins.operands.vs1, lmul, 'vs1', ins) : 0
    if (merge && vd === 0) throw new ExecFault('mask-overlap', `${ins.op}: the destination v0 overlaps the selector mask v0`)
    copyOrMerge(m, sew, vd, vs2, form === 'vv' ? vs1 : -1, form === 'vv' ? 0n : scalar(m, ins, form, sew, true), merge)
    if (rec.on) {
      const srcRegs: number[][] = []
      if (merge) srcRegs.push(regGroup(vs2, lmul))
      if (form === 'vv') srcRegs.push(regGroup(vs1, lmul))
      rec.vector(ins, { dstRegs: regGroup(vd, lmul), srcRegs, v0IsSelector: merge })
    }
  }
}

/**
 * vd[i] = (merge && !v0[i]) ? vs2[i] : (vs1 >= 0 ? vs1[i] : k), for i < vl, bit for
 * bit (shared by the FP merge and move).
 */
export function copyOrMerge(m: ArchState, sew: Sew, vd: number, vs2: number, vs1: number, k: bigint, merge: boolean): void {
  const vl = m.vl
  const d = m.base(vd, sew)
  const s2 = m.base(vs2, sew)
  const s1 = m.base(Math.max(vs1, 0), sew)
  if (sew === 64) {
    const v = m.u64
    const kk = BigInt.asUintN(64, k)
    for (let i = 0; i < vl; i++) v[d + i] = merge && !m.maskBit(0, i) ? v[s2 + i]! : vs1 >= 0 ? v[s1 + i]! : kk
  } else {
    const v = m.ints(sew, false)
    const kk = Number(BigInt.asUintN(sew, k))
    for (let i = 0; i < vl; i++) v[d + i] = merge && !m.maskBit(0, i) ? v[s2 + i]! : vs1 >= 0 ? v[s1 + i]! : kk
  }
}

/** vid.v: vd[i] = i for active elements (V 1.0 section 15.9). */
const vid: Handler = (m, ins, rec) => {
  requireVtype(m, ins)
  const { sew, lmul } = m.vtype
  const vd = checkGroup(ins.operands.vd, lmul, 'vd', ins)
  checkMaskOverlap(ins, vd)
  const d = m.base(vd, sew)
  const narrow = m.ints(sew, true)
  for (let i = 0; i < m.vl; i++) {
    if (!m.active(ins.operands.vm, i)) continue
    if (sew === 64) m.i64[d + i] = BigInt(i)
    else narrow[d + i] = i
  }
  if (rec.on) rec.vector(ins, { dstRegs: regGroup(vd, lmul), srcRegs: [] })
}

export const intHandlers: Record<string, Handler> = { 'vid.v': vid }
for (const [name, def] of Object.entries(INT_OPS)) for (const form of def.forms) intHandlers[`${name}.${form}`] = intOp(def, form)
for (const [name, def] of Object.entries(CMP_OPS)) for (const form of def.forms) intHandlers[`${name}.${form}`] = cmpOp(def, form)
for (const form of ['vv', 'vx', 'vi'] as const) {
  intHandlers[`vmerge.${form}m`] = mergeOp(form, true)
  intHandlers[`vmv.v.${form.slice(1)}`] = mergeOp(form, false)
}
