/**
 * The decoder: a 32-bit word back to an instruction of the table. It never
 * throws: a word that is no supported instruction gives a structured error
 * that says why (compressed, a reserved vector encoding, or unknown).
 */
import { extractField } from './fields'
import { formatInstruction } from './format'
import { OPS, type OpInfo } from './table'
import type { Instruction, Operands } from './types'

export interface DecodeError {
  code: 'compressed' | 'reserved' | 'unknown'
  message: string
  word: number
  address: number
}

export type DecodeResult = { ok: true; instruction: Instruction } | { ok: false; error: DecodeError }

/** Table entries by major opcode (bits 6:0), so a lookup scans a handful. */
const byOpcode = new Map<number, OpInfo[]>()
for (const e of OPS) {
  const list = byOpcode.get(e.match & 0x7f) ?? []
  list.push(e)
  byOpcode.set(e.match & 0x7f, list)
}

const hex8 = (w: number): string => `0x${(w >>> 0).toString(16).padStart(8, '0')}`

/**
 * Decodes `word` as the instruction at `address`.
 * @example decodeWord(0x0d25f557, 0x10000) // vsetvli a0,a1,e32,m4,ta,ma
 */
export function decodeWord(word: number, address: number): DecodeResult {
  const w = word >>> 0
  const fail = (code: DecodeError['code'], message: string): DecodeResult => ({ ok: false, error: { code, message, word: w, address } })
  if ((w & 3) !== 3) return fail('compressed', `${hex8(w)} is a 16-bit compressed instruction; Chimeline reads 32-bit words only (assemble with .option norvc)`)
  const entry = byOpcode.get(w & 0x7f)?.find((e) => ((w & e.mask) >>> 0) === e.match)
  if (!entry) {
    const opcode = w & 0x7f
    const width = (w >>> 12) & 7
    // LOAD-FP/STORE-FP with widths 1..4 are scalar FP loads and stores, not vector ones (spec 7.3).
    const vector = opcode === 0x57 || ((opcode === 0x07 || opcode === 0x27) && (width === 0 || width >= 5))
    if (vector) {
      return fail('reserved', `${hex8(w)} is in the vector opcode space but is no RISC-V V 1.0 instruction (a reserved encoding)`)
    }
    return fail('unknown', `${hex8(w)} is not an instruction Chimeline supports`)
  }
  const operands: Operands = {}
  for (const k of entry.syntax) extractField(k, w, operands)
  if (entry.vector && operands.vm === undefined) operands.vm = true
  return { ok: true, instruction: { op: entry.op, operands, address, text: formatInstruction(entry, operands, address) } }
}
