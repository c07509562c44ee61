/**
 * vl and VLMAX: RISC-V "V" extension 1.0, section 3.4.2 (VLMAX = LMUL x VLEN /
 * SEW), section 6.3 (vl = AVL when AVL <= VLMAX, VLMAX when AVL >= 2 x VLMAX;
 * Chimeline takes min(AVL, VLMAX) in between, as the section allows) and
 * section 6.2 (rs1 = x0: VLMAX, or keep vl when rd = x0 too).
 */
import { describe, expect, it } from 'vitest'
import { execute } from '../../../shared/sim/exec/execute'
import { computeVl, decodeVtype, isValidVlen } from '../../../shared/sim/exec/vtype'
import { vlmax } from '../../../shared/sim/isa/vtype'
import { program } from './helpers'

describe('VLMAX = LMUL x VLEN / SEW (V 1.0 section 3.4.2)', () => {
  it.each([
    { vlen: 128, sew: 32, lmul: 1, max: 4 },
    { vlen: 128, sew: 8, lmul: 8, max: 128 },
    { vlen: 16384, sew: 64, lmul: 1, max: 256 },
    { vlen: 65536, sew: 8, lmul: 8, max: 65536 },
    { vlen: 64, sew: 8, lmul: 0.125, max: 1 },
    { vlen: 512, sew: 16, lmul: 0.25, max: 8 },
  ] as const)('VLEN $vlen, SEW $sew, LMUL $lmul gives $max', ({ vlen, sew, lmul, max }) => {
    expect(vlmax(vlen, sew, lmul)).toBe(max)
  })
})

describe('vl = min(AVL, VLMAX) (V 1.0 section 6.3)', () => {
  it.each([
    { avl: 0n, max: 4, vl: 0 },
    { avl: 3n, max: 4, vl: 3 },
    { avl: 4n, max: 4, vl: 4 },
    { avl: 5n, max: 4, vl: 4 }, // VLMAX < AVL < 2 VLMAX: the spec allows ceil(AVL/2)..VLMAX; we take VLMAX
    { avl: 8n, max: 4, vl: 4 }, // AVL >= 2 VLMAX: the spec requires VLMAX
    { avl: (1n << 64n) - 1n, max: 256, vl: 256 }, // AVL is an unsigned XLEN value
  ])('AVL $avl with VLMAX $max gives vl $vl', ({ avl, max, vl }) => {
    expect(computeVl(avl, max)).toBe(vl)
  })

  it('vsetvli returns vl in rd and the history records every strip (strip-mined AVL 10 at VLMAX 4)', () => {
    const p = program(`
      li a0, 10
    loop:
      vsetvli t0, a0, e32, m1, ta, ma
      sub a0, a0, t0
      bnez a0, loop
    `)
    const r = execute(p, { vlen: 128 })
    if (!r.ok) throw new Error(r.error.message)
    expect(r.vlHistory).toEqual([4, 4, 2])
  })

  it.each([
    { form: 'vsetvli t0, zero, e16, m2', expected: [16] }, // rd != x0, rs1 = x0: VLMAX
    { form: 'vsetvli zero, zero, e64, m1', expected: [2] }, // both x0: keep vl 5, limited to the new VLMAX 2 (as QEMU)
  ])('$form after vl = 5 gives vl $expected (V 1.0 section 6.2)', ({ form, expected }) => {
    const r = execute(program(`li a0, 5\n vsetvli t1, a0, e32, m1\n ${form}`), { vlen: 128 })
    if (!r.ok) throw new Error(r.error.message)
    expect(r.vlHistory.slice(1)).toEqual(expected)
  })
})

describe('vtype decoding and vill (V 1.0 sections 3.4 and 3.4.4)', () => {
  it('decodes vlmul in bits 2:0, vsew in 5:3, vta bit 6 and vma bit 7', () => {
    expect(decodeVtype(0b11_010_001n)).toMatchObject({ vill: false, sew: 32, lmul: 2, ta: true, ma: true })
  })

  it.each([
    { what: 'vsew = 4 (SEW 128, reserved)', raw: 0b100_000n },
    { what: 'vlmul = 4 (reserved)', raw: 0b000_100n },
    { what: 'a reserved bit above vma', raw: 1n << 8n },
    { what: 'e64 with LMUL 1/2 (SEW > LMUL x ELEN)', raw: 0b011_111n },
    { what: 'e16 with LMUL 1/8 (SEW > LMUL x ELEN)', raw: 0b001_101n },
  ])('sets vill for $what', ({ raw }) => {
    expect(decodeVtype(raw).vill).toBe(true)
  })

  it('an unsupported vtype from vsetvl gives vl = 0 in rd', () => {
    const r = execute(program('li t3, 0x20\n li a0, 9\n vsetvl t0, a0, t3'), { vlen: 256 })
    if (!r.ok) throw new Error(r.error.message)
    expect(r.vlHistory).toEqual([0])
    expect(r.x[5]).toBe(0n)
    expect(r.vtype.vill).toBe(true)
  })

  it.each([64, 128, 1024, 65536])('accepts VLEN %i', (vlen) => expect(isValidVlen(vlen)).toBe(true))
  it.each([0, 32, 96, 131072, 100.5])('rejects VLEN %d', (vlen) => expect(isValidVlen(vlen)).toBe(false))
})
