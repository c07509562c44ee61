/**
 * A small reader of 64-bit little-endian RISC-V ELF files (System V gABI,
 * "ELF-64 Object File Format"; RISC-V ELF psABI for e_machine 243 and the
 * relocation numbers): the file header, the section header table, and the
 * symbol table with its string table. Enough to list functions and take their
 * bytes; nothing is executed or linked.
 *
 * npm has ELF parsers, but none maintained with types for 64-bit RISC-V
 * (elfy and elf-tools are small and unmaintained), so this reads the three
 * tables it needs itself. Every problem is an ElfError with the byte offset.
 */

export const EM_RISCV = 243
const MACHINE_NAMES: Record<number, string> = { 3: 'x86 (i386)', 8: 'MIPS', 20: 'PowerPC', 21: 'PowerPC 64', 40: 'ARM', 62: 'x86-64', 183: 'AArch64', 243: 'RISC-V' }
const SHT_SYMTAB = 2
const SHT_RELA = 4
const SHT_NOBITS = 8
const SHF_EXECINSTR = 0x4
const STT_FUNC = 2
const SHN_LORESERVE = 0xff00
const ET_NAMES: Record<number, string> = { 1: 'relocatable object', 2: 'executable', 3: 'shared object or PIE' }
/** Branch and jump relocations whose target is already encoded when it lies in the same section. */
const R_RISCV_BRANCH = 16
const R_RISCV_JAL = 17
const R_RISCV_RVC_BRANCH = 44
const R_RISCV_RVC_JUMP = 45
const R_RISCV_ALIGN = 43
const R_RISCV_RELAX = 51

export class ElfError extends Error {
  constructor(
    readonly code: 'not-elf' | 'elf-class' | 'elf-endian' | 'elf-machine' | 'truncated' | 'bad-table' | 'no-symtab' | 'no-function' | 'relocation' | 'layout',
    message: string,
    readonly offset: number,
  ) {
    super(message)
    this.name = 'ElfError'
  }
}

export interface ElfSection {
  index: number
  name: string
  type: number
  flags: number
  addr: number
  offset: number
  size: number
  link: number
  info: number
  entsize: number
}

export interface ElfSymbol {
  name: string
  value: number
  size: number
  /** STT_* (low 4 bits of st_info). */
  type: number
  /** STB_* (high 4 bits of st_info). */
  bind: number
  shndx: number
}

export interface ElfFile {
  /** ET_REL 1, ET_EXEC 2, ET_DYN 3. */
  type: number
  typeName: string
  entry: number
  sections: ElfSection[]
  symbols: ElfSymbol[]
  bytes: Uint8Array
}

export interface ElfFunctionInfo {
  name: string
  /** st_value: the address in an executable, the offset in its section in an object file. */
  address: number
  size: number
  section: ElfSection
}

class Cursor {
  private readonly view: DataView
  constructor(readonly bytes: Uint8Array) {
    this.view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength)
  }

  need(offset: number, length: number, what: string): void {
    if (offset < 0 || offset + length > this.bytes.length) {
      throw new ElfError('truncated', `the file ends at byte ${this.bytes.length}, inside the ${what} (bytes ${offset}..${offset + length - 1}): it is truncated`, Math.min(offset, this.bytes.length))
    }
  }

  u8 = (o: number) => this.view.getUint8(o)
  u16 = (o: number) => this.view.getUint16(o, true)
  u32 = (o: number) => this.view.getUint32(o, true)
  u64(o: number, what: string): number {
    const v = this.view.getBigUint64(o, true)
    if (v > BigInt(Number.MAX_SAFE_INTEGER)) throw new ElfError('bad-table', `the ${what} at byte ${o} is too large (${v})`, o)
    return Number(v)
  }
}

function cString(bytes: Uint8Array, start: number, end: number): string {
  let i = start
  while (i < end && bytes[i] !== 0) i++
  return new TextDecoder('utf-8').decode(bytes.subarray(start, i))
}

