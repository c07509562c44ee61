import { describe, expect, it } from 'vitest'
import { assemble, ASSEMBLE_DEFAULTS } from '../../../shared/sim/isa/assembler'
import type { Program, SimDiagnostic } from '../../../shared/sim/isa/types'

function ok(src: string): Program {
  const r = assemble(src)
  if (!r.ok) throw new Error(r.errors.map((e) => `${e.line}:${e.column} ${e.code} ${e.message}`).join('\n'))
  return r.program
}
function errs(src: string): SimDiagnostic[] {
  const r = assemble(src)
  if (r.ok) throw new Error('expected errors')
  return r.errors
}
const texts = (src: string): string[] => ok(src).instructions.map((i) => i.text)

describe('assemble: layout, labels and data', () => {
  it('places text at 0x10000 and data at the next 4 KiB boundary', () => {
    const p = ok('.text\nnop\n.data\nx: .word 7\n')
    expect(p.textBase).toBe(0x10000)
    expect(p.instructions[0]?.address).toBe(0x10000)
    expect(p.dataBase).toBe(0x11000)
    expect(p.symbols.x).toBe(0x11000)
  })

  it('writes data little-endian (RISC-V is little-endian), with .balign padding', () => {
    const p = ok('.data\na: .byte 1, -1\n.balign 4\nb: .half 0x1234\n.zero 2\nc: .word -2\nd: .dword 0x0102030405060708\n')
    expect([...p.data]).toEqual([1, 255, 0, 0, 0x34, 0x12, 0, 0, 0xfe, 0xff, 0xff, 0xff, 8, 7, 6, 5, 4, 3, 2, 1])
    expect(p.dataLabels.map((l) => [l.name, l.address - p.dataBase, l.size])).toEqual([['a', 0, 4], ['b', 4, 4], ['c', 8, 4], ['d', 12, 8]])
  })

  it('writes .double and .float as IEEE 754 binary64 and binary32', () => {
    const p = ok('.section .data\nx: .double 1.5\ny: .float -0.25\n')
    const v = new DataView(p.data.buffer)
    expect(v.getFloat64(0, true)).toBe(1.5)
    expect(v.getFloat32(8, true)).toBe(-0.25)
  })

  it('resolves la as auipc + addi relative to the auipc (pc-relative, so any base works)', () => {
    const p = ok('la a0, buf\nla a1, buf\n.data\n.zero 100\nbuf: .dword 0\n')
    const [hi, lo] = p.instructions
    const target = (hi?.address ?? 0) + (((hi?.operands.imm ?? 0) << 12) | 0) + (lo?.operands.imm ?? 0)
    expect(target).toBe(p.symbols.buf)
  })

  it('resolves forward and backward branch offsets in bytes', () => {
    const p = ok('top: beqz a0, end\n j top\nend: nop\n')
    expect(p.instructions.map((i) => i.operands.imm)).toEqual([8, -4, 0])
    expect(p.instructions[0]?.text).toBe('beqz a0,10008 <end>')
  })

  it('pads .balign in the text section with nops', () => {
    expect(texts('nop\n.balign 16\nx: ecall\n')).toEqual(['nop', 'nop', 'nop', 'nop', 'ecall'])
  })

  it('ignores .globl, .global and .option and accepts comments anywhere', () => {
    expect(texts('.globl main # entry\n.global x\n.option norvc\nmain: # here\n  addi a0, a0, 1 # inc\n')).toEqual(['addi a0,a0,1'])
  })
})

