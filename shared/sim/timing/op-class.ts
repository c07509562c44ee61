/**
 * What the timing model needs to know of an instruction beyond its stream
 * record, read from the instruction table (shared/sim/isa/table.ts) rather
 * than from its mnemonic: whether it writes a mask (one bit an element),
 * whether its vector sources are all masks, whether it is pure mask work (64
 * mask bits a beat), and whether it is a mask scan with a scalar result
 * (vcpop.m, vfirst.m: folded like a reduction). Memoized per mnemonic, since
 * it is asked once per dispatched instruction.
 */
import type { VectorOp } from '../exec/stream'
import { opInfo } from '../isa/table'

export interface OpClass {
  /** The destination holds a mask: compares, mask logic, scans, carry and borrow outs (vmadc, vmsbc). */
  maskDst: boolean
  /** Every vector source is a mask (mask logic, scans, viota, vcpop, vfirst). */
  maskSrc: boolean
  /** Mask sources and a mask or scalar result: 64 mask bits a beat. */
  maskOnly: boolean
  /** A mask scan with a scalar result (vcpop.m, vfirst.m). */
  maskScalar: boolean
}

const PLAIN: OpClass = { maskDst: false, maskSrc: false, maskOnly: false, maskScalar: false }
const classes = new Map<string, OpClass>()

/** The class of a mnemonic; one the table does not know is plain element-wise work. */
export function opClass(op: string): OpClass {
  const known = classes.get(op)
  if (known) return known
  const info = opInfo(op)
  let c = PLAIN
  if (info) {
    const maskSrc = info.category === 'vector mask' && info.groups.vs2 === 'single'
    c = {
      maskDst: info.maskDest,
      maskSrc,
      maskOnly: maskSrc && info.groups.vd !== 'lmul',
      maskScalar: maskSrc && info.shape === 'scalar-result',
    }
  }
  classes.set(op, c)
  return c
}

/** Whether the memory unit times the op (a load or store: it carries addresses, or its unit says so). */
export function isMemoryOp(op: VectorOp): boolean {
  return !!op.memory || op.unit === 'load' || op.unit === 'store'
}
