/**
 * The ELF function list on a large symbol table (issue 9, hardening item 2):
 * 120,000 FUNC symbols in a generated ELF64 executable. Listing them used to
 * search the rest of the list for each symbol's successor (quadratic); the
 * answer must stay right now that it sorts once. The file is built here byte by
 * byte after the System V gABI's ELF-64 layout (header 64 bytes, section headers
 * 64 bytes, Elf64_Sym 24 bytes), so the expected sizes follow from how it is
 * made (derivation in the comments), not from the reader under test.
 * No timing is asserted (shared machine): the speed is in `npm run bench`.
 */
import { describe, expect, it } from 'vitest'
import { listFunctions } from '../../server/services/elf/import'
import { readElf } from '../../server/services/elf/reader'

interface Sym { name: string; value: number; size: number; shndx: number }

/** An ET_EXEC RISC-V ELF64 with two executable sections (.text at 0x10000, .text.b at 0x400000) and the given symbols. */
function buildElf(textSize: number, bSize: number, syms: Sym[]): Uint8Array {
  const shstr = '\0.text\0.text.b\0.symtab\0.strtab\0.shstrtab\0'
  const nameOff = (n: string) => shstr.indexOf(`\0${n}\0`) + 1
  const strParts: string[] = ['\0']
  let strLen = 1
  const symNames = syms.map((s) => {
    const at = strLen
    strParts.push(`${s.name}\0`)
    strLen += s.name.length + 1
    return at
  })
  const strtab = new TextEncoder().encode(strParts.join(''))
  const symtabSize = (syms.length + 1) * 24
  const textOff = 64
  const bOff = textOff + textSize
  const symOff = Math.ceil((bOff + bSize) / 8) * 8
  const strOff = symOff + symtabSize
  const shstrOff = strOff + strtab.length
  const shOff = Math.ceil((shstrOff + shstr.length) / 8) * 8
  const total = shOff + 6 * 64
  const b = new Uint8Array(total)
  const v = new DataView(b.buffer)
  b.set([0x7f, 0x45, 0x4c, 0x46, 2, 1, 1])
  v.setUint16(16, 2, true) // ET_EXEC
  v.setUint16(18, 243, true) // EM_RISCV
  v.setUint32(20, 1, true)
  v.setBigUint64(24, 0x10000n, true)
  v.setBigUint64(40, BigInt(shOff), true)
  v.setUint16(52, 64, true)
  v.setUint16(58, 64, true)
  v.setUint16(60, 6, true)
  v.setUint16(62, 5, true)
  // st_info = STB_GLOBAL << 4 | STT_FUNC
  syms.forEach((s, i) => {
    const o = symOff + (i + 1) * 24
    v.setUint32(o, symNames[i]!, true)
    v.setUint8(o + 4, (1 << 4) | 2)
    v.setUint16(o + 6, s.shndx, true)
    v.setBigUint64(o + 8, BigInt(s.value), true)
    v.setBigUint64(o + 16, BigInt(s.size), true)
  })
  b.set(strtab, strOff)
  b.set(new TextEncoder().encode(shstr), shstrOff)
  const section = (i: number, name: string, type: number, flags: number, addr: number, off: number, size: number, link: number, info: number, entsize: number) => {
    const o = shOff + i * 64
    v.setUint32(o, name ? nameOff(name) : 0, true)
    v.setUint32(o + 4, type, true)
    v.setBigUint64(o + 8, BigInt(flags), true)
    v.setBigUint64(o + 16, BigInt(addr), true)
    v.setBigUint64(o + 24, BigInt(off), true)
    v.setBigUint64(o + 32, BigInt(size), true)
    v.setUint32(o + 40, link, true)
    v.setUint32(o + 44, info, true)
    v.setBigUint64(o + 56, BigInt(entsize), true)
  }
  section(1, '.text', 1, 0x6, 0x10000, textOff, textSize, 0, 0, 0) // SHT_PROGBITS, SHF_ALLOC | SHF_EXECINSTR
  section(2, '.text.b', 1, 0x6, 0x400000, bOff, bSize, 0, 0, 0)
  section(3, '.symtab', 2, 0, 0, symOff, symtabSize, 4, 1, 24)
  section(4, '.strtab', 3, 0, 0, strOff, strtab.length, 0, 0, 0)
  section(5, '.shstrtab', 3, 0, 0, shstrOff, shstr.length, 0, 0, 0)
  return b
}

describe('ELF function list with 120,000 FUNC symbols (issue 9 item 2)', () => {
  it('gives every function its size: st_size when set, else up to the next function of its section or the section end', () => {
    // .text: 99,900 functions f<i> at 0x10000 + 8i. Every third (i % 3 == 0) has
    // st_size 4; the others have st_size 0, so each reaches the next one, 8 bytes
    // on, except the last (i = 99,899, not a multiple of 3), which reaches the
    // section end: the section is 8 x 99,900 + 16 bytes, so 8 + 16 = 24.
    // .text.b: 20,000 functions g<j> at 0x400000 + 16j, all st_size 0: each is 16
    // bytes; the last reaches the section end, 16 * 20,000 + 40 bytes, so 56.
    // Every 1,000th f<i> below the last (100 of them) has an alias a<i> at the same address with st_size 0:
    // it reaches f<i+1> (strictly above), 8 bytes, whatever f<i>'s own size.
    // The symbols are written in reverse order so the table is not presorted.
    const N = 99_900
    const M = 20_000
    const syms: Sym[] = []
    for (let i = 0; i < N; i++) syms.push({ name: `f${i}`, value: 0x10000 + 8 * i, size: i % 3 === 0 ? 4 : 0, shndx: 1 })
    for (let j = 0; j < M; j++) syms.push({ name: `g${j}`, value: 0x400000 + 16 * j, size: 0, shndx: 2 })
    for (let i = 0; i < N - 1; i += 1000) syms.push({ name: `a${i}`, value: 0x10000 + 8 * i, size: 0, shndx: 1 })
    expect(syms.length).toBe(120_000)
    syms.reverse()
    const elf = readElf(buildElf(8 * N + 16, 16 * M + 40, syms))
    const list = listFunctions(elf)
    expect(list.length).toBe(120_000)
    const byName = new Map(list.map((f) => [f.name, f]))
    for (let i = 0; i < N; i++) {
      const f = byName.get(`f${i}`)!
      const want = i % 3 === 0 ? 4 : i === N - 1 ? 16 + 8 : 8
      expect(f.address).toBe(0x10000 + 8 * i)
      if (f.size !== want) expect({ name: f.name, size: f.size }).toEqual({ name: f.name, size: want })
    }
    for (let j = 0; j < M; j++) {
      const g = byName.get(`g${j}`)!
      const want = j === M - 1 ? 56 : 16
      if (g.size !== want) expect({ name: g.name, size: g.size }).toEqual({ name: g.name, size: want })
    }
    for (let i = 0; i < N - 1; i += 1000) expect(byName.get(`a${i}`)?.size).toBe(8)
    // Address order, as the chooser lists them.
    for (let k = 1; k < list.length; k++) expect(list[k]!.address >= list[k - 1]!.address).toBe(true)
    expect(list[list.length - 1]!.name).toBe(`g${M - 1}`)
    // The sections are zero bytes: by the length encoding (low bits 00) each half-word is a 16-bit instruction.
    expect(list.find((f) => f.name === `f${N - 1}`)!.instructions).toBe(24 / 2)
  })
})