describe('assemble: pseudo-instructions (RISC-V assembly manual, V 1.0 spec 11.8, 13.13, 15.1)', () => {
  it.each([
    ['nop', ['nop']],
    ['mv a0, a1', ['mv a0,a1']],
    ['li a0, -5', ['li a0,-5']],
    ['li a0, 0x12345', ['lui a0,0x12', 'addi a0,a0,837']],
    ['neg a0, a1', ['neg a0,a1']],
    ['ret', ['ret']],
    ['jr t0', ['jr t0']],
    ['jalr a0', ['jalr a0']],
    ['vneg.v v1, v2', ['vneg.v v1,v2']],
    ['vnot.v v1, v2, v0.t', ['vnot.v v1,v2,v0.t']],
    ['vfneg.v v1, v2', ['vfneg.v v1,v2']],
    ['vfabs.v v1, v2', ['vfabs.v v1,v2']],
    ['vmnot.m v1, v2', ['vmnot.m v1,v2']],
    ['vmmv.m v1, v2', ['vmmv.m v1,v2']],
    ['vmsgt.vv v1, v2, v3', ['vmslt.vv v1,v3,v2']],
    ['vmfge.vv v1, v2, v3, v0.t', ['vmfle.vv v1,v3,v2,v0.t']],
    ['vmsge.vi v1, v2, 16', ['vmsgt.vi v1,v2,15']],
    ['vmsgeu.vi v1, v2, 0', ['vmseq.vv v1,v2,v2']],
    ['vmsltu.vi v1, v2, 0', ['vmsne.vv v1,v2,v2']],
    ['vmsge.vx v1, v2, a0', ['vmslt.vx v1,v2,a0', 'vmnot.m v1,v1']],
    ['vmsgeu.vx v1, v2, a0, v0.t', ['vmsltu.vx v1,v2,a0,v0.t', 'vmxor.mm v1,v1,v0']],
  ])('%s expands to %j', (src, want) => {
    expect(texts(src)).toEqual(want)
  })

  it.each([
    ['bgt a0, a1, L', 'blt a1,a0'],
    ['ble a0, a1, L', 'bge a1,a0'],
    ['bgtu a0, a1, L', 'bltu a1,a0'],
    ['bleu a0, a1, L', 'bgeu a1,a0'],
    ['blez a0, L', 'blez a0'],
    ['bgtz a0, L', 'bgtz a0'],
  ])('%s swaps to %s', (src, want) => {
    expect(texts(`L: ${src}`)[0]).toMatch(new RegExp(`^${want},`))
  })

  it('accepts x and f registers by number and by ABI name (RISC-V ABI register convention)', () => {
    expect(texts('add x10, x11, x12\nadd a0, fp, s0\nfld f10, 0(x2)\nfld fa0, 8(sp)')).toEqual([
      'add a0,a1,a2', 'add a0,s0,s0', 'fld fa0,0(sp)', 'fld fa0,8(sp)',
    ])
  })

  it('reads vtype text with defaults m1, tu, mu (spec 6.1) and numeric vtype immediates', () => {
    expect(texts('vsetvli t0, a0, e16\nvsetivli zero, 31, e64, mf2, ta, mu\nvsetvli a0, a1, 0xd0')).toEqual([
      'vsetvli t0,a0,e16,m1,tu,mu', 'vsetivli zero,31,e64,mf2,ta,mu', 'vsetvli a0,a1,e32,m1,ta,ma',
    ])
  })

  it('reads immediates in decimal, hex, binary and (like GNU as) octal with a leading 0', () => {
    expect(ok('addi a0, a0, 0x10\naddi a0, a0, 0b101\naddi a0, a0, 010\naddi a0, a0, -0x10').instructions.map((i) => i.operands.imm)).toEqual([16, 5, 8, -16])
  })
})

