import { describe, expect, it } from 'vitest'
import { assemble } from '../../../shared/sim/isa/assembler'
import { decodeVtype, encodeVtype, formatVtype, vlmax } from '../../../shared/sim/isa/vtype'
import type { Lmul, Sew } from '../../../shared/sim/isa/types'

describe('RISC-V V 1.0 section 3.4.1: vtype bit layout (vlmul 2:0, vsew 5:3, vta 6, vma 7)', () => {
  it.each([
    [0.125, 0b101], [0.25, 0b110], [0.5, 0b111], [1, 0b000], [2, 0b001], [4, 0b010], [8, 0b011],
  ] as [Lmul, number][])('LMUL %s is vlmul %i in bits 2:0', (lmul, vlmul) => {
    expect(encodeVtype({ sew: 8, lmul, ta: false, ma: false })).toBe(vlmul)
  })

  it.each([[8, 0], [16, 1], [32, 2], [64, 3]] as [Sew, number][])('SEW %i is vsew %i in bits 5:3', (sew, vsew) => {
    expect(encodeVtype({ sew, lmul: 1, ta: false, ma: false })).toBe(vsew << 3)
  })

  it('puts vta in bit 6 and vma in bit 7', () => {
    expect(encodeVtype({ sew: 8, lmul: 1, ta: true, ma: false })).toBe(1 << 6)
    expect(encodeVtype({ sew: 8, lmul: 1, ta: false, ma: true })).toBe(1 << 7)
  })

  it('round-trips every legal setting and treats reserved ones as vill', () => {
    for (let bits = 0; bits < 256; bits++) {
      const v = decodeVtype(bits)
      const reserved = (bits & 7) === 4 || (bits >> 3 & 7) >= 4
      expect(v === undefined).toBe(reserved)
      if (v) expect(encodeVtype(v)).toBe(bits)
    }
    expect(decodeVtype(0x100)).toBeUndefined() // bits above 7 are reserved in vtypei
  })

  it('prints vtype the way the assembler syntax writes it (spec 6.1)', () => {
    expect(formatVtype({ sew: 32, lmul: 4, ta: true, ma: true })).toBe('e32,m4,ta,ma')
    expect(formatVtype({ sew: 8, lmul: 0.125, ta: false, ma: false })).toBe('e8,mf8,tu,mu')
  })
})

describe('RISC-V V 1.0 section 3.4.2: VLMAX = LMUL x VLEN / SEW', () => {
  it.each([
    [128, 32, 1, 4], [128, 8, 8, 128], [16384, 64, 8, 2048], [1024, 32, 8, 256], [512, 8, 0.125, 8], [65536, 8, 8, 65536],
  ] as [number, Sew, Lmul, number][])('VLEN %i, SEW %i, LMUL %s: VLMAX %i', (vlen, sew, lmul, want) => {
    expect(vlmax(vlen, sew, lmul)).toBe(want)
  })
})

describe('RISC-V V 1.0 section 3.4.2: register groups must be aligned to LMUL', () => {
  const cases: [string, number, boolean][] = []
  for (const [m, lmul] of [['m2', 2], ['m4', 4], ['m8', 8], ['mf2', 0.5], ['m1', 1]] as const) {
    for (const reg of [0, 1, 2, 3, 4, 6, 8, 12, 16, 24, 30]) cases.push([m, reg, lmul < 1 || reg % lmul === 0])
  }
  it.each(cases)('with %s, v%i as vd is %s', (m, reg, valid) => {
    const r = assemble(`vsetvli t0, a0, e32, ${m}\nvadd.vi v${reg}, v0, 1\n`)
    expect(r.ok).toBe(valid)
    if (!r.ok) expect(r.errors[0]).toMatchObject({ line: 2, column: 9, code: 'lmul-align' })
  })
})
