/**
 * Integer instructions whose operands differ in width, or that saturate,
 * round or carry (RISC-V V 1.0): widening add/sub/multiply/multiply-add
 * (11.2, 11.12, 11.14), narrowing shifts (11.7), zero and sign extension
 * (11.3), add-with-carry and subtract-with-borrow (11.4), the high half of a
 * signed x unsigned product (11.10) and fixed point (12: saturating add and
 * subtract, averaging add and subtract, vsmul, scaling shifts, narrowing clips,
 * rounded by vxrm and reporting saturation in vxsat).
 */
import type { Instruction, Sew } from '../isa/types'
import type { Handler } from './handler'
import { checkMaskOverlap, checkWidthOverlap, operand, requireVtype } from './handler'
import { checkGroup, ExecFault, type ArchState, regGroup } from './machine'
import { readElem, roundoff, writeElem } from './velem'

/** Where the second operand comes from: vs1, x[rs1], or the 5-bit immediate. */
type Form = 'v' | 'x' | 'i'

interface Source {
  /** Width over SEW: 2 for the wide operand, 1/2, 1/4, 1/8 for extensions. */
  width: number
  signed: boolean
}

interface ExtDef {
  /** Destination width over SEW (2 widening, 1 otherwise); 'mask' writes mask bits (vmadc, vmsbc). */
  dst: 1 | 2 | 'mask'
  /** vs2, then the second operand (vs1 / rs1 / imm) when the instruction has one. */
  vs2: Source
  b?: Source
  /** Multiply-add: the destination is the addend (read at the destination width, signed). */
  readsVd?: boolean
  /** v0 is carry/borrow input for every element (the instruction is not masked). */
  carry?: boolean
  /** The result from the operands (BigInt, exact); `sat` reports saturation. */
  fn: (a: bigint, b: bigint, ctx: { sew: number; vxrm: number; d: bigint; carry: bigint; sat: () => void }) => bigint
}

const U = (width = 1): Source => ({ width, signed: false })
const S = (width = 1): Source => ({ width, signed: true })

function scalarOperand(m: ArchState, ins: Instruction, form: Form, sew: number, src: Source): bigint {
  const raw = form === 'x' ? m.x[operand(ins, 'rs1')]! : BigInt(operand(ins, 'imm'))
  const bits = sew * src.width
  return src.signed ? BigInt.asIntN(bits, raw) : BigInt.asUintN(bits, raw)
}

function extOp(def: ExtDef, form: Form | undefined): Handler {
  return (m, ins, rec) => {
    requireVtype(m, ins)
    const { sew, lmul } = m.vtype
    const need = (w: number, what: string): Sew => {
      const eew = sew * w
      if (eew < 8 || eew > 64 || lmul * w > 8 || (lmul * w < 0.125)) {
        throw new ExecFault('illegal-emul', `${ins.op}: ${what} needs EEW ${eew} and EMUL ${lmul * w} with SEW=${sew}, LMUL=${lmul}: outside what V 1.0 allows (EEW 8..64, EMUL 1/8..8)`)
      }
      return eew as Sew
    }
    const dstW = def.dst === 'mask' ? 1 : def.dst
    const dEew = need(dstW, 'the destination')
    const s2Eew = need(def.vs2.width, 'vs2')
    const vd = checkGroup(ins.operands.vd, def.dst === 'mask' ? 1 : lmul * dstW, 'vd', ins)
    const vs2 = checkGroup(ins.operands.vs2, lmul * def.vs2.width, 'vs2', ins)
    const vs1 = form === 'v' ? checkGroup(ins.operands.vs1, lmul * (def.b?.width ?? 1), 'vs1', ins) : 0
    if (!def.carry && def.dst !== 'mask') checkMaskOverlap(ins, vd)
    if (def.dst !== 'mask') {
      checkWidthOverlap(ins, vd, lmul * dstW, dEew, vs2, lmul * def.vs2.width, s2Eew, 'vs2')
      if (form === 'v') checkWidthOverlap(ins, vd, lmul * dstW, dEew, vs1, lmul * (def.b?.width ?? 1), sew * (def.b?.width ?? 1), 'vs1')
    }
    if (def.carry && def.dst !== 'mask' && vd === 0) throw new ExecFault('mask-overlap', `${ins.op}: the destination v0 overlaps the carry input v0`)
    const b = def.b
    const k = form && form !== 'v' && b ? scalarOperand(m, ins, form, sew, b) : 0n
    const bEew = b ? (sew * b.width) as Sew : 8
    let saturated = false
    const ctx = { sew, vxrm: m.vxrm, d: 0n, carry: 0n, sat: () => { saturated = true } }
    const vl = m.vl
    const results: (bigint | undefined)[] = new Array(vl)
    for (let i = 0; i < vl; i++) {
      if (!def.carry && def.dst !== 'mask' && !m.active(ins.operands.vm, i)) continue
      if (def.dst === 'mask' && !def.carry && ins.operands.vm === false) continue
      const a = readElem(m, vs2, s2Eew, i, def.vs2.signed)
      const bv = !b ? 0n : form === 'v' ? readElem(m, vs1, bEew, i, b.signed) : k
      ctx.d = def.readsVd ? readElem(m, vd, dEew, i, true) : 0n
      ctx.carry = def.carry ? (m.maskBit(0, i) ? 1n : 0n) : 0n
      results[i] = def.fn(a, bv, ctx)
    }
    for (let i = 0; i < vl; i++) {
      const r = results[i]
      if (r === undefined) continue
      if (def.dst === 'mask') m.setMaskBit(vd, i, r !== 0n)
      else writeElem(m, vd, dEew, i, r)
    }
    if (saturated) m.vxsat = 1
    if (rec.on) {
      const srcRegs = [regGroup(vs2, lmul * def.vs2.width)]
      if (form === 'v') srcRegs.push(regGroup(vs1, lmul * (b?.width ?? 1)))
      if (def.readsVd) srcRegs.push(regGroup(vd, lmul * dstW))
      rec.vector(ins, {
        dstRegs: regGroup(vd, def.dst === 'mask' ? 1 : lmul * dstW),
        srcRegs,
        ...(def.carry ? { v0IsSelector: true } : {}),
        ...(dstW !== 1 || def.vs2.width !== 1 ? { widths: { dst: dEew, vs2: s2Eew } } : {}),
      })
    }
  }
}

