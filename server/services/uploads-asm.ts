/**
 * Decoded machine code (from an ELF file or an `objdump -d` listing) as
 * assembly text a scenario can keep: one instruction a line in objdump's
 * canonical form (16-bit compressed ones as their `c.` mnemonics, so that
 * every address stays), branch targets turned into labels. The text is
 * assembled again and must give back the very same bits, so an import never
 * keeps a program that means something else than the file.
 */
import { assemble } from '../../shared/sim/isa/assembler'
import { compressedForm, formatCompressed } from '../../shared/sim/isa/compressed'
import { encodeSized } from '../../shared/sim/isa/encoder'
import { formatInstruction } from '../../shared/sim/isa/format'
import { opInfo, type OpInfo } from '../../shared/sim/isa/table'
import { instructionSize, type Instruction, type Program } from '../../shared/sim/isa/types'

export type ToAssembly = { ok: true; text: string } | { ok: false; message: string; address: number }
export type CodeLines = { ok: true; lines: string[] } | { ok: false; message: string; address: number }

const labelFor = (address: number) => `L_${address.toString(16)}`

const isTransfer = (ins: Instruction): boolean => {
  const info = opInfo(ins.op) as OpInfo
  return info.syntax.includes('branch') || info.syntax.includes('jump')
}

/**
 * The lines of contiguous instructions: `names` gives labels at addresses
 * (symbols of the file); other branch targets get `L_<address>`. A target
 * outside the instructions is refused.
 */
export function codeLines(instructions: Instruction[], names: ReadonlyMap<number, string[]> = new Map()): CodeLines {
  const first = instructions[0]
  const last = instructions[instructions.length - 1]
  if (!first || !last) return { ok: false, message: 'no instructions', address: 0 }
  const start = first.address
  const end = last.address + instructionSize(last)
  const targets = new Map<number, string>()
  for (const ins of instructions) {
    if (!isTransfer(ins)) continue
    const target = ins.address + (ins.operands.imm ?? 0)
    if (target < start || target >= end) {
      return { ok: false, message: `${ins.text} at 0x${ins.address.toString(16)} jumps to 0x${target.toString(16)}, outside the imported code (0x${start.toString(16)}..0x${(end - 1).toString(16)}); import code that calls other functions as one listing`, address: ins.address }
    }
    targets.set(target, names.get(target)?.[0] ?? labelFor(target))
  }
  const lines: string[] = []
  for (const ins of instructions) {
    const own = names.get(ins.address) ?? []
    for (const n of own) lines.push(`${n}:`)
    const label = targets.get(ins.address)
    if (label && !own.includes(label)) lines.push(`${label}:`)
    const target = targets.get(ins.address + (ins.operands.imm ?? 0))
    const form = ins.compressed ? compressedForm(ins.compressed) : undefined
    // formatInstruction writes a target as objdump does ("1c <name>"); the assembler takes the bare label.
    const text = form
      ? formatCompressed(form, ins.operands, isTransfer(ins) ? target : undefined)
      : formatInstruction(opInfo(ins.op) as OpInfo, ins.operands, ins.address, isTransfer(ins) ? target : undefined).replace(/[0-9a-f]+ <([^>]+)>$/, '$1')
    lines.push(`  ${text}`)
  }
  return { ok: true, lines }
}

/**
 * The first of `instructions` whose bits or address differ in `program` (its
 * addresses moved by `delta`), or undefined when all agree.
 */
export function firstDifference(instructions: Instruction[], program: Program, delta = 0): Instruction | undefined {
  const again = program.instructions
  for (const [i, ins] of instructions.entries()) {
    const other = again[i]
    if (!other || other.address + delta !== ins.address) return ins
    const a = encodeSized(ins)
    const b = encodeSized(other)
    if (a.bits !== b.bits || a.size !== b.size) return ins
  }
  return again.length === instructions.length ? undefined : instructions[Math.min(instructions.length, again.length) - 1]
}

export function instructionsToAssembly(instructions: Instruction[], header: string): ToAssembly {
  const code = codeLines(instructions)
  if (!code.ok) return code
  const start = instructions[0]?.address ?? 0
  const text = `${[header, '  .text', ...code.lines].join('\n')}\n`
  const again = assemble(text)
  if (!again.ok) {
    const e = again.errors[0]
    return { ok: false, message: `the decoded code does not assemble again (line ${e?.line}: ${e?.message})`, address: start }
  }
  // The scenario's text starts at the default base: branches are relative, so only the base moves.
  const at = firstDifference(instructions, again.program, start - again.program.textBase)
  if (at) return { ok: false, message: `the instruction at 0x${at.address.toString(16)} (${at.text}) does not assemble back to the same word`, address: at.address }
  return { ok: true, text }
}
