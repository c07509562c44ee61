/**
 * Decoded machine code (from an ELF function or an `objdump -d` listing) as
 * assembly text a scenario can keep: one instruction a line in objdump's
 * canonical form, branch targets turned into labels. The text is assembled
 * again and must give back the very same words, so an import never keeps a
 * program that means something else than the file.
 */
import { assemble } from '../../shared/sim/isa/assembler'
import { encode } from '../../shared/sim/isa/encoder'
import { formatInstruction } from '../../shared/sim/isa/format'
import { opInfo, type OpInfo } from '../../shared/sim/isa/table'
import type { Instruction } from '../../shared/sim/isa/types'

export type ToAssembly = { ok: true; text: string } | { ok: false; message: string; address: number }

const labelFor = (address: number) => `L_${address.toString(16)}`

export function instructionsToAssembly(instructions: Instruction[], header: string): ToAssembly {
  const first = instructions[0]
  if (!first) return { ok: false, message: 'no instructions', address: 0 }
  const start = first.address
  const end = start + instructions.length * 4
  const targets = new Map<number, string>()
  for (const ins of instructions) {
    const info = opInfo(ins.op) as OpInfo
    if (!info.syntax.includes('branch') && !info.syntax.includes('jump')) continue
    const target = ins.address + (ins.operands.imm ?? 0)
    if (target < start || target >= end) {
      return { ok: false, message: `${ins.text} at 0x${ins.address.toString(16)} jumps to 0x${target.toString(16)}, outside the imported code (0x${start.toString(16)}..0x${(end - 1).toString(16)}); import code that calls other functions as one listing`, address: ins.address }
    }
    targets.set(target, labelFor(target))
  }
  const lines = [header, '  .text']
  for (const ins of instructions) {
    const label = targets.get(ins.address)
    if (label) lines.push(`${label}:`)
    const info = opInfo(ins.op) as OpInfo
    const target = ins.address + (ins.operands.imm ?? 0)
    // formatInstruction writes a target as objdump does ("1c <name>"); the assembler takes the bare label.
    const text = formatInstruction(info, ins.operands, ins.address, targets.get(target)).replace(/[0-9a-f]+ <([^>]+)>$/, '$1')
    lines.push(`  ${text}`)
  }
  const text = `${lines.join('\n')}\n`
  const again = assemble(text)
  if (!again.ok) {
    const e = again.errors[0]
    return { ok: false, message: `the decoded code does not assemble again (line ${e?.line}: ${e?.message})`, address: start }
  }
  const words = again.program.instructions.map((i) => encode(i) >>> 0)
  const mismatch = instructions.findIndex((ins, i) => (encode(ins) >>> 0) !== words[i])
  if (words.length !== instructions.length || mismatch >= 0) {
    const at = instructions[Math.max(0, mismatch)] as Instruction
    return { ok: false, message: `the instruction at 0x${at.address.toString(16)} (${at.text}) does not assemble back to the same word`, address: at.address }
  }
  return { ok: true, text }
}
