import { describe, expect, it } from 'vitest'
import { tokenizeLine } from '@/lib/bench/rvvSyntax'

describe('the RISC-V V tokenizer', () => {
  it.each([
    ['loop: vsetvli t0, a0, e32, m1, ta, ma # strip', [
      ['loop:', 'labelName'], ['vsetvli', 'keyword'], ['t0', 'variableName'], [',', null], ['a0', 'variableName'], [',', null],
      ['e32', 'operator'], [',', null], ['m1', 'operator'], [',', null], ['ta', 'operator'], [',', null], ['ma', 'operator'], ['# strip', 'comment'],
    ]],
    ['    vfmacc.vf v16, fa0, v8, v0.t', [
      ['vfmacc.vf', 'keyword'], ['v16', 'variableName.special'], [',', null], ['fa0', 'variableName'], [',', null],
      ['v8', 'variableName.special'], [',', null], ['v0.t', 'operator'],
    ]],
    ['x:  .float 1.0, -2.5e3', [['x:', 'labelName'], ['.float', 'meta'], ['1.0', 'number'], [',', null], ['-2.5e3', 'number']]],
    ['    la a1, x', [['la', 'keyword'], ['a1', 'variableName'], [',', null], ['x', 'labelName']]],
    ['    flw fa0, 0(t2)', [['flw', 'keyword'], ['fa0', 'variableName'], [',', null], ['0', 'number'], ['(', null], ['t2', 'variableName'], [')', null]]],
    // Compiler output (clang-16 -S): numeric labels and references, %hi/%lo, rounding modes, CSR names.
    ['1:  bnez a0, 1b', [['1:', 'labelName'], ['bnez', 'keyword'], ['a0', 'variableName'], [',', null], ['1b', 'labelName']]],
    ['.LBB0_3:', [['.LBB0_3:', 'labelName']]],
    ['\tfld\tft0, %lo(.LCPI0_0)(a0)', [['fld', 'keyword'], ['ft0', 'variableName'], [',', null], ['%lo', 'operator'], ['(', null], ['.LCPI0_0', 'labelName'], [')', null], ['(', null], ['a0', 'variableName'], [')', null]]],
    ['\tfadd.d\tfa0, fa1, fa2, rtz', [['fadd.d', 'keyword'], ['fa0', 'variableName'], [',', null], ['fa1', 'variableName'], [',', null], ['fa2', 'variableName'], [',', null], ['rtz', 'operator']]],
    ['\tcsrr\tt1, vlenb', [['csrr', 'keyword'], ['t1', 'variableName'], [',', null], ['vlenb', 'variableName']]],
    ['\t.section\t.text.daxpy,"ax",@progbits', [['.section', 'meta'], ['.text.daxpy', 'labelName'], [',', null], ['"ax"', 'string'], [',', null], ['@progbits', 'operator']]],
    ['\t.type\tdaxpy,@function', [['.type', 'meta'], ['daxpy', 'labelName'], [',', null], ['@function', 'operator']]],
    ['\t.attribute\t5, "rv64i2p1_m2p0"', [['.attribute', 'meta'], ['5', 'number'], [',', null], ['"rv64i2p1_m2p0"', 'string']]],
    ['\tauipc\ta0, %pcrel_hi(x)', [['auipc', 'keyword'], ['a0', 'variableName'], [',', null], ['%pcrel_hi', 'operator'], ['(', null], ['x', 'labelName'], [')', null]]],
    ['\t.size\tdaxpy, .Lfunc_end0-daxpy', [['.size', 'meta'], ['daxpy', 'labelName'], [',', null], ['.Lfunc_end0', 'labelName'], ['-', null], ['daxpy', 'labelName']]],
    // An imported executable: .origin and compressed instructions.
    ['  .origin 0x10120', [['.origin', 'meta'], ['0x10120', 'number']]],
    ['  c.ldsp ra,8(sp)', [['c.ldsp', 'keyword'], ['ra', 'variableName'], [',', null], ['8', 'number'], ['(', null], ['sp', 'variableName'], [')', null]]],
  ])('styles %j', (line, expected) => {
    expect(tokenizeLine(line)).toEqual(expected)
  })
})

describe('editorDiagnostics', () => {
  it('underlines the word at the assembler’s line and column', async () => {
    const { editorDiagnostics } = await import('@/lib/bench/diagnostics')
    const { assemble } = await import('@shared/sim/isa')
    const text = '    li a0, 4\n    vadd.vv v1, v2, q3\n'
    const r = assemble(text)
    expect(r.ok).toBe(false)
    if (r.ok) return
    const [d] = editorDiagnostics(text, r.errors)
    expect(d?.where).toBe('line 2, column 21')
    expect(text.slice(d!.from, d!.to)).toBe('q3')
  })

  it('clamps a position past the end of the text', async () => {
    const { editorDiagnostics } = await import('@/lib/bench/diagnostics')
    const [d] = editorDiagnostics('ab', [{ line: 9, column: 40, code: 'x', message: 'm' }])
    expect(d).toMatchObject({ from: 2, to: 2 })
  })
})