describe('assemble: errors say what and where', () => {
  it.each([
    ['vadd.vvv v1, v2, v3', 1, 1, 'unknown-mnemonic', "did you mean 'vadd.vv'"],
    ['  vfmaccc.vf v1, fa0, v2', 1, 3, 'unknown-mnemonic', "did you mean 'vfmacc.vf'"],
    ['fadd.d fa0, fa1, fa2, rxx', 1, 23, 'operand-kind', 'expected a rounding mode (rne, rtz, rdn, rup, rmm or dyn)'],
    ['csrr a0, vfoo', 1, 10, 'operand-kind', 'expected a CSR name'],
    ['addi a0, a0, %hi(x)', 1, 14, 'operand-kind', '%hi(...) does not fit this operand'],
    ['li a0, N', 1, 8, 'operand-kind', "'N' is not a constant defined before this line (.equ/.set)"],
    ['j 1f', 1, 3, 'undefined-label', "no local label '1f' after this line"],
    ['vadd.vv v1, v2', 1, 13, 'operand-count', 'vadd.vv takes vd, vs2, vs1[, v0.t]'],
    ['vadd.vv v1, v2, a0', 1, 17, 'operand-kind', 'expected a vector register, found x register'],
    ['add a0, a1, v2', 1, 13, 'operand-kind', 'expected an x register'],
    ['vadd.vi v1, v2, 16', 1, 17, 'imm-range', 'out of range -16..15'],
    ['vsll.vi v1, v2, -1', 1, 17, 'imm-range', 'out of range 0..31'],
    ['addi a0, a0, 2048', 1, 14, 'imm-range', '-2048..2047'],
    ['slli a0, a0, 64', 1, 14, 'imm-range', '0..63'],
    ['vsetivli a0, 32, e8', 1, 14, 'imm-range', '0..31'],
    ['vadd.vv v1, v2, v3, v1.t', 1, 21, 'bad-mask', 'only v0.t'],
    ['vsetvli a0, a1, e32, m3', 1, 22, 'bad-vtype', "bad vtype field 'm3'"],
    ['bnez a0, nowhere', 1, 10, 'undefined-label', "undefined label 'nowhere'"],
    ['x: nop\nx: nop', 2, 1, 'duplicate-label', "label 'x' is already defined on line 1"],
    ['.data\n.word 1\nadd a0, a0, a0', 3, 1, 'instruction-in-data', 'put it after .text'],
    ['.word 5', 1, 1, 'data-in-text', 'put it after .data'],
    ['.data\n.byte 256', 2, 7, 'imm-range', 'does not fit in 1 byte'],
    ['.data\n.double abc', 2, 9, 'operand-kind', 'expected a number'],
    ['.frobnicate 3', 1, 1, 'bad-directive', "unknown directive '.frobnicate'"],
    ['li a0, 0x10000000000000000', 1, 8, 'imm-range', 'does not fit in 64 bits'],
  ])('%j: line %i column %i, %s', (src, line, column, code, message) => {
    const e = errs(src)[0]
    expect(e).toMatchObject({ line, column, code })
    expect(e?.message).toContain(message)
  })

  it('rejects a branch whose label is beyond its reach (B-type: -4096..4094 bytes)', () => {
    const e = errs(`beqz a0, far\n${'nop\n'.repeat(1100)}far: nop\n`)
    expect(e[0]).toMatchObject({ line: 1, column: 10, code: 'imm-range' })
  })

  it('takes labels called like Object prototype members as plain labels', () => {
    const p = ok('__proto__: nop\nconstructor: j __proto__\n')
    expect([p.symbols['__proto__'], p.symbols['constructor'], p.instructions[1]?.operands.imm]).toEqual([0x10000, 0x10004, -4])
    expect(errs('__proto__ a0')[0]?.code).toBe('unknown-mnemonic')
  })

  it('reports several errors in one run, in source order', () => {
    const e = errs('foo a0\nvadd.vi v1, v2, 99\nbar\n')
    expect(e.map((d) => [d.line, d.code])).toEqual([[1, 'unknown-mnemonic'], [2, 'imm-range'], [3, 'unknown-mnemonic']])
  })
})

