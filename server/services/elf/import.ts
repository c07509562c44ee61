/**
 * From ELF bytes to instructions: list the functions, decode the chosen one's
 * words through the shared decoder (decodeWord), stopping with the address of
 * the first word that is not a supported instruction.
 */
import { decodeWord } from '../../../shared/sim/isa/decoder'
import type { Instruction } from '../../../shared/sim/isa/types'
import type { ElfFunction } from '../../../shared/schemas/upload'
import { ElfError, elfFunctions, functionBytes, readElf, type ElfFile } from './reader'

export interface DecodedFunction {
  name: string
  instructions: Instruction[]
}

export function listFunctions(elf: ElfFile): ElfFunction[] {
  return elfFunctions(elf).map((f) => ({ name: f.name, address: f.address, size: f.size, instructions: Math.floor(f.size / 4) }))
}

/** Decodes one function; a word the decoder refuses is an ElfError at its file offset. */
export function decodeFunction(bytes: Uint8Array, name: string, maxInstructions: number): DecodedFunction {
  const elf = readElf(bytes)
  const fn = elfFunctions(elf).find((f) => f.name === name)
  if (!fn) throw new ElfError('no-function', `no function "${name}" in the symbol table`, 0)
  const code = functionBytes(elf, fn)
  if (code.length / 4 > maxInstructions) throw new ElfError('no-function', `${name} has ${Math.floor(code.length / 4)} instructions; the limit is ${maxInstructions}`, 0)
  const view = new DataView(code.buffer, code.byteOffset, code.byteLength)
  const base = elf.type === 1 ? 0 : fn.section.addr
  const fileOffset = (at: number) => fn.section.offset + (at - base)
  const instructions: Instruction[] = []
  for (let at = 0; at < code.length; at += 4) {
    const address = fn.address + at
    if (at + 4 > code.length) {
      throw new ElfError('truncated', `${name}+0x${at.toString(16)}: ${code.length - at} byte(s) left, not a 32-bit instruction`, fileOffset(address))
    }
    const d = decodeWord(view.getUint32(at, true), address)
    if (!d.ok) throw new ElfError('no-function', `${name}+0x${at.toString(16)} (address 0x${address.toString(16)}): ${d.error.message}`, fileOffset(address))
    instructions.push(d.instruction)
  }
  return { name, instructions }
}
