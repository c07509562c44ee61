/**
 * vsetvli, vsetivli and vsetvl (RISC-V V 1.0 section 6): set vtype and
 * vl = min(AVL, VLMAX), and write vl to rd.
 */
import { vlmax } from '../isa/vtype'
import type { Handler } from './handler'
import { operand } from './handler'
import type { ArchState } from './machine'
import { computeVl, decodeVtype } from './vtype'

/** Observes every configuration change (the vl/vtype history of the result). */
export type ConfigListener = (m: ArchState) => void

/**
 * AVL (section 6.2): rs1 != x0 gives x[rs1] (unsigned); rs1 = x0 with rd != x0
 * asks for VLMAX; rs1 = rd = x0 keeps the current vl, limited to the new VLMAX
 * (the specification reserves a VLMAX change there; QEMU limits it the same way).
 */
function configure(m: ArchState, rd: number | undefined, avl: bigint | 'max' | 'keep', vtype: bigint, listen: ConfigListener): void {
  const vt = decodeVtype(vtype)
  m.vtype = vt
  if (vt.vill) m.vl = 0
  else {
    const max = vlmax(m.vlen, vt.sew, vt.lmul)
    m.vl = avl === 'max' ? max : avl === 'keep' ? Math.min(m.vl, max) : computeVl(avl, max)
  }
  m.setX(rd, BigInt(m.vl))
  listen(m)
}

function avlOf(m: ArchState, rs1: number, rd: number | undefined): bigint | 'max' | 'keep' {
  if (rs1 !== 0) return m.xu[rs1]!
  return rd ? 'max' : 'keep'
}

export function configHandlers(listen: ConfigListener): Record<string, Handler> {
  const record: Handler = (m, ins, rec) => {
    if (rec.on) rec.vector(ins, { dstRegs: [], srcRegs: [] })
  }
  return {
    vsetvli: (m, ins, rec) => {
      const rs1 = operand(ins, 'rs1')
      configure(m, ins.operands.rd, avlOf(m, rs1, ins.operands.rd), BigInt(operand(ins, 'vtypei')), listen)
      record(m, ins, rec)
    },
    vsetivli: (m, ins, rec) => {
      configure(m, ins.operands.rd, BigInt(operand(ins, 'imm')), BigInt(operand(ins, 'vtypei')), listen)
      record(m, ins, rec)
    },
    vsetvl: (m, ins, rec) => {
      const rs1 = operand(ins, 'rs1')
      configure(m, ins.operands.rd, avlOf(m, rs1, ins.operands.rd), m.xu[operand(ins, 'rs2')]!, listen)
      record(m, ins, rec)
    },
  }
}
