/**
 * Ulp distance on hand-made IEEE 754 values. The bit patterns are written out
 * from the binary32/binary64 layouts of IEEE 754-2008 section 3.4 (sign,
 * biased exponent, trailing significand), not computed by the code under test.
 */
import { describe, expect, it } from 'vitest'
import { bitsOf, ulpDistance } from '../../shared/expectations/ulp'

const f64 = (hex: string) => BigInt(`0x${hex}`)
const f32 = (hex: string) => BigInt(`0x${hex}`)

describe('ulp distance (IEEE 754-2008 binary64 and binary32 encodings)', () => {
  it('reads the patterns of 1.0 as IEEE 754 lays them out (exponent bias 1023 and 127)', () => {
    expect(bitsOf(1, 'f64')).toBe(f64('3ff0000000000000'))
    expect(bitsOf(1, 'f32')).toBe(f32('3f800000'))
    expect(bitsOf(-2, 'f64')).toBe(f64('c000000000000000'))
  })

  it.each([
    ['1.0 and the next binary64 up, 1 + 2^-52', f64('3ff0000000000000'), f64('3ff0000000000001'), 1n],
    ['1.0 and the binary64 below it, 1 - 2^-53 (the spacing halves below a power of two)', f64('3ff0000000000000'), f64('3fefffffffffffff'), 1n],
    ['+0 and -0 (equal under IEEE 754 comparison)', f64('0000000000000000'), f64('8000000000000000'), 0n],
    ['+0 and the smallest subnormal 2^-1074', f64('0000000000000000'), f64('0000000000000001'), 1n],
    ['the smallest subnormals of either sign, across zero', f64('8000000000000001'), f64('0000000000000001'), 2n],
    ['the largest subnormal and the smallest normal 2^-1022', f64('000fffffffffffff'), f64('0010000000000000'), 1n],
    ['the largest finite binary64 and +Infinity', f64('7fefffffffffffff'), f64('7ff0000000000000'), 1n],
    ['1.0 and 2.0: 2^52 values of the binade [1, 2)', f64('3ff0000000000000'), f64('4000000000000000'), 1n << 52n],
  ])('binary64: %s is %s ulps', (_what, a, b, d) => {
    expect(ulpDistance(a, b, 'f64')).toBe(d)
    expect(ulpDistance(b, a, 'f64')).toBe(d)
  })

  it.each([
    ['1.0f and 1 + 2^-23', f32('3f800000'), f32('3f800001'), 1n],
    ['-1.0f and -(1 + 2^-23)', f32('bf800000'), f32('bf800001'), 1n],
    ['+0 and -0', f32('00000000'), f32('80000000'), 0n],
    ['the largest finite binary32 and +Infinity', f32('7f7fffff'), f32('7f800000'), 1n],
    ['1.0f and 2.0f: 2^23 values', f32('3f800000'), f32('40000000'), 1n << 23n],
  ])('binary32: %s is %s ulps', (_what, a, b, d) => {
    expect(ulpDistance(a, b, 'f32')).toBe(d)
  })

  it('has no distance to a NaN (quiet NaN 0x7ff8000000000000, 0x7fc00000)', () => {
    expect(ulpDistance(f64('7ff8000000000000'), f64('3ff0000000000000'), 'f64')).toBeNull()
    expect(ulpDistance(f32('7fc00000'), f32('7fc00000'), 'f32')).toBeNull()
  })

  it('puts 0.1 + 0.2 one ulp above the binary64 nearest 0.3 (IEEE 754 round to nearest; ECMAScript numbers are binary64)', () => {
    // 0.3 is 0x3FD3333333333333 and 0.1 + 0.2 rounds to 0x3FD3333333333334 (worked by hand, from memory; the
    // patterns are checked here against the language's own binary64 arithmetic, which is not ours).
    expect(bitsOf(0.3, 'f64')).toBe(f64('3fd3333333333333'))
    expect(bitsOf(0.1 + 0.2, 'f64')).toBe(f64('3fd3333333333334'))
    expect(ulpDistance(bitsOf(0.1 + 0.2, 'f64'), bitsOf(0.3, 'f64'), 'f64')).toBe(1n)
  })
})
