/**
 * The encoder: an instruction of the table to its 32-bit word. The word is the
 * table's match bits with each operand inserted into its field.
 */
import { compressedForm, compressedWord } from './compressed'
import { FIELDS, IMM_RANGE, insertField } from './fields'
import { opInfo } from './table'
import type { Instruction } from './types'

/**
 * Encodes one instruction (as the assembler or decoder produced it).
 * Throws a RangeError for an instruction that is not in the table or has an
 * operand outside its field: that is a caller bug, never a user-input case.
 */
export function encode(instr: Pick<Instruction, 'op' | 'operands'>): number {
  const info = opInfo(instr.op)
  if (!info) throw new RangeError(`encode: '${instr.op}' is not in the instruction table`)
  let w = info.match
  for (const kind of info.syntax) {
    const spec = FIELDS[kind]
    const v = instr.operands[spec.key]
    const range = IMM_RANGE[kind]
    if (spec.file !== undefined && (typeof v !== 'number' || v < 0 || v > 31 || !Number.isInteger(v))) {
      throw new RangeError(`encode: ${instr.op} needs a register number 0..31 for ${spec.key}`)
    }
    if (range && (typeof v !== 'number' || v < range[0] || v > range[1])) {
      throw new RangeError(`encode: ${instr.op} ${spec.key} = ${String(v)} is outside ${range[0]}..${range[1]}`)
    }
    if ((kind === 'branch' || kind === 'jump') && ((v as number) & 1) !== 0) {
      throw new RangeError(`encode: ${instr.op} offset ${String(v)} is odd`)
    }
    w |= insertField(kind, instr.operands)
  }
  return w >>> 0
}

/**
 * The bits of an instruction as they sit in memory: its 16-bit RV64C form for a
 * compressed one (size 2), else its 32-bit word. Throws a RangeError as encode does.
 */
export function encodeSized(instr: Pick<Instruction, 'op' | 'operands' | 'compressed'>): { bits: number; size: 2 | 4 } {
  if (!instr.compressed) return { bits: encode(instr), size: 4 }
  const form = compressedForm(instr.compressed)
  const bits = form && compressedWord(form, instr.op, instr.operands)
  if (bits === undefined) throw new RangeError(`encode: ${instr.compressed} has no 16-bit form for these operands of ${instr.op}`)
  return { bits, size: 2 }
}
