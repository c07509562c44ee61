/**
 * Fused multiply-add rounds once (IEEE 754-2008 section 5.4.1,
 * fusedMultiplyAdd). The worked values are derived below by hand; each is also
 * in the QEMU corpus (tests/reference/qemu/programs/fma_rounding_*.s), where
 * QEMU gives the same bits.
 */
import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { BINARY32, BINARY64, bitsToF32, bitsToF64, exactFusedMultiplyAdd, f32ToBits, f64ToBits, fusedMultiplyAdd, NX, takeFlags } from '../../../shared/sim/exec/fp'

const p2 = (e: number): number => 2 ** e

describe('fusedMultiplyAdd in binary64 (IEEE 754-2008 fusedMultiplyAdd)', () => {
  it.each([
    // (1 + 2^-27)^2 = 1 + 2^-26 + 2^-54 exactly; minus (1 + 2^-26) leaves 2^-54.
    // Rounding the product first drops 2^-54 (below half an ulp of 1), giving 0.
    { name: '(1+2^-27)^2 - (1+2^-26)', a: 1 + p2(-27), b: 1 + p2(-27), c: -(1 + p2(-26)), fused: p2(-54), twice: 0 },
    // (1 + 2^-30)(1 + 2^-23) = 1 + 2^-23 + 2^-30 + 2^-53: the product alone is a tie and
    // rounds to even (down); with + 2^-54 the exact sum is above the tie and rounds up.
    { name: '(1+2^-30)(1+2^-23) + 2^-54', a: 1 + p2(-30), b: 1 + p2(-23), c: p2(-54), fused: 1 + p2(-23) + p2(-30) + p2(-52), twice: 1 + p2(-23) + p2(-30) },
    // 2 x 1e308 overflows when rounded alone; fused, 2e308 - 1e308 = 1e308 exactly.
    { name: '1e308 x 2 - 1e308', a: 1e308, b: 2, c: -1e308, fused: 1e308, twice: Infinity },
    // 2^-1000 x 2^-60 = 2^-1060 is a subnormal; + 2^-1074 (one ulp) is exact.
    { name: '2^-1000 x 2^-60 + 2^-1074', a: p2(-1000), b: p2(-60), c: p2(-1074), fused: p2(-1060) + p2(-1074), twice: p2(-1060) + p2(-1074) },
  ])('$name rounds once', ({ a, b, c, fused, twice }) => {
    expect(fusedMultiplyAdd(a, b, c, BINARY64)).toBe(fused)
    expect(a * b + c).toBe(twice) // what rounding twice gives, to show the case matters (or not)
  })

  it.each([
    { name: '+0 x 5 + -0 is +0', a: 0, b: 5, c: -0, expected: 0 },
    { name: '-0 x 0 + -0 is -0', a: -0, b: 0, c: -0, expected: -0 },
    { name: 'exact cancellation 1 x -1 + 1 is +0', a: 1, b: -1, c: 1, expected: 0 },
    { name: 'a product that underflows keeps its sign: -1e-300 x 1e-300 + 0 is -0', a: -1e-300, b: 1e-300, c: 0, expected: -0 },
    { name: 'inf x 1 + 5 is inf', a: Infinity, b: 1, c: 5, expected: Infinity },
    { name: '3 x 4 + -inf is -inf', a: 3, b: 4, c: -Infinity, expected: -Infinity },
  ])('$name (IEEE 754-2008 sections 6.1 and 6.3)', ({ a, b, c, expected }) => {
    expect(Object.is(fusedMultiplyAdd(a, b, c), expected)).toBe(true)
  })

  it.each([
    { name: 'inf x 0 + 1', a: Infinity, b: 0, c: 1 },
    { name: 'inf x 1 - inf', a: Infinity, b: 1, c: -Infinity },
    { name: 'NaN x 1 + 1', a: NaN, b: 1, c: 1 },
  ])('$name is NaN (invalid operation, IEEE 754-2008 section 7.2)', ({ a, b, c }) => {
    expect(fusedMultiplyAdd(a, b, c)).toBeNaN()
  })

  it('equals a x b + c whenever that is exact (small integers; common practice)', () => {
    fc.assert(
      fc.property(fc.integer({ min: -(2 ** 26), max: 2 ** 26 }), fc.integer({ min: -(2 ** 26), max: 2 ** 26 }), fc.integer({ min: -(2 ** 51), max: 2 ** 51 }), (a, b, c) => {
        expect(fusedMultiplyAdd(a, b, c)).toBe(a * b + c)
      }),
    )
  })
})

