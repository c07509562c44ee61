/**
 * The decoder: a 32-bit word or a 16-bit RV64C half-word back to an
 * instruction of the table. It never throws: bits that are no supported
 * instruction give a structured error that says why (a compressed half-word
 * where a 32-bit word was expected, a reserved encoding, or unknown).
 */
import { expandCompressed } from './compressed'
import { extractField } from './fields'
import { formatInstruction } from './format'
import { registerName } from './registers'
import { OPS, opInfo, type OpInfo } from './table'
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
  if ((w & 3) !== 3) return fail('compressed', `${hex8(w)} is not a 32-bit instruction: its low half-word is a 16-bit compressed one (read compressed code from an ELF file or an objdump -d listing)`)
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

/**
 * Decodes the 16-bit RV64C instruction `half` at `address` into its 32-bit
 * expansion, with the text `objdump -d` prints for it (the expansion's, but
 * `mv` for c.mv, whose expansion `add rd,zero,rs2` binutils prints so only
 * when it was compressed).
 */
export function decodeHalf(half: number, address: number): DecodeResult {
  const h = half & 0xffff
  const e = expandCompressed(h)
  if (!e) {
    const message = h === 0 ? '0x0000 is the defined illegal instruction (an all-zero half-word)' : `0x${h.toString(16).padStart(4, '0')} is no RV64C instruction (a reserved compressed encoding)`
    return { ok: false, error: { code: 'reserved', message, word: h, address } }
  }
  const info = opInfo(e.op) as OpInfo
  const text = e.form.name === 'c.mv' ? `mv ${registerName('x', e.operands.rd ?? 0)},${registerName('x', e.operands.rs2 ?? 0)}` : formatInstruction(info, e.operands, address)
  return { ok: true, instruction: { op: e.op, operands: e.operands, address, text, compressed: e.form.name } }
}

/**
 * Decodes the instruction at the start of `bytes` (little-endian): 16 bits
 * when its low two bits are not 11, else 32 (unprivileged ISA, "Base
 * Instruction-Length Encoding"). `size` is undefined when the bytes end inside it.
 */
export function decodeAt(bytes: Uint8Array, at: number, address: number): { result: DecodeResult; size: 2 | 4 } | { result?: undefined; size: 2 | 4 } {
  if (at + 2 > bytes.length) return { size: 2 }
  const lo = (bytes[at] ?? 0) | ((bytes[at + 1] ?? 0) << 8)
  if ((lo & 3) !== 3) return { result: decodeHalf(lo, address), size: 2 }
  if (at + 4 > bytes.length) return { size: 4 }
  const word = (lo | ((bytes[at + 2] ?? 0) << 16) | ((bytes[at + 3] ?? 0) << 24)) >>> 0
  return { result: decodeWord(word, address), size: 4 }
}
