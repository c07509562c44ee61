/**
 * What every instruction handler gets: the machine, the static instruction and
 * a StreamSink for the dynamic stream. Shared checks of vector instructions live
 * here too.
 */
import type { Instruction, Sew } from '../isa/types'
import type { MemoryPattern } from './stream'
import type { RoundingMode } from './fp'
import { ExecFault, type ArchState } from './machine'

export interface VectorEvent {
  /** Element width of the data moved; defaults to SEW. */
  eew?: Sew
  /** Elements processed when it differs from vl (vlm.v/vsm.v move ceil(vl / 8) bytes). */
  vl?: number
  dstRegs: number[]
  srcRegs: number[][]
  /** true when v0 selects data (vmerge, vfmerge) rather than masking elements off. */
  v0IsSelector?: boolean
  memory?: { pattern: MemoryPattern; isStore: boolean; addresses: Float64Array; indexEew?: Sew }
  sourceIndex?: Int32Array
  /** Element widths of the destination and vs2 when one differs from SEW (widening, narrowing, extension). */
  widths?: { dst: Sew; vs2: Sew }
  /** Segment accesses: fields per element. */
  nf?: number
  /** Whole-register loads, stores and moves: registers moved, whatever vl is. */
  wholeRegisters?: number
}

export interface StreamSink {
  /** false when no stream is recorded: handlers then skip building addresses and indices. */
  readonly on: boolean
  vector(ins: Instruction, event: VectorEvent): void
}

export type Handler = (m: ArchState, ins: Instruction, rec: StreamSink) => void

/** A vector instruction needs a legal vtype (V 1.0 section 3.4.4: vill makes them illegal). */
export function requireVtype(m: ArchState, ins: Instruction): void {
  if (m.vtype.vill) {
    throw new ExecFault(
      'illegal-vtype',
      `illegal vtype use: ${ins.op} executed while vtype is invalid (vill); set a supported SEW/LMUL with vsetvli first`,
    )
  }
}

/** The dynamic rounding mode of a vector FP instruction that rounds (V 1.0 section 13.1): frm, where 5 to 7 are reserved (an illegal instruction). */
export function vectorRoundingMode(m: ArchState, ins: Instruction): RoundingMode {
  if (m.frm > 4) throw new ExecFault('rounding-mode', `${ins.op}: frm = ${m.frm} is a reserved rounding mode; set rne, rtz, rdn, rup or rmm`)
  return m.frm as RoundingMode
}

/** FP vector instructions need SEW 32 or 64 (no half precision). */
export function requireFpSew(m: ArchState, ins: Instruction): 32 | 64 {
  requireVtype(m, ins)
  const sew = m.vtype.sew
  if (sew !== 32 && sew !== 64) {
    throw new ExecFault('illegal-sew', `${ins.op} needs SEW 32 or 64 (FP32/FP64), but vtype has SEW=${sew}`)
  }
  return sew
}

/**
 * V 1.0 section 5.2: a destination group may overlap a source group of
 * another EEW only in the lowest-numbered part of the source (destination EEW
 * smaller) or in the highest-numbered part of the destination when the source
 * EMUL is at least 1 (destination EEW larger); anything else is reserved (QEMU
 * raises an illegal instruction).
 */
export function checkWidthOverlap(ins: Instruction, vd: number, dEmul: number, dEew: number, vs: number, sEmul: number, sEew: number, name: string): void {
  if (dEew === sEew) return
  const dRegs = Math.max(1, dEmul)
  const sRegs = Math.max(1, sEmul)
  if (vd + dRegs <= vs || vs + sRegs <= vd) return
  const allowed = dEew < sEew ? vd === vs : sEmul >= 1 && vs === vd + dRegs - sRegs
  if (!allowed) {
    throw new ExecFault('overlap', `${ins.op}: the destination v${vd} (EEW ${dEew}) overlaps the source ${name} v${vs} (EEW ${sEew}) where V 1.0 section 5.2 does not allow it`)
  }
}

/** V 1.0 section 5.3: a masked instruction's destination may not overlap v0 unless it writes a mask. */
export function checkMaskOverlap(ins: Instruction, vd: number): void {
  if (ins.operands.vm === false && vd === 0) {
    throw new ExecFault('mask-overlap', `${ins.op}: the destination v0 of a masked instruction overlaps the mask register v0`)
  }
}

export function operand(ins: Instruction, name: keyof Instruction['operands']): number {
  const v = ins.operands[name]
  if (typeof v !== 'number') throw new ExecFault('internal', `${ins.op}: missing operand ${name}`)
  return v
}
