/**
 * The RV64C forms in Chimeline's own assembly (c. mnemonics, `.origin`) and
 * their execution. The bits of every form are checked against GNU as and
 * objdump in tests/reference/elf; here: what the assembler refuses and what
 * a 16-bit instruction does when it runs (RISC-V unprivileged ISA, chapter
 * "C" Standard Extension: c.jalr writes pc + 2 to ra; c.j, c.beqz reach
 * +-2 KiB and +-256 bytes).
 */
import { describe, expect, it } from 'vitest'
import { assemble } from '../../../shared/sim/isa/assembler'
import { execute } from '../../../shared/sim/exec/execute'

describe('compressed instructions in assembly text', () => {
  it('lays out 2-byte and 4-byte instructions at their addresses, and c.jalr links pc + 2 (RVC, c.jalr)', () => {
    const r = assemble(`
  .text
  .origin 0x10122
_start:
  c.li a0, 5
  la a1, f
  c.jalr a1
  c.addi a0, 1
  li a7, 93
  ecall
f:
  c.mv a2, ra
  c.addi a0, 10
  c.jr ra
`)
    if (!r.ok) throw new Error(r.errors[0]?.message)
    const p = r.program
    expect(p.textBase).toBe(0x10122)
    expect(p.entry).toBe(0x10122)
    expect(p.instructions.map((i) => i.address - 0x10122)).toEqual([0, 2, 6, 10, 12, 14, 18, 22, 24, 26])
    const e = execute(p, { vlen: 128 })
    if (!e.ok) throw new Error(e.error.message)
    // a2 holds the return address: the c.jalr at +10 links to +12; a0 = 5 + 10 + 1.
    expect(e.x[12]).toBe(BigInt(0x10122 + 12))
    expect(e.exitCode).toBe(16)
  })

  it.each([
    ['c.addi a0, 100', 'c.addi: c.addi a0,100 has no 16-bit encoding'], // the immediate is 6 bits signed
    ['c.ld a6, 0(a0)', 'c.ld: c.ld a6,0(a0) has no 16-bit encoding'], // rd' is x8..x15
    ['c.ld a0, 4(a1)', 'c.ld: c.ld a0,4(a1) has no 16-bit encoding'], // the offset is a multiple of 8
    ['c.addi16sp a0, 16', 'c.addi16sp: c.addi16sp a0,16 has no 16-bit encoding'], // only sp
  ])('refuses %s, naming it (RVC formats)', (line, message) => {
    const r = assemble(`  .text\n  ${line}\n`)
    expect(r.ok ? null : r.errors[0]).toMatchObject({ line: 2, column: 3, code: 'no-compressed-form', message: expect.stringContaining(message) })
  })

  it('refuses a branch whose target is beyond c.beqz reach', () => {
    const r = assemble(`  .text\n1:\n  c.beqz a0, 2f\n${'  nop\n'.repeat(80)}2:\n  ret\n`)
    expect(r.ok ? null : r.errors.find((e) => e.code === 'no-compressed-form')?.line).toBe(3)
  })

  it('counts operands of a c. form', () => {
    const r = assemble('  .text\n  c.mv a0\n')
    expect(r.ok ? null : r.errors[0]).toMatchObject({ code: 'operand-count', message: 'c.mv takes 2 operands; found 1' })
  })
})

describe('.origin', () => {
  it('places the text and the data at the given addresses', () => {
    const r = assemble('  .text\n  .origin 0x20000\n  nop\n  .data\n  .origin 0x20010\nx: .word 7\n')
    expect(r.ok && [r.program.textBase, r.program.dataBase, r.program.symbols.x]).toEqual([0x20000, 0x20010, 0x20010])
  })

  it.each([
    ['  .text\n  nop\n  .origin 0x20000\n', 3, '.origin must come before the first instruction of the text'],
    ['  .text\n  .origin 0x20001\n', 2, '.origin takes one address (even, as instructions are 2-byte aligned): .origin 0x10000'],
    ['  .text\n  .origin 0x20000\n  nop\n  nop\n  .data\n  .origin 0x20004\n  .word 1\n', 6, '.origin: the data at 0x20004 would overlap the text (0x20000..0x20007)'],
  ])('refuses a misplaced or bad .origin (%#)', (text, line, message) => {
    const r = assemble(text)
    expect(r.ok ? null : r.errors[0]).toMatchObject({ line, message })
  })
})
