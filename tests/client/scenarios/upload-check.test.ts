import { describe, expect, it } from 'vitest'
import { UPLOAD_MAX_BYTES } from '@shared/schemas/upload'
import { checkUpload, formatBytes, guessKind } from '@/lib/scenarios/uploadCheck'

const text = (s: string) => new TextEncoder().encode(s)
const hex = (h: string) => new Uint8Array(h.match(/../g)!.map((b) => parseInt(b, 16)))

/*
 * Recorded with Debian's binutils-riscv64-linux-gnu 2.40 from
 *   .text / .globl kernel / kernel: vsetvli t0, a0, e32, m1, ta, ma / ret
 * by `riscv64-linux-gnu-as -march=rv64gcv -o k.o k.s`: the first 64 bytes of
 * k.o (the ELF header), and `riscv64-linux-gnu-objdump -d k.o`.
 */
const GNU_AS_ELF_HEADER = hex(
  '7f454c460201010000000000000000000100f3000100000000000000000000000000000000000000500200000000000005000000400000000000400008000700',
)
const GNU_OBJDUMP_LISTING = `
k.o:     file format elf64-littleriscv


Disassembly of section .text:

0000000000000000 <kernel>:
   0:	0d0572d7          	vsetvli	t0,a0,e32,m1,ta,ma
   4:	8082                	ret
`

describe('the client-side upload check', () => {
  it('recognises an object file built by GNU as as an ELF file by its magic number (System V ABI, e_ident)', () => {
    expect(guessKind('k.o', GNU_AS_ELF_HEADER)).toBe('elf')
    // Even under a misleading name: the magic number wins.
    expect(guessKind('k.s', GNU_AS_ELF_HEADER)).toBe('elf')
  })

  it('recognises GNU objdump -d output as a listing by its "file format" header', () => {
    expect(guessKind('k.txt', text(GNU_OBJDUMP_LISTING))).toBe('objdump')
  })

  it.each([
    ['saxpy.s', '  .text\n  vsetvli t0, a0, e32, m1, ta, ma\n', 'asm'],
    ['notes.txt', 'loop:\n  addi a0, a0, -1\n', 'asm'],
    ['kept.json', '{ "format": "chimeline-scenario-bundle" }', 'bundle'],
    ['no-extension', '  {\n "formatVersion": 1 }', 'bundle'],
  ] as const)('guesses %s as %s', (name, body, kind) => {
    expect(guessKind(name, text(body))).toBe(kind)
  })

  it('refuses binary data that is not an ELF file, saying what is accepted', () => {
    const garbage = new Uint8Array([0x00, 0x13, 0x88, 0xff, 0x00, 0x41])
    const r = checkUpload({ name: 'blob.bin', size: garbage.length }, garbage)
    expect(r).toEqual({ ok: false, message: expect.stringContaining('neither text') })
  })

  it('refuses an empty file by name', () => {
    expect(checkUpload({ name: 'empty.s', size: 0 }, new Uint8Array())).toEqual({ ok: false, message: 'empty.s is empty.' })
  })

  it('accepts a file of exactly the limit and refuses one byte more, naming both sizes', () => {
    const head = text('addi a0, a0, 1\n')
    expect(checkUpload({ name: 'big.s', size: UPLOAD_MAX_BYTES }, head)).toEqual({ ok: true, kind: 'asm' })
    const over = checkUpload({ name: 'big.s', size: UPLOAD_MAX_BYTES + 1 }, head)
    expect(over.ok).toBe(false)
    if (!over.ok) expect(over.message).toBe(`big.s is 4.0 MiB; files of at most ${formatBytes(UPLOAD_MAX_BYTES)} can be imported.`)
  })

  it.each([
    [0, '0 bytes'],
    [1023, '1023 bytes'],
    [1024, '1.0 KiB'],
    [1536, '1.5 KiB'],
    [4 * 1024 * 1024, '4.0 MiB'],
  ])('writes %i bytes as %s (binary prefixes, IEC 80000-13)', (n, s) => {
    expect(formatBytes(n)).toBe(s)
  })
})
