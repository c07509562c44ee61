/**
 * Vector FP instructions across widths (RISC-V V 1.0): widening add, subtract,
 * multiply and multiply-add (13.3, 13.5, 13.7), the widening and narrowing
 * conversions (13.18, 13.19, with the round-towards-zero and round-to-odd
 * forms), and vfclass (13.14). binary32 sources widen to binary64; half
 * precision is not supported, so conversions that would read or write binary16
 * are refused. Dynamic rounding is frm's mode; results that are NaN are the
 * canonical NaN. When the program can read fflags (ArchState.readsFpFlags)
 * they accrue IEEE 754 exception flags, as vfp.ts does.
 */
import type { Instruction, Sew } from '../isa/types'
import { arith, BINARY64, floatToInt, fusedMultiplyAdd, intToFloat, NV, RNE, RTZ, type RoundingMode, signalingNaN, takeFlags, toBinary32, BINARY32 } from './fp'
import type { Handler } from './handler'
import { checkMaskOverlap, checkWidthOverlap, operand, requireVtype, vectorRoundingMode } from './handler'
import { checkGroup, ExecFault, type ArchState, regGroup } from './machine'
import { readElem, writeElem } from './velem'

function readF(m: ArchState, reg: number, eew: 32 | 64, i: number): number {
  return eew === 64 ? m.f64[m.base(reg, 64) + i]! : m.f32[m.base(reg, 32) + i]!
}

/** Element i of the group at `reg` at width eew is a signaling NaN (quiet bit clear). */
function signalingF(m: ArchState, reg: number, eew: 32 | 64, i: number): boolean {
  return signalingNaN(readElem(m, reg, eew, i, false), eew)
}

function writeF(m: ArchState, reg: number, eew: 32 | 64, i: number, v: number): void {
  if (eew === 64) m.storeF64(m.base(reg, 64) + i, v)
  else m.storeF32(m.base(reg, 32) + i, v)
}

/** Checks SEW against what the instruction's formats need and returns the widths. */
function widths(m: ArchState, ins: Instruction, allowed: readonly Sew[]): Sew {
  requireVtype(m, ins)
  const sew = m.vtype.sew
  if (!allowed.includes(sew)) {
    throw new ExecFault('illegal-sew', `${ins.op} needs SEW ${allowed.join(' or ')} here (Chimeline has no binary16), but vtype has SEW=${sew}`)
  }
  if (m.vtype.lmul * 2 > 8) throw new ExecFault('illegal-emul', `${ins.op}: the 2 x SEW operand needs EMUL ${m.vtype.lmul * 2}, above 8`)
  return sew
}

type Form = 'vv' | 'vf' | 'wv' | 'wf'

/** a = vs2[i], b = vs1[i] or f[rs1], d = vd[i]: the binary64 result rounded in `mode`. */
type WideFn = (a: number, b: number, d: number, mode: RoundingMode) => number

/**
 * vfwadd/vfwsub/vfwmul (.vv .vf .wv .wf) and vfwmacc & co: binary32 operands,
 * binary64 results rounded in frm; `fn` is the fast result in round to
 * nearest even, `exact` the same in any mode raising its flags.
 */
function wideArith(fn: WideFn, form: Form, readsVd: boolean, exact: WideFn = fn): Handler {
  return (m, ins, rec) => {
    widths(m, ins, [32])
    const mode = vectorRoundingMode(m, ins)
    const lmul = m.vtype.lmul
    const wideA = form === 'wv' || form === 'wf'
    const vd = checkGroup(ins.operands.vd, 2 * lmul, 'vd', ins)
    const vs2 = checkGroup(ins.operands.vs2, wideA ? 2 * lmul : lmul, 'vs2', ins)
    const vv = form === 'vv' || form === 'wv'
    const vs1 = vv ? checkGroup(ins.operands.vs1, lmul, 'vs1', ins) : 0
    checkMaskOverlap(ins, vd)
    checkWidthOverlap(ins, vd, 2 * lmul, 64, vs2, wideA ? 2 * lmul : lmul, wideA ? 64 : 32, 'vs2')
    if (vv) checkWidthOverlap(ins, vd, 2 * lmul, 64, vs1, lmul, 32, 'vs1')
    const k = vv ? 0 : m.f32Operand(operand(ins, 'rs1'))
    const flags = m.readsFpFlags
    const kSignaling = flags && !vv && signalingNaN(BigInt(m.f32OperandBits(operand(ins, 'rs1'))), 32)
    if (flags) takeFlags()
    for (let i = 0; i < m.vl; i++) {
      if (!m.active(ins.operands.vm, i)) continue
      const a = readF(m, vs2, wideA ? 64 : 32, i)
      const b = vv ? readF(m, vs1, 32, i) : k
      if (flags && (kSignaling || signalingF(m, vs2, wideA ? 64 : 32, i) || (vv && signalingF(m, vs1, 32, i)) || (readsVd && signalingF(m, vd, 64, i)))) m.fflags |= NV
      writeF(m, vd, 64, i, (flags || mode !== RNE ? exact : fn)(a, b, readsVd ? readF(m, vd, 64, i) : 0, mode))
    }
    if (flags) m.fflags |= takeFlags()
    if (rec.on) {
      const srcRegs = [regGroup(vs2, wideA ? 2 * lmul : lmul)]
      if (vv) srcRegs.push(regGroup(vs1, lmul))
      if (readsVd) srcRegs.push(regGroup(vd, 2 * lmul))
      rec.vector(ins, { dstRegs: regGroup(vd, 2 * lmul), srcRegs, widths: { dst: 64, vs2: wideA ? 64 : 32 } })
    }
  }
}