/** Reads the header, the section table and the symbol table of a RISC-V ELF64 LE file. */
export function readElf(bytes: Uint8Array): ElfFile {
  const c = new Cursor(bytes)
  if (bytes.length < 4 || bytes[0] !== 0x7f || bytes[1] !== 0x45 || bytes[2] !== 0x4c || bytes[3] !== 0x46) {
    throw new ElfError('not-elf', 'not an ELF file: it does not start with the bytes 7f 45 4c 46 ("\\x7fELF")', 0)
  }
  c.need(0, 64, 'ELF header')
  if (c.u8(4) !== 2) throw new ElfError('elf-class', `a ${c.u8(4) === 1 ? '32-bit' : 'unknown-class'} ELF file; Chimeline reads 64-bit RISC-V (ELFCLASS64) only`, 4)
  if (c.u8(5) !== 1) throw new ElfError('elf-endian', 'a big-endian ELF file; RISC-V code is little-endian (ELFDATA2LSB)', 5)
  const type = c.u16(16)
  const machine = c.u16(18)
  if (machine !== EM_RISCV) {
    throw new ElfError('elf-machine', `built for ${MACHINE_NAMES[machine] ?? `machine ${machine}`} (e_machine ${machine}), not RISC-V (e_machine ${EM_RISCV})`, 18)
  }
  const entry = c.u64(24, 'entry point')
  const shoff = c.u64(40, 'section table offset')
  const shentsize = c.u16(58)
  const shnum = c.u16(60)
  const shstrndx = c.u16(62)
  if (shnum === 0) throw new ElfError('no-symtab', 'the file has no section table, so no symbol table to list functions from', 60)
  if (shentsize !== 64) throw new ElfError('bad-table', `section headers of ${shentsize} bytes; ELF64 has 64`, 58)
  c.need(shoff, shnum * 64, 'section header table')

  const raw: Omit<ElfSection, 'name'>[] = []
  const names: number[] = []
  for (let i = 0; i < shnum; i++) {
    const o = shoff + i * 64
    names.push(c.u32(o))
    const s = {
      index: i,
      type: c.u32(o + 4),
      flags: c.u64(o + 8, 'section flags'),
      addr: c.u64(o + 16, 'section address'),
      offset: c.u64(o + 24, 'section offset'),
      size: c.u64(o + 32, 'section size'),
      link: c.u32(o + 40),
      info: c.u32(o + 44),
      entsize: c.u64(o + 56, 'section entry size'),
    }
    if (s.type !== SHT_NOBITS) c.need(s.offset, s.size, `section ${i}`)
    raw.push(s)
  }
  const strtab = raw[shstrndx]
  if (!strtab) throw new ElfError('bad-table', `the section-name table index ${shstrndx} is outside the ${shnum} sections`, 62)
  const sections: ElfSection[] = raw.map((s, i) => ({ ...s, name: cString(bytes, strtab.offset + (names[i] ?? 0), strtab.offset + strtab.size) }))

  const symtab = sections.find((s) => s.type === SHT_SYMTAB)
  if (!symtab) throw new ElfError('no-symtab', 'the file has no symbol table (.symtab): it was stripped; import an unstripped build', shoff)
  const symstr = sections[symtab.link]
  if (!symstr || symtab.entsize !== 24) throw new ElfError('bad-table', 'the symbol table has no string table or entries that are not 24 bytes', shoff + symtab.index * 64)
  const symbols: ElfSymbol[] = []
  for (let o = symtab.offset; o + 24 <= symtab.offset + symtab.size; o += 24) {
    const info = c.u8(o + 4)
    symbols.push({
      name: cString(bytes, symstr.offset + c.u32(o), symstr.offset + symstr.size),
      type: info & 0xf,
      bind: info >> 4,
      shndx: c.u16(o + 6),
      value: c.u64(o + 8, 'symbol value'),
      size: c.u64(o + 16, 'symbol size'),
    })
  }
  return { type, typeName: ET_NAMES[type] ?? `ELF type ${type}`, entry, sections, symbols, bytes }
}

