import { describe, expect, it } from 'vitest'
import { decodeWord } from '../../../shared/sim/isa/decoder'
import { parseHexWords, parseObjdump } from '../../../shared/sim/isa/objdump'

// Words below were printed by GNU binutils 2.40 (riscv64-linux-gnu-objdump -d) for the text beside them.
describe('decodeWord', () => {
  it.each([
    [0x0d25f557, 'vsetvli a0,a1,e32,m4,ta,ma'],
    [0xc5bff2d7, 'vsetivli t0,31,e64,m8,ta,mu'],
    [0x00056407, 'vle32.v v8,(a0),v0.t'],
    [0x0ab57407, 'vlse64.v v8,(a0),a1'],
    [0xb23550d7, 'vfmacc.vf v1,fa0,v3'],
    [0x5c22b0d7, 'vmerge.vim v1,v2,5,v0'],
    [0x7610a0d7, 'vmnot.m v1,v1'],
    [0x7005f557, 'vsetvli a0,a1,1792'],
    [0x00008067, 'ret'],
    [0x00000073, 'ecall'],
  ])('decodes %s as %s', (word, text) => {
    const r = decodeWord(word, 0)
    expect(r.ok && r.instruction.text).toBe(text)
  })

  it('prints branch targets from the instruction address, in hex as objdump does', () => {
    const r = decodeWord(0xfe0512e3, 0x10048) // bnez a0,-28
    expect(r.ok && r.instruction.text).toBe('bnez a0,1002c')
  })

  it.each([
    [0x0001, 'compressed', 'compressed'],
    [0x6a001057, 'reserved', 'no RISC-V V 1.0 instruction (a reserved encoding)'], // OPFVV funct6 011010: reserved (V 1.0 section 19)
    [0x02106007, 'reserved', 'reserved encoding'], // unit-stride load with lumop 00001: reserved (V 1.0 section 7.4)
    [0x00051507, 'unknown', 'not an instruction Chimeline supports'], // flh fa0,0(a0): scalar, not vector
    [0xffffffff, 'unknown', '0xffffffff'],
  ])('rejects %s with a structured %s error', (word, code, message) => {
    const r = decodeWord(word, 0x10000)
    expect(r.ok).toBe(false)
    if (!r.ok) {
      expect(r.error).toMatchObject({ code, word: word >>> 0, address: 0x10000 })
      expect(r.error.message).toContain(message)
    }
  })
})

const LISTING = `
prog.o:     file format elf64-littleriscv


Disassembly of section .text:

0000000000000000 <loop>:
   0:	0d2572d7          	vsetvli	t0,a0,e32,m4,ta,ma
   4:	0205e207          	vle32.v	v4,(a1)
   8:	40550533          	sub	a0,a0,t0
   c:	fe051ae3          	bnez	a0,0 <loop>
`

describe('parseObjdump', () => {
  it('reads address, word and text rows and names branch targets from symbol headers', () => {
    const r = parseObjdump(LISTING)
    expect(r.ok).toBe(true)
    if (!r.ok) return
    expect(r.rows.map((x) => [x.address, x.word, x.text])).toEqual([
      [0, 0x0d2572d7, 'vsetvli\tt0,a0,e32,m4,ta,ma'],
      [4, 0x0205e207, 'vle32.v\tv4,(a1)'],
      [8, 0x40550533, 'sub\ta0,a0,t0'],
      [12, 0xfe051ae3, 'bnez\ta0,0 <loop>'],
    ])
    expect(r.program.symbols).toEqual({ loop: 0 })
    const last = r.program.instructions[3]
    expect(last).toMatchObject({ op: 'bne', label: 'loop', text: 'bnez a0,0 <loop>', loc: { line: 11, column: 7 } })
  })

  it('reads 16-bit compressed rows at their own addresses (RV64C, words as objdump -d prints them)', () => {
    const r = parseObjdump('   0:\t0d2572d7\tvsetvli t0,a0,e32,m4,ta,ma\n   4:\t0001    \tnop\n   6:\t8082    \tret\n')
    expect(r.ok && r.program.instructions.map((i) => [i.address, i.op, i.compressed, i.text])).toEqual([
      [0, 'vsetvli', undefined, 'vsetvli t0,a0,e32,m4,ta,ma'],
      [4, 'addi', 'c.nop', 'nop'],
      [6, 'jalr', 'c.jr', 'ret'],
    ])
  })

  it('points at a reserved compressed half-word with line and column (c.addi16sp with a zero immediate)', () => {
    const r = parseObjdump('   0:\t0d2572d7\tvsetvli t0,a0,e32,m4,ta,ma\n   4:\t6101    \t.insn\n')
    expect(r.ok ? [] : r.errors).toEqual([expect.objectContaining({ line: 2, column: 7, code: 'reserved' })])
  })

  it('rejects a listing with a gap between addresses', () => {
    const r = parseObjdump('   0:\t00000013\tnop\n   8:\t00000013\tnop\n')
    expect(r.ok ? [] : r.errors.map((e) => [e.line, e.code])).toEqual([[2, 'address-gap']])
  })

  it('rejects text with no instruction rows', () => {
    expect(parseObjdump('hello').ok).toBe(false)
  })
})

describe('parseHexWords', () => {
  it('reads words with or without 0x, separated by spaces, commas or lines, from textBase', () => {
    const r = parseHexWords('0x0d2572d7, 0205e207 # vsetvli; vle32\n40550533\n', { textBase: 0x2000 })
    expect(r.ok && r.program.instructions.map((i) => [i.address, i.op])).toEqual([[0x2000, 'vsetvli'], [0x2004, 'vle32.v'], [0x2008, 'sub']])
  })

  it('says which token is not a word', () => {
    const r = parseHexWords('00000013 0xzz 00000013')
    expect(r.ok ? [] : r.errors).toEqual([expect.objectContaining({ line: 1, column: 10, code: 'bad-word' })])
  })

  it('enforces the instruction limit', () => {
    const r = parseHexWords('00000013 '.repeat(5), { maxInstructions: 4 })
    expect(r.ok ? [] : r.errors.map((e) => e.code)).toEqual(['too-many-instructions'])
  })
})
