/**
 * The remaining V 1.0 instructions: vrgatherei16.vv (16.4), whole-register
 * moves vmv<nr>r.v (16.6) and the widening reductions vwredsum[u].vs (14.2),
 * vfwredusum.vs and vfwredosum.vs (14.3).
 */
import { arith, BINARY64, NV, RNE, signalingNaN, takeFlags } from './fp'
import type { Handler } from './handler'
import { checkMaskOverlap, requireVtype, vectorRoundingMode } from './handler'
import { checkGroup, ExecFault, regGroup } from './machine'
import { readElem, writeElem } from './velem'

/** vd[i] = vs1[i] < VLMAX ? vs2[vs1[i]] : 0, with 16-bit indices (EMUL = 16 / SEW x LMUL). */
const vrgatherei16: Handler = (m, ins, rec) => {
  requireVtype(m, ins)
  const { sew, lmul } = m.vtype
  const indexEmul = (16 / sew) * lmul
  if (indexEmul > 8) throw new ExecFault('illegal-emul', `${ins.op}: 16-bit indices need EMUL ${indexEmul} with SEW=${sew}, LMUL=${lmul}, above 8`)
  const vd = checkGroup(ins.operands.vd, lmul, 'vd', ins)
  const vs2 = checkGroup(ins.operands.vs2, lmul, 'vs2', ins)
  const vs1 = checkGroup(ins.operands.vs1, indexEmul, 'vs1', ins)
  checkMaskOverlap(ins, vd)
  const max = m.vlmax
  const source = new Int32Array(m.vl).fill(-1)
  const out: (bigint | undefined)[] = new Array(m.vl)
  for (let i = 0; i < m.vl; i++) {
    if (!m.active(ins.operands.vm, i)) continue
    const idx = Number(readElem(m, vs1, 16, i, false))
    if (idx < max) source[i] = idx
    out[i] = idx < max ? readElem(m, vs2, sew, idx, false) : 0n
  }
  out.forEach((v, i) => v !== undefined && writeElem(m, vd, sew, i, v))
  if (rec.on) rec.vector(ins, { dstRegs: regGroup(vd, lmul), srcRegs: [regGroup(vs2, lmul), regGroup(vs1, indexEmul)], sourceIndex: source })
}

/** vmv<nr>r.v: copies nr whole registers, whatever vl and vtype say. */
function wholeMove(nr: number): Handler {
  return (m, ins, rec) => {
    const vd = checkGroup(ins.operands.vd, nr, 'vd', ins)
    const vs2 = checkGroup(ins.operands.vs2, nr, 'vs2', ins)
    m.u8.copyWithin(vd * m.vlenb, vs2 * m.vlenb, (vs2 + nr) * m.vlenb)
    // Timed as nr registers of SEW-wide elements: nr x VLEN / SEW of them, whatever vl is.
    if (rec.on) rec.vector(ins, { vl: (nr * m.vlenb * 8) / m.vtype.sew, dstRegs: regGroup(vd, nr), srcRegs: [regGroup(vs2, nr)], wholeRegisters: nr })
  }
}

/** vwredsum[u].vs: vd[0] (2 x SEW) = vs1[0] (2 x SEW) + the active vs2 elements, sign- or zero-extended. */
function wideIntReduction(signed: boolean): Handler {
  return (m, ins, rec) => {
    requireVtype(m, ins)
    const { sew, lmul } = m.vtype
    if (sew === 64) throw new ExecFault('illegal-sew', `${ins.op} needs SEW 8, 16 or 32 (the sum is 2 x SEW), but vtype has SEW=64`)
    const vd = checkGroup(ins.operands.vd, 1, 'vd', ins)
    const vs2 = checkGroup(ins.operands.vs2, lmul, 'vs2', ins)
    const vs1 = checkGroup(ins.operands.vs1, 1, 'vs1', ins)
    const wide = (2 * sew) as 16 | 32 | 64
    if (m.vl > 0) {
      let acc = readElem(m, vs1, wide, 0, true)
      for (let i = 0; i < m.vl; i++) if (m.active(ins.operands.vm, i)) acc += readElem(m, vs2, sew, i, signed)
      writeElem(m, vd, wide, 0, acc)
    }
    if (rec.on) rec.vector(ins, { dstRegs: regGroup(vd, 1), srcRegs: [regGroup(vs2, lmul), regGroup(vs1, 1)], widths: { dst: wide, vs2: sew } })
  }
}

/**
 * vfwred[u/o]sum.vs: binary32 elements added to a binary64 start value in
 * element order (as QEMU does for both; the unordered form may use any order).
 * Each addition rounds once in binary64, in frm.
 */
const wideFpReduction: Handler = (m, ins, rec) => {
  requireVtype(m, ins)
  const { sew, lmul } = m.vtype
  if (sew !== 32) throw new ExecFault('illegal-sew', `${ins.op} needs SEW 32 (binary32 elements, a binary64 sum), but vtype has SEW=${sew}`)
  const vd = checkGroup(ins.operands.vd, 1, 'vd', ins)
  const vs2 = checkGroup(ins.operands.vs2, lmul, 'vs2', ins)
  const vs1 = checkGroup(ins.operands.vs1, 1, 'vs1', ins)
  const mode = vectorRoundingMode(m, ins)
  if (m.vl > 0) {
    let acc = m.f64[m.base(vs1, 64)]!
    let active = 0
    const s2 = m.base(vs2, 32)
    const flags = m.readsFpFlags
    let snan = flags && signalingNaN(m.u64[m.base(vs1, 64)]!, 64)
    if (flags) takeFlags()
    for (let i = 0; i < m.vl; i++) {
      if (!m.active(ins.operands.vm, i)) continue
      // With flags wanted the addition goes through fp.ts's exact path, which raises them.
      acc = flags || mode !== RNE ? arith('add', acc, m.f32[s2 + i]!, BINARY64, mode, true) : acc + m.f32[s2 + i]!
      if (flags) snan ||= signalingNaN(BigInt(m.u32[s2 + i]!), 32)
      active++
    }
    if (flags && active > 0) m.fflags |= takeFlags() | (snan ? NV : 0)
    const d = m.base(vd, 64)
    if (active === 0) m.u64[d] = m.u64[m.base(vs1, 64)]!
    else m.storeF64(d, acc)
  }
  if (rec.on) rec.vector(ins, { dstRegs: regGroup(vd, 1), srcRegs: [regGroup(vs2, lmul), regGroup(vs1, 1)], widths: { dst: 64, vs2: 32 } })
}

export const miscHandlers: Record<string, Handler> = {
  'vrgatherei16.vv': vrgatherei16,
  'vwredsum.vs': wideIntReduction(true),
  'vwredsumu.vs': wideIntReduction(false),
  'vfwredusum.vs': wideFpReduction,
  'vfwredosum.vs': wideFpReduction,
}
for (const nr of [1, 2, 4, 8]) miscHandlers[`vmv${nr}r.v`] = wholeMove(nr)