type Kind = 'f' | 'x' | 'xu'

/**
 * A conversion element by element: `from` at EEW `srcEew` to `to` at `dstEew`
 * (one of them 2 x SEW), rounding by frm unless `mode` fixes it.
 */
function convert(from: Kind, to: Kind, dir: 'widen' | 'narrow', allowed: readonly Sew[], mode?: RoundingMode | 'odd'): Handler {
  return (m, ins, rec) => {
    const sew = widths(m, ins, allowed)
    const lmul = m.vtype.lmul
    const dstEew = (dir === 'widen' ? 2 * sew : sew) as Sew
    const srcEew = (dir === 'widen' ? sew : 2 * sew) as Sew
    const vd = checkGroup(ins.operands.vd, dir === 'widen' ? 2 * lmul : lmul, 'vd', ins)
    const vs2 = checkGroup(ins.operands.vs2, dir === 'widen' ? lmul : 2 * lmul, 'vs2', ins)
    checkMaskOverlap(ins, vd)
    checkWidthOverlap(ins, vd, dir === 'widen' ? 2 * lmul : lmul, dstEew, vs2, dir === 'widen' ? lmul : 2 * lmul, srcEew, 'vs2')
    const rm = mode === undefined ? vectorRoundingMode(m, ins) : mode
    const flags = m.readsFpFlags
    if (flags) takeFlags()
    for (let i = 0; i < m.vl; i++) {
      if (!m.active(ins.operands.vm, i)) continue
      if (from === 'f') {
        const x = readF(m, vs2, srcEew as 32 | 64, i)
        if (flags && signalingF(m, vs2, srcEew as 32 | 64, i)) m.fflags |= NV
        if (to === 'f') {
          let r: number
          if (dstEew === 64) r = x
          else if (rm === 'odd') {
            // Round to odd (13.19): truncate, then set the last bit when inexact.
            r = toBinary32(x, RTZ)
            if (r !== x && Number.isFinite(r) && x === x) {
              const f = new Float32Array([r])
              new Uint32Array(f.buffer)[0]! |= 1
              r = f[0]!
            }
          } else r = toBinary32(x, rm, flags)
          writeF(m, vd, dstEew as 32 | 64, i, r)
        } else {
          const v = floatToInt(x, dstEew, to === 'x', false, rm === 'odd' ? RTZ : rm)
          writeElem(m, vd, dstEew, i, v)
        }
      } else {
        const v = readElem(m, vs2, srcEew, i, from === 'x')
        writeF(m, vd, dstEew as 32 | 64, i, intToFloat(v, dstEew === 64 ? BINARY64 : BINARY32, rm === 'odd' ? RTZ : rm))
      }
    }
    if (flags) m.fflags |= takeFlags()
    if (rec.on) {
      rec.vector(ins, {
        dstRegs: regGroup(vd, dir === 'widen' ? 2 * lmul : lmul),
        srcRegs: [regGroup(vs2, dir === 'widen' ? lmul : 2 * lmul)],
        widths: { dst: dstEew, vs2: srcEew },
      })
    }
  }
}

/** vfclass.v: the F extension's ten classes as one bit of an SEW-bit integer. */
const vfclass: Handler = (m, ins, rec) => {
  requireVtype(m, ins)
  const { sew, lmul } = m.vtype
  if (sew !== 32 && sew !== 64) throw new ExecFault('illegal-sew', `${ins.op} needs SEW 32 or 64, but vtype has SEW=${sew}`)
  const vd = checkGroup(ins.operands.vd, lmul, 'vd', ins)
  const vs2 = checkGroup(ins.operands.vs2, lmul, 'vs2', ins)
  checkMaskOverlap(ins, vd)
  for (let i = 0; i < m.vl; i++) {
    if (!m.active(ins.operands.vm, i)) continue
    const bits = readElem(m, vs2, sew, i, false)
    writeElem(m, vd, sew, i, BigInt(1 << classify(bits, sew)))
  }
  if (rec.on) rec.vector(ins, { dstRegs: regGroup(vd, lmul), srcRegs: [regGroup(vs2, lmul)] })
}

