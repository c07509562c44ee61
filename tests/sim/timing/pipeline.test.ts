import { readFileSync, readdirSync } from 'node:fs'
import { describe, expect, it } from 'vitest'
import { parseMachine } from '../../../shared/schemas/machine'
import { execute } from '../../../shared/sim/exec/execute'
import { assemble } from '../../../shared/sim/isa/assembler'
import { simulate } from '../../../shared/sim/timing/simulate'
import { laneTiming } from '../../../shared/sim/trace/types'

function run(text: string, vlen: number, lanes: number) {
  const asm = assemble(text)
  if (!asm.ok) throw new Error(asm.errors.map((e) => `${e.line}:${e.column} ${e.message}`).join('; '))
  const ex = execute(asm.program, { vlen })
  if (!ex.ok) throw new Error(ex.error.message)
  return { ex, result: simulate(ex.stream, parseMachine({ lanes, vlen })) }
}

const stripMine = (avl: number, sew: 32 | 64, lmul: 1 | 2 | 4) => `
    .data
    .balign 8
buf: .zero ${avl * 8}
    .text
    la a1, buf
    li a0, ${avl}
loop:
    vsetvli t0, a0, e${sew}, m${lmul}, ta, ma
    vle${sew}.v v8, (a1)
    vadd.vv v16, v8, v8
    vse${sew}.v v16, (a1)
    slli t1, t0, ${sew === 64 ? 3 : 2}
    add a1, a1, t1
    sub a0, a0, t0
    bnez a0, loop
    li a7, 93
    li a0, 0
    ecall
`

describe('text -> assemble -> execute -> simulate', () => {
  it.each([
    [100, 64, 1, 1024, 4],
    [1000, 32, 2, 2048, 8],
    [37, 64, 4, 512, 2],
  ] as const)('RISC-V V 1.0: vl of every traced instruction is min(AVL, VLMAX) (AVL %i, e%i, m%i, VLEN %i, %i lanes)', (avl, sew, lmul, vlen, lanes) => {
    const { result } = run(stripMine(avl, sew, lmul), vlen, lanes)
    expect(result.error).toBeUndefined()
    const vlmax = (lmul * vlen) / sew
    let left = avl
    for (const ins of result.trace.instructions) {
      if (ins.isConfig) {
        expect(ins.vl).toBe(Math.min(left, vlmax))
        continue
      }
      expect(ins.vl).toBe(Math.min(left, vlmax))
      if (ins.op.startsWith('vse')) left -= ins.vl
      for (let l = 0; l < lanes; l++) expect(laneTiming(result.trace, ins.index, l).elements).toBe(Math.max(0, Math.ceil((ins.vl - l) / lanes)))
    }
    expect(left).toBe(0)
  })

  it.each(readdirSync('examples').filter((f) => f.endsWith('.s')))('times the shipped example %s to completion', (file) => {
    const { result } = run(readFileSync(`examples/${file}`, 'utf8'), 8192, 8)
    expect(result.error).toBeUndefined()
    expect(result.trace.cycles).toBeGreaterThan(0)
    for (const ins of result.trace.instructions) expect(ins.complete).not.toBeNull()
  })
})