/**
 * An independent binary32 FMA: the product of two binary32 values is exact in
 * binary64; the sum rounded to odd in binary64 and then to binary32 is the
 * correctly rounded result, since 53 >= 24 + 2 (Boldo and Melquiond, "When
 * double rounding is odd", 2005).
 */
function fma32ByRoundToOdd(a: number, b: number, c: number): number {
  const p = a * b
  const s = p + c
  if (!Number.isFinite(s)) return Math.fround(s)
  const bp = s - c
  const err = p - bp + (c - (s - bp)) // TwoSum: s + err = p + c exactly
  if (err === 0 || s === 0) return Math.fround(s)
  const bits = f64ToBits(s)
  if ((bits & 1n) === 1n) return Math.fround(s)
  const awayFromZero = err > 0 === s > 0
  return Math.fround(bitsToF64(awayFromZero ? bits + 1n : bits - 1n))
}

describe('fusedMultiplyAdd in binary32', () => {
  it('(1+2^-12)^2 + 2^-60 rounds up past the binary32 tie, where rounding through binary64 first gives 1+2^-11', () => {
    const a = 1 + p2(-12)
    expect(fusedMultiplyAdd(a, a, p2(-60), BINARY32)).toBe(1 + p2(-11) + p2(-23))
    expect(Math.fround(a * a + p2(-60))).toBe(1 + p2(-11))
  })

  it('(1+2^-12)^2 - (1+2^-11) is 2^-24 (QEMU corpus element 0)', () => {
    const a = bitsToF32(0x3f800800)
    expect(f32ToBits(fusedMultiplyAdd(a, a, bitsToF32(0xbf801000), BINARY32))).toBe(0x33800000)
  })

  it('2^127 x 2 - 2^127 is 2^127 without overflow', () => {
    expect(fusedMultiplyAdd(p2(127), 2, -p2(127), BINARY32)).toBe(p2(127))
  })

  it('agrees with the round-to-odd construction on random binary32 operands', () => {
    const f32 = fc.integer({ min: 0, max: 0xffffffff }).map((bits) => bitsToF32(bits)).filter((x) => Number.isFinite(x))
    fc.assert(
      fc.property(f32, f32, f32, (a, b, c) => {
        const ours = fusedMultiplyAdd(a, b, c, BINARY32)
        const reference = fma32ByRoundToOdd(a, b, c)
        if (Number.isNaN(reference)) expect(ours).toBeNaN()
        else expect(Object.is(ours, reference)).toBe(true)
      }),
      { numRuns: 3000 },
    )
  })
})

/**
 * In RNE, common operands take a fast path of binary64 arithmetic (Dekker's
 * exact product, Knuth's TwoSum and rounding to odd: Boldo and Melquiond,
 * IEEE Trans. Computers 57(4), 2008). It must give the very bits and flags of
 * the exact BigInt path, which rounds the exact value once by the rules of
 * IEEE 754-2008 section 4.3 and is itself checked above and against QEMU.
 */
