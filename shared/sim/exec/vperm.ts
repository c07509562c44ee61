/**
 * Scalar moves, slides, register gathers and compress (RISC-V V 1.0 sections
 * 16.1 to 16.5). Elements move bit for bit. Sources are read from a snapshot so
 * that an overlapping destination never feeds itself.
 */
import type { Instruction, Sew } from '../isa/types'
import type { Handler } from './handler'
import { checkMaskOverlap, operand, requireFpSew, requireVtype } from './handler'
import { checkGroup, ExecFault, groupSize, type ArchState, regGroup } from './machine'

/** Unsigned SEW-bit elements of a register group, copied out of the register file. */
class Snapshot {
  private readonly narrow: Uint8Array | Uint16Array | Uint32Array | undefined
  private readonly wide: BigUint64Array | undefined
  constructor(m: ArchState, reg: number, lmul: number, sew: Sew) {
    const bytes = m.u8.slice(reg * m.vlenb, (reg + groupSize(lmul)) * m.vlenb)
    if (sew === 64) this.wide = new BigUint64Array(bytes.buffer)
    else this.narrow = sew === 8 ? bytes : sew === 16 ? new Uint16Array(bytes.buffer) : new Uint32Array(bytes.buffer)
  }
  get(i: number): bigint {
    return this.wide ? this.wide[i]! : BigInt(this.narrow![i]!)
  }
}

function setElem(m: ArchState, sew: Sew, index: number, value: bigint): void {
  if (sew === 64) m.u64[index] = BigInt.asUintN(64, value)
  else m.ints(sew, false)[index] = Number(BigInt.asUintN(sew, value))
}

function checkNoOverlap(ins: Instruction, vd: number, src: number, size: number, role: string): void {
  if (vd < src + size && src < vd + size) {
    throw new ExecFault('register-overlap', `${ins.op}: the destination group v${vd} may not overlap the source ${role} v${src} (V 1.0 section 16)`)
  }
}

/** The x or f scalar an instruction slides in, as SEW bits. */
function scalarBits(m: ArchState, ins: Instruction, fp: boolean): bigint {
  const rs1 = operand(ins, 'rs1')
  if (!fp) return m.x[rs1]!
  return m.vtype.sew === 64 ? m.fBits[rs1]! : BigInt(m.f32OperandBits(rs1))
}

type Kind = 'slideup' | 'slidedown' | 'slide1up' | 'slide1down' | 'gather-vv' | 'gather-x'

/**
 * The one loop behind slides and gathers: `from(i)` names the vs2 element that
 * destination element i receives, -1 for the scalar (slide1), -2 for zero,
 * -3 to leave it undisturbed.
 */
function permute(kind: Kind, form: 'vx' | 'vi' | 'vf' | 'vv'): Handler {
  return (m, ins, rec) => {
    if (form === 'vf') requireFpSew(m, ins)
    else requireVtype(m, ins)
    const { sew, lmul } = m.vtype
    const n = groupSize(lmul)
    const vd = checkGroup(ins.operands.vd, lmul, 'vd', ins)
    const vs2 = checkGroup(ins.operands.vs2, lmul, 'vs2', ins)
    checkMaskOverlap(ins, vd)
    const vl = m.vl
    const max = m.vlmax
    const src = new Snapshot(m, vs2, lmul, sew)
    let indexOf: (i: number) => number
    let vs1 = -1
    if (kind === 'gather-vv') {
      vs1 = checkGroup(ins.operands.vs1, lmul, 'vs1', ins)
      checkNoOverlap(ins, vd, vs1, n, 'vs1')
      const idx = new Snapshot(m, vs1, lmul, sew)
      indexOf = (i) => {
        const k = idx.get(i)
        return k < BigInt(max) ? Number(k) : -2
      }
    } else {
      // The offset or index: x[rs1] as an unsigned XLEN value, or the 5-bit immediate.
      const raw = form === 'vi' ? BigInt(operand(ins, 'imm')) : form === 'vx' && kind !== 'slide1up' && kind !== 'slide1down' ? BigInt.asUintN(64, m.x[operand(ins, 'rs1')]!) : 0n
      const off = raw > BigInt(2 * max) ? 2 * max : Number(raw)
      switch (kind) {
        case 'slideup':
          indexOf = (i) => (i >= off ? i - off : -3)
          break
        case 'slidedown':
          indexOf = (i) => (i + off < max ? i + off : -2)
          break
        case 'slide1up':
          indexOf = (i) => (i === 0 ? -1 : i - 1)
          break
        case 'slide1down':
          indexOf = (i) => (i === vl - 1 ? -1 : i + 1)
          break
        default:
          indexOf = () => (off < max ? off : -2)
      }
    }
    if (kind !== 'slidedown' && kind !== 'slide1down') checkNoOverlap(ins, vd, vs2, n, 'vs2')
    const k = kind === 'slide1up' || kind === 'slide1down' ? scalarBits(m, ins, form === 'vf') : 0n
    const d = m.base(vd, sew)
    const sources = rec.on ? new Int32Array(vl).fill(-1) : undefined
    for (let i = 0; i < vl; i++) {
      if (!m.active(ins.operands.vm, i)) continue
      const j = indexOf(i)
      if (j === -3) continue
      setElem(m, sew, d + i, j >= 0 ? src.get(j) : j === -1 ? k : 0n)
      if (sources && j >= 0) sources[i] = j
    }
    if (rec.on) {
      const srcRegs = [regGroup(vs2, lmul)]
      if (vs1 >= 0) srcRegs.push(regGroup(vs1, lmul))
      rec.vector(ins, { dstRegs: regGroup(vd, lmul), srcRegs, sourceIndex: sources })
    }
  }
}

