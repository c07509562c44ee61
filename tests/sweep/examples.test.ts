/**
 * The hand-written examples define AVL with `.equ` so that a sweep can vary the
 * vector length. Each defines it once, and the first vsetvli gives
 * vl = min(AVL, VLMAX) (RISC-V V 1.0 section 6.3) at AVL values below and above
 * its own. The compiled kernels are clang-16's output unchanged and are left out.
 */
import { readFileSync, readdirSync } from 'node:fs'
import { describe, expect, it } from 'vitest'
import { execute } from '../../shared/sim/exec/execute'
import { assemble } from '../../shared/sim/isa/assembler'
import { sweepableSymbol, withSymbols } from '../../shared/sweep/symbols'

const HAND_WRITTEN = readdirSync('examples').filter((f) => f.endsWith('.s') && !f.startsWith('compiled-'))
const VLEN = 8192
// VLMAX = LMUL x VLEN / SEW (RISC-V V 1.0 section 3.4.2) for each example's first vsetvli.
const VLMAX: Record<string, number> = {
  'bank-conflicts.s': VLEN / 64,
  'clamp.s': (8 * VLEN) / 32,
  'dot.s': VLEN / 64,
  'long-stream.s': (2 * VLEN) / 64,
  'reduction.s': (8 * VLEN) / 32,
  'saxpy.s': VLEN / 32,
  'stencil.s': (8 * VLEN) / 64,
  'stripmine.s': VLEN / 64,
}

function firstVl(text: string): number {
  const asm = assemble(text)
  if (!asm.ok) throw new Error(asm.errors[0]?.message)
  const run = execute(asm.program, { vlen: VLEN })
  if (!run.ok) throw new Error(run.error.message)
  return run.vlHistory[0] as number
}

describe('examples define a sweepable AVL', () => {
  it('covers every hand-written example', () => {
    expect(HAND_WRITTEN.sort()).toEqual(Object.keys(VLMAX).sort())
  })

  for (const file of HAND_WRITTEN) {
    it(`${file}: AVL defined once; vl = min(AVL, VLMAX) at its own value and at 1 (RISC-V V 1.0 section 6.3)`, () => {
      const text = readFileSync(`examples/${file}`, 'utf8')
      const def = sweepableSymbol(text, 'AVL')
      if (!def.ok) throw new Error(def.message)
      const own = Number(def.definition.value)
      const vlmax = VLMAX[file] as number
      expect(firstVl(text)).toBe(Math.min(own, vlmax))
      expect(firstVl(withSymbols(text, new Map([['AVL', 1]])))).toBe(1)
    })
  }

  it('long-stream.s and stripmine.s size their buffers by AVL, so AVL above VLMAX runs (vl = VLMAX)', () => {
    for (const [file, vlmax] of [['long-stream.s', 256], ['stripmine.s', 128]] as const) {
      const text = withSymbols(readFileSync(`examples/${file}`, 'utf8'), new Map([['AVL', 600]]))
      expect(firstVl(text)).toBe(vlmax)
    }
  })
})