describe('the fast RNE path of fusedMultiplyAdd equals the exact path, bits and flags', () => {
  const call = (f: typeof fusedMultiplyAdd, a: number, b: number, c: number, fmt = BINARY64) => {
    takeFlags()
    const value = f(a, b, c, fmt)
    return { value, flags: takeFlags() }
  }
  const same = (a: number, b: number, c: number, fmt = BINARY64) => {
    const fast = call(fusedMultiplyAdd, a, b, c, fmt)
    const exact = call(exactFusedMultiplyAdd, a, b, c, fmt)
    if (Number.isNaN(exact.value)) expect(fast.value).toBeNaN()
    else expect(Object.is(fast.value, exact.value), `${a} x ${b} + ${c}: ${fast.value} vs ${exact.value}`).toBe(true)
    expect(fast.flags).toBe(exact.flags)
  }
  // Doubles of any exponent in [lo, hi], any significand and sign.
  const double = (lo: number, hi: number) =>
    fc.tuple(fc.boolean(), fc.integer({ min: lo, max: hi }), fc.integer({ min: 0, max: 2 ** 26 - 1 }), fc.integer({ min: 0, max: 2 ** 26 - 1 }))
      .map(([neg, e, h, l]) => (neg ? -1 : 1) * (1 + (h * 2 ** 26 + l) * 2 ** -52) * 2 ** e)

  it('on random binary64 operands across the exponent range, the fast one\'s edges included', () => {
    fc.assert(fc.property(double(-1074, 1023), double(-1074, 1023), double(-1074, 1023), (a, b, c) => same(a, b, c)), { numRuns: 4000 })
    fc.assert(fc.property(double(-470, 470), double(-470, 470), double(-920, 920), (a, b, c) => same(a, b, c)), { numRuns: 4000 })
  })

  it('when the addend nearly cancels the product (the sum keeps few bits), and with a zero addend', () => {
    fc.assert(
      fc.property(double(-60, 60), double(-60, 60), fc.integer({ min: -3, max: 3 }), (a, b, k) => {
        const p = a * b
        same(a, b, -p)
        same(a, b, -(p + k * Math.abs(p) * 2 ** -52))
        same(a, b, 0)
        same(a, b, -0)
      }),
      { numRuns: 3000 },
    )
  })

  it('(2^-53 (1+2^-27)) x (1-2^-27) + (1+2^-52) is 1+2^-52: the round-to-odd step, without which the sum lands on a tie and rounds up', () => {
    // Exact: 1 + 2^-52 + 2^-53 - 2^-107, just below the midpoint 1 + 2^-52 + 2^-53 of the
    // neighbours 1 + 2^-52 and 1 + 2^-51, so RN gives 1 + 2^-52. The product rounded alone is
    // 2^-53, and 1 + 2^-52 + 2^-53 is a tie that goes to the even 1 + 2^-51.
    const a = p2(-53) * (1 + p2(-27))
    const b = 1 - p2(-27)
    const c = 1 + p2(-52)
    expect(fusedMultiplyAdd(a, b, c)).toBe(1 + p2(-52))
    expect(a * b + c).toBe(1 + p2(-51))
    same(a, b, c)
  })

  it('near ties: (2^-53 (1+2^-m)) x (1-2^-m) + (1 + n 2^-52), either sign', () => {
    fc.assert(
      fc.property(fc.integer({ min: 27, max: 52 }), fc.integer({ min: 0, max: 2 ** 20 }), fc.boolean(), (m, n, neg) => {
        const s = neg ? -1 : 1
        same(s * p2(-53) * (1 + p2(-m)), 1 - p2(-m), s * (1 + n * p2(-52)))
        same(s * p2(-53) * (1 + p2(-m)), 1 + p2(-m), s * (1 + n * p2(-52)))
      }),
      { numRuns: 2000 },
    )
  })

  it('raises inexact exactly when the result is not a x b + c: 3 x 5 + 1 is exact, 0.1 x 3 + 0 is not', () => {
    expect(call(fusedMultiplyAdd, 3, 5, 1)).toEqual({ value: 16, flags: 0 })
    expect(call(fusedMultiplyAdd, 0.1, 3, 0).flags).toBe(NX)
  })

  it('on random binary32 operands, near cancellation included', () => {
    const f32 = fc.integer({ min: 0, max: 0xffffffff }).map((bits) => bitsToF32(bits)).filter((x) => Number.isFinite(x))
    fc.assert(
      fc.property(f32, f32, f32, (a, b, c) => {
        same(a, b, c, BINARY32)
        same(a, b, -Math.fround(a * b), BINARY32)
      }),
      { numRuns: 4000 },
    )
  })
})
