/**
 * A linked RISC-V executable as one program: all of its code, its data
 * (.rodata, .sdata, .data, .bss ... every allocated section that is not code)
 * and its symbols, entered at e_entry. The result is assembly text a scenario
 * keeps: code and data at the executable's own addresses (`.origin`), 16-bit
 * compressed instructions as their `c.` mnemonics, symbols as labels. Keeping
 * every address means pc-relative data access, return addresses and pointers
 * in data all mean what they meant in the file. The text is assembled again
 * and must give back the same bits, data and entry before it is kept.
 */
import { assemble, ASSEMBLE_DEFAULTS } from '../../../shared/sim/isa/assembler'
import type { ElfFunction } from '../../../shared/schemas/upload'
import { codeLines, firstDifference } from '../uploads-asm'
import { countInstructions, decodeBytes } from './import'
import { ElfError, type ElfFile, type ElfSection } from './reader'

/** The chooser's entry for the whole program (not a symbol name: it has spaces and parentheses). */
export const WHOLE_EXECUTABLE = '(whole executable, from its entry point)'

const ET_EXEC = 2
const SHF_ALLOC = 0x2
const SHF_EXECINSTR = 0x4
const SHT_NOBITS = 8
const SHT_NOTE = 7
const STT_SECTION = 3
const STT_FILE = 4
const SHN_UNDEF = 0
/** A label the assembler reads (lexer.ts), without binutils' mapping symbols ($x, $d). */
const LABEL_NAME = /^[A-Za-z_.][A-Za-z0-9_.$]*$/

const hex = (n: number): string => `0x${n.toString(16)}`

interface Layout {
  code: ElfSection[]
  data: ElfSection[]
  textStart: number
  textEnd: number
  dataStart: number
  dataEnd: number
}

/** The code sections (contiguous) and the data sections (after the code), or an ElfError saying what does not fit. */
function layout(elf: ElfFile): Layout {
  if (elf.type !== ET_EXEC) throw new ElfError('layout', `a ${elf.typeName}, not an executable: link it (riscv64-linux-gnu-ld) to import the whole program, or choose one function`, 16)
  const alloc = elf.sections.filter((s) => (s.flags & SHF_ALLOC) !== 0 && s.size > 0 && s.type !== SHT_NOTE).sort((a, b) => a.addr - b.addr)
  const code = alloc.filter((s) => (s.flags & SHF_EXECINSTR) !== 0)
  const first = code[0]
  const last = code[code.length - 1]
  if (!first || !last) throw new ElfError('layout', 'the executable has no code section', 0)
  for (let i = 1; i < code.length; i++) {
    const a = code[i - 1] as ElfSection
    const b = code[i] as ElfSection
    if (b.addr !== a.addr + a.size) throw new ElfError('layout', `the code sections ${a.name} and ${b.name} leave a gap (0x${(a.addr + a.size).toString(16)}..0x${(b.addr - 1).toString(16)})`, b.offset)
  }
  const textStart = first.addr
  const textEnd = last.addr + last.size
  const data = alloc.filter((s) => (s.flags & SHF_EXECINSTR) === 0)
  const before = data.find((s) => s.addr < textEnd)
  if (before) throw new ElfError('layout', `the data section ${before.name} at ${hex(before.addr)} lies before the end of the code (${hex(textEnd)}); Chimeline places data after the code`, before.offset)
  const dataStart = data[0]?.addr ?? textEnd
  const dataEnd = Math.max(dataStart, ...data.map((s) => s.addr + s.size))
  if (dataEnd - dataStart > ASSEMBLE_DEFAULTS.maxDataBytes) {
    throw new ElfError('layout', `the data spans ${dataEnd - dataStart} bytes (${hex(dataStart)}..${hex(dataEnd - 1)}); the limit is ${ASSEMBLE_DEFAULTS.maxDataBytes}`, data[0]?.offset ?? 0)
  }
  return { code, data, textStart, textEnd, dataStart, dataEnd }
}

/** Symbol names by address, for labels: one name once, in symbol-table order. */
function symbolNames(elf: ElfFile, inText: (a: number) => boolean, inData: (a: number) => boolean): { text: Map<number, string[]>; data: Map<number, string[]> } {
  const text = new Map<number, string[]>()
  const data = new Map<number, string[]>()
  const used = new Set<string>()
  const add = (m: Map<number, string[]>, a: number, n: string) => {
    used.add(n)
    m.set(a, [...(m.get(a) ?? []), n])
  }
  const start = elf.entry
  for (const s of elf.symbols) {
    if (s.shndx === SHN_UNDEF || s.type === STT_SECTION || s.type === STT_FILE || !LABEL_NAME.test(s.name) || used.has(s.name)) continue
    if (s.name === '_start' && s.value !== start) continue // the entry decides where the program starts
    if (inText(s.value)) add(text, s.value, s.name)
    else if (inData(s.value)) add(data, s.value, s.name)
  }
  if (!used.has('_start')) text.set(start, ['_start', ...(text.get(start) ?? [])])
  return { text, data }
}