/** The class bit (0 -inf .. 9 quiet NaN) of a raw binary32/binary64 pattern. */
export function classify(bits: bigint, width: 32 | 64): number {
  const fracBits = width === 64 ? 52n : 23n
  const expBits = width === 64 ? 11n : 8n
  const neg = (bits >> BigInt(width - 1)) & 1n
  const exp = (bits >> fracBits) & ((1n << expBits) - 1n)
  const frac = bits & ((1n << fracBits) - 1n)
  const maxExp = (1n << expBits) - 1n
  if (exp === maxExp) {
    if (frac === 0n) return neg ? 0 : 7
    return (frac >> (fracBits - 1n)) & 1n ? 9 : 8
  }
  const kind = exp === 0n ? (frac === 0n ? 3 : 2) : 1
  return neg ? kind : 7 - kind
}

export const fpExtHandlers: Record<string, Handler> = {
  'vfclass.v': vfclass,
  'vfwcvt.f.f.v': convert('f', 'f', 'widen', [32]),
  'vfwcvt.f.x.v': convert('x', 'f', 'widen', [16, 32]),
  'vfwcvt.f.xu.v': convert('xu', 'f', 'widen', [16, 32]),
  'vfwcvt.x.f.v': convert('f', 'x', 'widen', [32]),
  'vfwcvt.xu.f.v': convert('f', 'xu', 'widen', [32]),
  'vfwcvt.rtz.x.f.v': convert('f', 'x', 'widen', [32], RTZ),
  'vfwcvt.rtz.xu.f.v': convert('f', 'xu', 'widen', [32], RTZ),
  'vfncvt.f.f.w': convert('f', 'f', 'narrow', [32]),
  'vfncvt.rod.f.f.w': convert('f', 'f', 'narrow', [32], 'odd'),
  'vfncvt.f.x.w': convert('x', 'f', 'narrow', [32]),
  'vfncvt.f.xu.w': convert('xu', 'f', 'narrow', [32]),
  'vfncvt.x.f.w': convert('f', 'x', 'narrow', [16, 32]),
  'vfncvt.xu.f.w': convert('f', 'xu', 'narrow', [16, 32]),
  'vfncvt.rtz.x.f.w': convert('f', 'x', 'narrow', [16, 32], RTZ),
  'vfncvt.rtz.xu.f.w': convert('f', 'xu', 'narrow', [16, 32], RTZ),
}
for (const form of ['vv', 'vf'] as const) {
  fpExtHandlers[`vfwadd.${form}`] = wideArith((a, b) => a + b, form, false, (a, b, _d, r) => arith('add', a, b, BINARY64, r, true))
  fpExtHandlers[`vfwsub.${form}`] = wideArith((a, b) => a - b, form, false, (a, b, _d, r) => arith('sub', a, b, BINARY64, r, true))
  // binary32 x binary32 is exact in binary64 (24 + 24 < 53 bits): nothing to round, in any mode.
  fpExtHandlers[`vfwmul.${form}`] = wideArith((a, b) => a * b, form, false)
  fpExtHandlers[`vfwmacc.${form}`] = wideArith((a, b, d, r) => fusedMultiplyAdd(b, a, d, BINARY64, r), form, true)
  fpExtHandlers[`vfwnmacc.${form}`] = wideArith((a, b, d, r) => fusedMultiplyAdd(-b, a, -d, BINARY64, r), form, true)
  fpExtHandlers[`vfwmsac.${form}`] = wideArith((a, b, d, r) => fusedMultiplyAdd(b, a, -d, BINARY64, r), form, true)
  fpExtHandlers[`vfwnmsac.${form}`] = wideArith((a, b, d, r) => fusedMultiplyAdd(-b, a, d, BINARY64, r), form, true)
}
for (const form of ['wv', 'wf'] as const) {
  fpExtHandlers[`vfwadd.${form}`] = wideArith((a, b) => a + b, form, false, (a, b, _d, r) => arith('add', a, b, BINARY64, r, true))
  fpExtHandlers[`vfwsub.${form}`] = wideArith((a, b) => a - b, form, false, (a, b, _d, r) => arith('sub', a, b, BINARY64, r, true))
}