describe('assemble: register groups (RISC-V V 1.0 spec 3.4.2, 5.3, 7.3, 16.3)', () => {
  it('rejects a register group not aligned to LMUL, naming the vsetvli that set it', () => {
    const e = errs('vsetvli t0, a0, e32, m4, ta, ma\nvadd.vv v4, v8, v2\n')
    expect(e[0]).toMatchObject({ line: 2, column: 17, code: 'lmul-align' })
    expect(e[0]?.message).toContain('set on line 1')
  })

  it('checks memory data groups against EMUL = EEW / SEW x LMUL (spec 7.3)', () => {
    expect(errs('vsetvli t0, a0, e8, m2\nvle32.v v4, (a0)\n')[0]?.message).toContain('multiple of 8')
    expect(errs('vsetvli t0, a0, e8, m4\nvle64.v v0, (a0)\n')[0]?.code).toBe('emul-range')
    expect(ok('vsetvli t0, a0, e32, m8\nvle8.v v2, (a0)\n').instructions).toHaveLength(2)
  })

  it('accepts any register for mask destinations and reductions scalars', () => {
    expect(ok('vsetvli t0, a0, e32, m8\nvmslt.vv v1, v8, v16\nvredsum.vs v3, v8, v5\nvmv.x.s a0, v3\n').instructions).toHaveLength(4)
  })

  it('forgets the vtype where paths with different vtypes meet (a label reached from two vsetvlis)', () => {
    const src = 'vsetvli t0, a0, e32, m4\nbeqz a1, L\nvsetvli t0, a0, e32, m1\nL: vadd.vv v1, v2, v3\n'
    expect(ok(src).instructions).toHaveLength(4)
    // both paths agree on m4: the check applies after the label
    expect(errs('vsetvli t0, a0, e32, m4\nbeqz a1, L\nnop\nL: vadd.vv v1, v2, v3\n')[0]?.code).toBe('lmul-align')
  })

  it('follows a strip-mined loop around its back edge', () => {
    expect(errs('loop: vsetvli t0, a0, e64, m2\nvle64.v v3, (a1)\nsub a0, a0, t0\nbnez a0, loop\n')[0]).toMatchObject({ line: 2, code: 'lmul-align' })
  })

  it('rejects a masked instruction whose destination is v0 (spec 5.3), but allows it for compares', () => {
    expect(errs('vadd.vv v0, v1, v2, v0.t')[0]?.code).toBe('mask-overlap')
    expect(errs('vle32.v v0, (a0), v0.t')[0]?.code).toBe('mask-overlap')
    expect(ok('vmseq.vv v0, v1, v2, v0.t').instructions).toHaveLength(1)
    // vmerge is encoded masked (vm = 0), so spec 5.3 reserves vd = v0 too; GNU as 2.40 accepts it
    expect(errs('vmerge.vvm v0, v1, v2, v0')[0]?.code).toBe('mask-overlap')
  })

  it('rejects vslideup, vrgather and vcompress writing over their source (spec 16.3.1, 16.4, 16.5)', () => {
    expect(errs('vslideup.vi v2, v2, 1')[0]?.code).toBe('overlap')
    expect(errs('vrgather.vv v1, v2, v1')[0]?.code).toBe('overlap')
    // with m4, vd = v4 spans v4..v7 and so covers the mask source v5
    expect(errs('vsetvli t0, a0, e32, m4\nvcompress.vm v4, v8, v5')[0]?.code).toBe('overlap')
    expect(ok('vsetvli t0, a0, e32, m4\nvcompress.vm v4, v8, v1').instructions).toHaveLength(2)
  })
})

describe('assemble: limits', () => {
  it('rejects a source longer than the limit', () => {
    const e = assemble('nop\n'.repeat(10), { maxSourceLength: 20 })
    expect(e.ok ? [] : e.errors.map((d) => d.code)).toEqual(['too-large'])
  })

  it('rejects more instructions than the limit, counting pseudo expansions', () => {
    const r = assemble('li a0, 0x123456789\n'.repeat(3), { maxInstructions: 5 })
    expect(r.ok ? [] : r.errors.map((d) => [d.line, d.code])).toEqual([[2, 'too-many-instructions']])
  })

  it('rejects a data segment above the limit', () => {
    const r = assemble('.data\n.zero 100\n.zero 100\n', { maxDataBytes: 150 })
    expect(r.ok ? [] : r.errors.map((d) => [d.line, d.code])).toEqual([[3, 'data-too-large']])
  })

  it('has explicit defaults', () => {
    expect(ASSEMBLE_DEFAULTS).toMatchObject({ maxSourceLength: 1_000_000, maxInstructions: 100_000, maxErrors: 100 })
  })

  it('assembles 10,000 lines with 2,000 labels, each branch to its own label (no time asserted: a loaded machine stretches it)', () => {
    const block = (i: number): string => `L${i}: vsetvli t0, a0, e32, m4, ta, ma\nvle32.v v4, (a1)\nvfmacc.vf v8, fa0, v4\nsub a0, a0, t0\nbnez a0, L${i}\n`
    const body = Array.from({ length: 2000 }, (_, i) => block(i)).join('')
    const r = assemble(body)
    expect(r.ok).toBe(true)
    if (!r.ok) return
    expect(r.program.instructions).toHaveLength(10_000)
    // The last branch goes back 16 bytes to its own vsetvli (four 4-byte instructions before it).
    const last = r.program.instructions[9_999]!
    expect(last.label).toBe('L1999')
    expect(last.text).toMatch(/^bnez\s+a0,/)
  })
})