/** vcompress.vm vd, vs2, vs1: packs the vs2 elements whose vs1 mask bit is set; never masked by v0. */
const vcompress: Handler = (m, ins, rec) => {
  requireVtype(m, ins)
  const { sew, lmul } = m.vtype
  const n = groupSize(lmul)
  const vd = checkGroup(ins.operands.vd, lmul, 'vd', ins)
  const vs2 = checkGroup(ins.operands.vs2, lmul, 'vs2', ins)
  const vs1 = operand(ins, 'vs1')
  checkNoOverlap(ins, vd, vs2, n, 'vs2')
  checkNoOverlap(ins, vd, vs1, 1, 'vs1')
  const src = new Snapshot(m, vs2, lmul, sew)
  const d = m.base(vd, sew)
  const sources = rec.on ? new Int32Array(m.vl).fill(-1) : undefined
  let j = 0
  for (let i = 0; i < m.vl; i++) {
    if (!m.maskBit(vs1, i)) continue
    setElem(m, sew, d + j, src.get(i))
    if (sources) sources[j] = i
    j++
  }
  if (rec.on) rec.vector(ins, { dstRegs: regGroup(vd, lmul), srcRegs: [regGroup(vs2, lmul), regGroup(vs1, 1)], sourceIndex: sources })
}

/** vmv.x.s: x[rd] = sign-extended vs2[0], even when vl = 0 (V 1.0 section 16.1). */
const vmvXS: Handler = (m, ins, rec) => {
  requireVtype(m, ins)
  const sew = m.vtype.sew
  const vs2 = operand(ins, 'vs2')
  const i = m.base(vs2, sew)
  m.setX(ins.operands.rd, sew === 64 ? m.i64[i]! : BigInt(m.ints(sew, true)[i]!))
  if (rec.on) rec.vector(ins, { dstRegs: [], srcRegs: [regGroup(vs2, 1)] })
}

/** vmv.s.x: vd[0] = x[rs1] truncated to SEW, when vl > 0. */
const vmvSX: Handler = (m, ins, rec) => {
  requireVtype(m, ins)
  const vd = operand(ins, 'vd')
  if (m.vl > 0) setElem(m, m.vtype.sew, m.base(vd, m.vtype.sew), m.x[operand(ins, 'rs1')]!)
  if (rec.on) rec.vector(ins, { dstRegs: regGroup(vd, 1), srcRegs: [] })
}

export const permHandlers: Record<string, Handler> = {
  'vslideup.vx': permute('slideup', 'vx'),
  'vslideup.vi': permute('slideup', 'vi'),
  'vslidedown.vx': permute('slidedown', 'vx'),
  'vslidedown.vi': permute('slidedown', 'vi'),
  'vslide1up.vx': permute('slide1up', 'vx'),
  'vslide1down.vx': permute('slide1down', 'vx'),
  'vfslide1up.vf': permute('slide1up', 'vf'),
  'vfslide1down.vf': permute('slide1down', 'vf'),
  'vrgather.vv': permute('gather-vv', 'vv'),
  'vrgather.vx': permute('gather-x', 'vx'),
  'vrgather.vi': permute('gather-x', 'vi'),
  'vcompress.vm': vcompress,
  'vmv.x.s': vmvXS,
  'vmv.s.x': vmvSX,
}
