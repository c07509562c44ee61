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
  ])('styles %j', (line, expected) => {
    expect(tokenizeLine(line)).toEqual(expected)
  })
})