const clampSigned = (v: bigint, bits: number, sat: () => void): bigint => {
  const max = (1n << BigInt(bits - 1)) - 1n
  const min = -(1n << BigInt(bits - 1))
  if (v > max) { sat(); return max }
  if (v < min) { sat(); return min }
  return v
}
const clampUnsigned = (v: bigint, bits: number, sat: () => void): bigint => {
  const max = (1n << BigInt(bits)) - 1n
  if (v > max) { sat(); return max }
  if (v < 0n) { sat(); return 0n }
  return v
}
const shiftOf = (b: bigint, bits: number): bigint => BigInt.asUintN(64, b) & BigInt(bits - 1)

const DEFS: Record<string, [ExtDef, Form[]]> = {}
const def = (name: string, d: ExtDef, forms: Form[]): void => {
  DEFS[name] = [d, forms]
}

// Widening add/sub: the .w forms take a 2 x SEW vs2.
for (const [name, signed, sub] of [['vwaddu', false, false], ['vwadd', true, false], ['vwsubu', false, true], ['vwsub', true, true]] as const) {
  const src = signed ? S : U
  const fn: ExtDef['fn'] = sub ? (a, b) => a - b : (a, b) => a + b
  def(`${name}.v`, { dst: 2, vs2: src(), b: src(), fn }, ['v', 'x'])
  def(`${name}.w`, { dst: 2, vs2: src(2), b: src(), fn }, ['v', 'x'])
}
def('vwmulu', { dst: 2, vs2: U(), b: U(), fn: (a, b) => a * b }, ['v', 'x'])
def('vwmul', { dst: 2, vs2: S(), b: S(), fn: (a, b) => a * b }, ['v', 'x'])
def('vwmulsu', { dst: 2, vs2: S(), b: U(), fn: (a, b) => a * b }, ['v', 'x'])
// vwmacc* vd, vs1, vs2: vd += vs1 x vs2 (b is vs1 or rs1).
def('vwmaccu', { dst: 2, vs2: U(), b: U(), readsVd: true, fn: (a, b, c) => c.d + a * b }, ['v', 'x'])
def('vwmacc', { dst: 2, vs2: S(), b: S(), readsVd: true, fn: (a, b, c) => c.d + a * b }, ['v', 'x'])
def('vwmaccsu', { dst: 2, vs2: U(), b: S(), readsVd: true, fn: (a, b, c) => c.d + a * b }, ['v', 'x'])
def('vwmaccus', { dst: 2, vs2: S(), b: U(), readsVd: true, fn: (a, b, c) => c.d + a * b }, ['x'])
// Narrowing shifts and clips: the shift amount is the low log2(2 x SEW) bits.
def('vnsrl', { dst: 1, vs2: U(2), b: U(), fn: (a, b, c) => a >> shiftOf(b, 2 * c.sew) }, ['v', 'x', 'i'])
def('vnsra', { dst: 1, vs2: S(2), b: U(), fn: (a, b, c) => a >> shiftOf(b, 2 * c.sew) }, ['v', 'x', 'i'])
def('vnclipu', { dst: 1, vs2: U(2), b: U(), fn: (a, b, c) => clampUnsigned(roundoff(a, shiftOf(b, 2 * c.sew), c.vxrm), c.sew, c.sat) }, ['v', 'x', 'i'])
def('vnclip', { dst: 1, vs2: S(2), b: U(), fn: (a, b, c) => clampSigned(roundoff(a, shiftOf(b, 2 * c.sew), c.vxrm), c.sew, c.sat) }, ['v', 'x', 'i'])
// Add-with-carry, subtract-with-borrow and their carry/borrow-out masks.
def('vadc', { dst: 1, vs2: U(), b: U(), carry: true, fn: (a, b, c) => a + b + c.carry }, ['v', 'x', 'i'])
def('vsbc', { dst: 1, vs2: U(), b: U(), carry: true, fn: (a, b, c) => a - b - c.carry }, ['v', 'x'])
def('vmadc.carry', { dst: 'mask', vs2: U(), b: U(), carry: true, fn: (a, b, c) => (a + b + c.carry) >> BigInt(c.sew) }, ['v', 'x', 'i'])
def('vmadc.plain', { dst: 'mask', vs2: U(), b: U(), fn: (a, b, c) => (a + b) >> BigInt(c.sew) }, ['v', 'x', 'i'])
def('vmsbc.carry', { dst: 'mask', vs2: U(), b: U(), carry: true, fn: (a, b, c) => (a - b - c.carry < 0n ? 1n : 0n) }, ['v', 'x'])
def('vmsbc.plain', { dst: 'mask', vs2: U(), b: U(), fn: (a, b) => (a < b ? 1n : 0n) }, ['v', 'x'])
def('vmulhsu', { dst: 1, vs2: S(), b: U(), fn: (a, b, c) => (a * b) >> BigInt(c.sew) }, ['v', 'x'])
// Fixed point.
def('vsaddu', { dst: 1, vs2: U(), b: U(), fn: (a, b, c) => clampUnsigned(a + b, c.sew, c.sat) }, ['v', 'x', 'i'])
def('vsadd', { dst: 1, vs2: S(), b: S(), fn: (a, b, c) => clampSigned(a + b, c.sew, c.sat) }, ['v', 'x', 'i'])
def('vssubu', { dst: 1, vs2: U(), b: U(), fn: (a, b, c) => clampUnsigned(a - b, c.sew, c.sat) }, ['v', 'x'])
def('vssub', { dst: 1, vs2: S(), b: S(), fn: (a, b, c) => clampSigned(a - b, c.sew, c.sat) }, ['v', 'x'])
def('vaaddu', { dst: 1, vs2: U(), b: U(), fn: (a, b, c) => roundoff(a + b, 1n, c.vxrm) }, ['v', 'x'])
def('vaadd', { dst: 1, vs2: S(), b: S(), fn: (a, b, c) => roundoff(a + b, 1n, c.vxrm) }, ['v', 'x'])
def('vasubu', { dst: 1, vs2: U(), b: U(), fn: (a, b, c) => roundoff(a - b, 1n, c.vxrm) }, ['v', 'x'])
def('vasub', { dst: 1, vs2: S(), b: S(), fn: (a, b, c) => roundoff(a - b, 1n, c.vxrm) }, ['v', 'x'])
def('vsmul', { dst: 1, vs2: S(), b: S(), fn: (a, b, c) => clampSigned(roundoff(a * b, BigInt(c.sew - 1), c.vxrm), c.sew, c.sat) }, ['v', 'x'])
def('vssrl', { dst: 1, vs2: U(), b: U(), fn: (a, b, c) => roundoff(a, shiftOf(b, c.sew), c.vxrm) }, ['v', 'x', 'i'])
def('vssra', { dst: 1, vs2: S(), b: U(), fn: (a, b, c) => roundoff(a, shiftOf(b, c.sew), c.vxrm) }, ['v', 'x', 'i'])

