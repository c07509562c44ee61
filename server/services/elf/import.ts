/**
 * From ELF bytes to instructions: list the functions, decode the chosen one's
 * instructions (32-bit words and 16-bit compressed ones) through the shared
 * decoder, stopping with the address of the first bits that are not a
 * supported instruction.
 */
import { decodeAt } from '../../../shared/sim/isa/decoder'
import type { Instruction } from '../../../shared/sim/isa/types'
import type { ElfFunction } from '../../../shared/schemas/upload'
import { ElfError, elfFunctions, functionBytes, readElf, type ElfFile } from './reader'

export interface DecodedFunction {
  name: string
  instructions: Instruction[]
}

/** Instructions in `bytes` by their length encoding (low two bits 11: 4 bytes, else 2). */
export function countInstructions(bytes: Uint8Array): number {
  let n = 0
  for (let at = 0; at + 1 < bytes.length; at += ((bytes[at] ?? 0) & 3) === 3 ? 4 : 2) n++
  return n
}

export function listFunctions(elf: ElfFile): ElfFunction[] {
  return elfFunctions(elf).map((f) => {
    const start = f.section.offset + (f.address - (elf.type === 1 ? 0 : f.section.addr))
    return { name: f.name, address: f.address, size: f.size, instructions: countInstructions(elf.bytes.subarray(start, start + f.size)) }
  })
}

/**
 * Decodes instructions from `code`, whose first byte is at `address`; `name`
 * (a function or section) places messages, `fileOffset(at)` the byte of the file.
 */
export function decodeBytes(code: Uint8Array, address: number, maxInstructions: number, name: string, fileOffset: (at: number) => number): Instruction[] {
  const where = (at: number) => `${name}+0x${at.toString(16)}`
  const instructions: Instruction[] = []
  for (let at = 0; at < code.length;) {
    const d = decodeAt(code, at, address + at)
    if (!d.result) {
      throw new ElfError('truncated', `${where(at)}: ${code.length - at} byte(s) left, not a ${d.size * 8}-bit instruction`, fileOffset(at))
    }
    if (!d.result.ok) throw new ElfError('no-function', `${where(at)} (address 0x${(address + at).toString(16)}): ${d.result.error.message}`, fileOffset(at))
    if (instructions.length >= maxInstructions) throw new ElfError('no-function', `${name} has more than ${maxInstructions} instructions; the limit is ${maxInstructions}`, fileOffset(0))
    instructions.push(d.result.instruction)
    at += d.size
  }
  return instructions
}

/** Decodes one function; bits the decoder refuses are an ElfError at their file offset. */
export function decodeFunction(bytes: Uint8Array, name: string, maxInstructions: number): DecodedFunction {
  const elf = readElf(bytes)
  const fn = elfFunctions(elf).find((f) => f.name === name)
  if (!fn) throw new ElfError('no-function', `no function "${name}" in the symbol table`, 0)
  const code = functionBytes(elf, fn)
  const base = elf.type === 1 ? 0 : fn.section.addr
  const fileOffset = (at: number) => fn.section.offset + (fn.address + at - base)
  const instructions = decodeBytes(code, fn.address, maxInstructions, name, fileOffset)
  return { name, instructions }
}
