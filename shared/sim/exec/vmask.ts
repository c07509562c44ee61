/**
 * Mask-register logic and mask scans (RISC-V V 1.0 sections 15.1 to 15.8).
 * Mask registers hold one bit per element, element i at bit i of the register.
 */
import type { Handler } from './handler'
import { checkMaskOverlap, operand, requireVtype } from './handler'
import { checkGroup, ExecFault, regGroup } from './machine'

type Logic = (a: boolean, b: boolean) => boolean

/** vd.mask[i] = f(vs2.mask[i], vs1.mask[i]) for i < vl; these are never masked. */
const LOGIC: Record<string, Logic> = {
  vmand: (a, b) => a && b,
  vmnand: (a, b) => !(a && b),
  vmandn: (a, b) => a && !b,
  vmor: (a, b) => a || b,
  vmnor: (a, b) => !(a || b),
  vmorn: (a, b) => a || !b,
  vmxor: (a, b) => a !== b,
  vmxnor: (a, b) => a === b,
}

function logicOp(fn: Logic): Handler {
  return (m, ins, rec) => {
    requireVtype(m, ins)
    const vd = operand(ins, 'vd')
    const vs2 = operand(ins, 'vs2')
    const vs1 = operand(ins, 'vs1')
    for (let i = 0; i < m.vl; i++) m.setMaskBit(vd, i, fn(m.maskBit(vs2, i), m.maskBit(vs1, i)))
    if (rec.on) rec.vector(ins, { dstRegs: regGroup(vd, 1), srcRegs: [regGroup(vs2, 1), regGroup(vs1, 1)] })
  }
}

/** vcpop.m: number of active set bits; vfirst.m: index of the first active set bit or -1. */
function countOp(first: boolean): Handler {
  return (m, ins, rec) => {
    requireVtype(m, ins)
    const vs2 = operand(ins, 'vs2')
    let count = 0
    let at = -1
    for (let i = 0; i < m.vl; i++) {
      if (!m.active(ins.operands.vm, i) || !m.maskBit(vs2, i)) continue
      count++
      if (at < 0) at = i
      if (first) break
    }
    m.setX(ins.operands.rd, BigInt(first ? at : count))
    if (rec.on) rec.vector(ins, { dstRegs: [], srcRegs: [regGroup(vs2, 1)] })
  }
}

/** vmsbf (before first), vmsif (including first), vmsof (only first): active bits only. */
function scanOp(kind: 'sbf' | 'sif' | 'sof'): Handler {
  return (m, ins, rec) => {
    requireVtype(m, ins)
    const vd = operand(ins, 'vd')
    const vs2 = operand(ins, 'vs2')
    if (vd === vs2 || (ins.operands.vm === false && vd === 0)) {
      throw new ExecFault('register-overlap', `${ins.op}: the destination may not overlap the source or the mask (V 1.0 section 15.4)`)
    }
    let seen = false
    for (let i = 0; i < m.vl; i++) {
      if (!m.active(ins.operands.vm, i)) continue
      const bit = m.maskBit(vs2, i)
      let out: boolean
      if (seen) out = false
      else if (bit) {
        seen = true
        out = kind !== 'sbf'
      } else out = kind !== 'sof'
      m.setMaskBit(vd, i, out)
    }
    if (rec.on) rec.vector(ins, { dstRegs: regGroup(vd, 1), srcRegs: [regGroup(vs2, 1)] })
  }
}

/** viota.m: vd[i] = number of set vs2 bits among the active elements before i (V 1.0 section 15.8). */
const viota: Handler = (m, ins, rec) => {
  requireVtype(m, ins)
  const { sew, lmul } = m.vtype
  const vd = checkGroup(ins.operands.vd, lmul, 'vd', ins)
  const vs2 = operand(ins, 'vs2')
  checkMaskOverlap(ins, vd)
  if (vs2 >= vd && vs2 < vd + regGroup(vd, lmul).length) {
    throw new ExecFault('register-overlap', `viota.m: the destination group may not overlap the source v${vs2} (V 1.0 section 15.8)`)
  }
  const d = m.base(vd, sew)
  const narrow = m.ints(sew, true)
  let sum = 0
  for (let i = 0; i < m.vl; i++) {
    if (!m.active(ins.operands.vm, i)) continue
    if (sew === 64) m.i64[d + i] = BigInt(sum)
    else narrow[d + i] = sum
    if (m.maskBit(vs2, i)) sum++
  }
  if (rec.on) rec.vector(ins, { dstRegs: regGroup(vd, lmul), srcRegs: [regGroup(vs2, 1)] })
}

export const maskHandlers: Record<string, Handler> = {
  'vcpop.m': countOp(false),
  'vfirst.m': countOp(true),
  'vmsbf.m': scanOp('sbf'),
  'vmsif.m': scanOp('sif'),
  'vmsof.m': scanOp('sof'),
  'viota.m': viota,
}
for (const [name, fn] of Object.entries(LOGIC)) maskHandlers[`${name}.mm`] = logicOp(fn)