const SUFFIX: Record<Form, string> = { v: 'v', x: 'x', i: 'i' }

export const extHandlers: Record<string, Handler> = {}
for (const [key, [d, forms]] of Object.entries(DEFS)) {
  for (const form of forms) {
    let name: string
    if (key.endsWith('.carry')) name = `${key.slice(0, -6)}.v${SUFFIX[form]}m`
    else if (key.endsWith('.plain')) name = `${key.slice(0, -6)}.v${SUFFIX[form]}`
    else if (key.endsWith('.v')) name = `${key.slice(0, -2)}.v${SUFFIX[form]}`
    else if (key.endsWith('.w')) name = `${key.slice(0, -2)}.w${SUFFIX[form]}`
    else if (key === 'vnsrl' || key === 'vnsra' || key === 'vnclipu' || key === 'vnclip') name = `${key}.w${SUFFIX[form]}`
    else if (key === 'vadc' || key === 'vsbc') name = `${key}.v${SUFFIX[form]}m`
    else name = `${key}.v${SUFFIX[form]}`
    extHandlers[name] = extOp(d, form)
  }
}
for (const f of [2, 4, 8]) {
  extHandlers[`vzext.vf${f}`] = extOp({ dst: 1, vs2: U(1 / f), fn: (a) => a }, undefined)
  extHandlers[`vsext.vf${f}`] = extOp({ dst: 1, vs2: S(1 / f), fn: (a) => a }, undefined)
}