/** `.byte` rows of 16 and `.zero` for runs of zeros. */
function dataLines(bytes: Uint8Array): string[] {
  const out: string[] = []
  let i = 0
  while (i < bytes.length) {
    let z = i
    while (z < bytes.length && bytes[z] === 0) z++
    if (z - i >= 16 || z === bytes.length) {
      if (z > i) out.push(`  .zero ${z - i}`)
      i = z
      continue
    }
    let end = Math.min(bytes.length, i + 16)
    // Stop a row where a long run of zeros starts, so that it becomes a .zero.
    for (let k = i + 1; k < end; k++) {
      let r = k
      while (r < bytes.length && bytes[r] === 0) r++
      if (r - k >= 16) {
        end = k
        break
      }
    }
    out.push(`  .byte ${Array.from(bytes.subarray(i, end), (b) => `0x${b.toString(16).padStart(2, '0')}`).join(', ')}`)
    i = end
  }
  return out
}

/** The chooser's entry: all the code (its first address, size and instruction count). */
export function wholeExecutableChoice(elf: ElfFile): ElfFunction | undefined {
  try {
    const l = layout(elf)
    const bytes = elf.bytes.subarray(l.code[0]?.offset ?? 0, (l.code[0]?.offset ?? 0) + (l.textEnd - l.textStart))
    return { name: WHOLE_EXECUTABLE, address: l.textStart, size: l.textEnd - l.textStart, instructions: countInstructions(bytes) }
  } catch {
    return undefined
  }
}

/**
 * The executable as assembly text (see the file comment). Throws an ElfError
 * naming the section, address or file offset of any problem.
 */
export function executableToAssembly(elf: ElfFile, fileName: string, maxInstructions: number): string {
  const l = layout(elf)
  const instructions = l.code.flatMap((s) => decodeBytes(elf.bytes.subarray(s.offset, s.offset + s.size), s.addr, maxInstructions, s.name, (at) => s.offset + at))
  if (instructions.length > maxInstructions) throw new ElfError('no-function', `the code has ${instructions.length} instructions; the limit is ${maxInstructions}`, l.code[0]?.offset ?? 0)
  const starts = new Set(instructions.map((i) => i.address))
  if (!starts.has(elf.entry)) throw new ElfError('layout', `the entry point ${hex(elf.entry)} is not the first byte of an instruction of the code`, 24)
  const names = symbolNames(elf, (a) => starts.has(a), (a) => a >= l.dataStart && a < l.dataEnd)
  const code = codeLines(instructions, names.text)
  if (!code.ok) throw new ElfError('layout', code.message, 0)

  const image = new Uint8Array(l.dataEnd - l.dataStart)
  for (const s of l.data) if (s.type !== SHT_NOBITS) image.set(elf.bytes.subarray(s.offset, s.offset + s.size), s.addr - l.dataStart)
  // Cut the data where a section or a label starts.
  const cuts = new Map<number, string[]>()
  for (const s of l.data) cuts.set(s.addr, [...(cuts.get(s.addr) ?? []), `  # ${s.name} (${s.size} bytes${s.type === SHT_NOBITS ? ', zero-filled' : ''})`])
  for (const [a, ns] of names.data) cuts.set(a, [...(cuts.get(a) ?? []), ...ns.map((n) => `${n}:`)])
  const points = [...cuts.keys()].sort((a, b) => a - b)
  const data: string[] = []
  for (const [i, p] of points.entries()) {
    data.push(...(cuts.get(p) ?? []))
    const next = points[i + 1] ?? l.dataEnd
    data.push(...dataLines(image.subarray(p - l.dataStart, next - l.dataStart)))
  }

  const header = [
    `# Imported from ${fileName}: a RISC-V ELF executable, entered at _start (its entry point ${hex(elf.entry)}).`,
    '# Code and data keep the addresses of the file (.origin); 16-bit compressed instructions are written as their c. mnemonics.',
  ]
  const lines = [...header, '  .text', `  .origin ${hex(l.textStart)}`, ...code.lines]
  if (image.length > 0) lines.push('  .data', `  .origin ${hex(l.dataStart)}`, ...data)
  const text = `${lines.join('\n')}\n`

  const again = assemble(text, { maxInstructions })
  if (!again.ok) {
    const e = again.errors[0]
    throw new ElfError('layout', `the decoded program does not assemble again (line ${e?.line}: ${e?.message})`, 0)
  }
  const p = again.program
  const differs = firstDifference(instructions, p)
  if (differs) throw new ElfError('layout', `the instruction at ${hex(differs.address)} (${differs.text}) does not assemble back to the same bits`, 0)
  const sameData = p.data.length === image.length && p.data.every((b, i) => b === image[i]) && (image.length === 0 || p.dataBase === l.dataStart)
  if (!sameData || p.entry !== elf.entry) throw new ElfError('layout', 'the decoded program does not give back the data and entry point of the file', 0)
  return text
}