/**
 * The functions of the symbol table: its STT_FUNC entries in executable
 * sections (compilers mark every function so; hand-written assembly needs
 * `.type name, @function`), in address order. A size of 0 reaches to the next
 * function of the same section with a higher address, or the end of the section.
 *
 * One sort and one backward pass (O(n log n)): a per-symbol search for the next
 * function was quadratic and held the server for seconds on large executables.
 */
export function elfFunctions(elf: ElfFile): ElfFunctionInfo[] {
  const found = elf.symbols
    .filter((s) => s.type === STT_FUNC && s.shndx > 0 && s.shndx < SHN_LORESERVE && s.name !== '')
    .map((s) => ({ s, section: elf.sections[s.shndx] }))
    .filter((x): x is { s: ElfSymbol; section: ElfSection } => !!x.section && (x.section.flags & SHF_EXECINSTR) !== 0)
    .sort((a, b) => a.s.value - b.s.value || (a.s.name < b.s.name ? -1 : a.s.name > b.s.name ? 1 : 0))
  const seen = new Set<string>()
  const all = found.filter(({ s }) => (seen.has(s.name) ? false : (seen.add(s.name), true)))
  // Walking from the highest address down, `nextStart` holds per section the
  // lowest address seen so far; `pending` the symbols sharing the current address,
  // whose next function must lie strictly above it.
  const nextStart = new Map<number, number>()
  const out: ElfFunctionInfo[] = new Array(all.length)
  let i = all.length - 1
  while (i >= 0) {
    const value = all[i]!.s.value
    let j = i
    while (j >= 0 && all[j]!.s.value === value) j--
    for (let k = j + 1; k <= i; k++) {
      const { s, section } = all[k]!
      const base = elf.type === 1 ? 0 : section.addr
      const sectionEnd = base + section.size
      const next = nextStart.get(section.index)
      const size = s.size > 0 ? s.size : (next ?? sectionEnd) - s.value
      out[k] = { name: s.name, address: s.value, size: Math.max(0, Math.min(size, sectionEnd - s.value)), section }
    }
    for (let k = j + 1; k <= i; k++) nextStart.set(all[k]!.section.index, value)
    i = j
  }
  return out
}

/**
 * The bytes of one function. In an object file, a relocation inside the
 * function means its bytes are not final (a call or an address of data that
 * only the linker fills in): refused with the offset, except branches and
 * jumps to labels of the same section, whose offsets the assembler already
 * wrote.
 */
export function functionBytes(elf: ElfFile, fn: ElfFunctionInfo): Uint8Array {
  const base = elf.type === 1 ? 0 : fn.section.addr
  const start = fn.section.offset + (fn.address - base)
  if (elf.type === 1) {
    for (const rela of elf.sections.filter((s) => s.type === SHT_RELA && s.info === fn.section.index)) {
      const symtab = elf.sections[rela.link]
      const c = new Cursor(elf.bytes)
      for (let o = rela.offset; o + 24 <= rela.offset + rela.size; o += 24) {
        const at = c.u64(o, 'relocation offset')
        if (at < fn.address || at >= fn.address + fn.size) continue
        const info = c.u64(o + 8, 'relocation info')
        const kind = info % 2 ** 32
        const symIndex = Math.floor(info / 2 ** 32)
        if (kind === R_RISCV_RELAX || kind === R_RISCV_ALIGN) continue
        const sym = symtab?.type === SHT_SYMTAB ? elf.symbols[symIndex] : undefined
        const local = (kind === R_RISCV_BRANCH || kind === R_RISCV_JAL || kind === R_RISCV_RVC_BRANCH || kind === R_RISCV_RVC_JUMP) && sym !== undefined && sym.shndx === fn.section.index
        if (!local) {
          throw new ElfError('relocation', `${fn.name}+0x${(at - fn.address).toString(16)} needs the linker (relocation type ${kind}${sym?.name ? ` against ${sym.name}` : ''}); link it first (riscv64-linux-gnu-ld) and import the executable`, rela.offset)
        }
      }
    }
  }
  return elf.bytes.subarray(start, start + fn.size)
}
