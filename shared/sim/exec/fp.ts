/**
 * IEEE 754 binary32/binary64 arithmetic as RISC-V defines it, in round to
 * nearest, ties to even (frm = RNE, the user-mode default).
 *
 * - Every NaN result is the canonical NaN (RISC-V unprivileged spec, "NaN
 *   generation and propagation"): 0x7ff8000000000000 / 0x7fc00000.
 * - binary32 +, -, x, /, sqrt are computed in binary64 and rounded with
 *   Math.fround: binary64 has 53 >= 2 x 24 + 2 bits, which makes that double
 *   rounding innocuous for these operations (Figueroa, "When is double rounding
 *   innocuous?", 1995).
 * - Fused multiply-add is computed exactly on BigInt significands and rounded
 *   once (IEEE 754-2008 fusedMultiplyAdd), for both formats.
 */

export interface FloatFormat {
  /** Significand precision in bits, hidden bit included. */
  precision: number
  /** Exponent of the smallest normal number. */
  emin: number
  /** Exponent of the largest finite number. */
  emax: number
}

export const BINARY64: FloatFormat = { precision: 53, emin: -1022, emax: 1023 }
export const BINARY32: FloatFormat = { precision: 24, emin: -126, emax: 127 }

export const CANONICAL_NAN64 = 0x7ff8000000000000n
export const CANONICAL_NAN32 = 0x7fc00000

const scratch = new DataView(new ArrayBuffer(8))

export function f64ToBits(x: number): bigint {
  scratch.setFloat64(0, x, true)
  return scratch.getBigUint64(0, true)
}

export function bitsToF64(bits: bigint): number {
  scratch.setBigUint64(0, BigInt.asUintN(64, bits), true)
  return scratch.getFloat64(0, true)
}

export function f32ToBits(x: number): number {
  scratch.setFloat32(0, x, true)
  return scratch.getUint32(0, true)
}

export function bitsToF32(bits: number): number {
  scratch.setUint32(0, bits >>> 0, true)
  return scratch.getFloat32(0, true)
}

/** A finite binary64 value as (-1)^negative x significand x 2^exponent, exactly. */
interface Decomposed {
  negative: boolean
  significand: bigint
  exponent: number
}

function decompose(x: number): Decomposed {
  scratch.setFloat64(0, x, true)
  const hi = scratch.getUint32(4, true)
  const lo = scratch.getUint32(0, true)
  const biased = (hi >>> 20) & 0x7ff
  const fraction = (BigInt(hi & 0xfffff) << 32n) | BigInt(lo)
  const negative = hi >>> 31 === 1
  if (biased === 0) return { negative, significand: fraction, exponent: -1074 }
  return { negative, significand: fraction | (1n << 52n), exponent: biased - 1075 }
}

function bitLength(n: bigint): number {
  return n === 0n ? 0 : n.toString(2).length
}

/**
 * Rounds the exact value (-1)^negative x magnitude x 2^exponent to the format,
 * ties to even, with gradual underflow and overflow to infinity. magnitude > 0.
 */
export function roundExact(negative: boolean, magnitude: bigint, exponent: number, fmt: FloatFormat): number {
  const msb = exponent + bitLength(magnitude) - 1
  if (msb > fmt.emax) return negative ? -Infinity : Infinity
  // Exponent of the last significand bit kept: normal numbers keep `precision`
  // bits, subnormals stop at emin - (precision - 1).
  const lsb = Math.max(msb - (fmt.precision - 1), fmt.emin - (fmt.precision - 1))
  let kept = magnitude
  let keptExponent = exponent
  const shift = lsb - exponent
  if (shift > 0) {
    const big = BigInt(shift)
    kept = magnitude >> big
    const rest = magnitude - (kept << big)
    const half = 1n << (big - 1n)
    if (rest > half || (rest === half && (kept & 1n) === 1n)) kept += 1n
    keptExponent = lsb
  }
  // kept < 2^(precision + 1) and the result is representable (or overflows to
  // infinity exactly when rounding carried past emax), so this product is exact.
  let value = Number(kept) * 2 ** keptExponent
  if (fmt === BINARY32) value = Math.fround(value)
  return negative ? -value : value
}

/**
 * fusedMultiplyAdd(a, b, c) = a x b + c rounded once, in binary64 or binary32
 * (inputs are values of that format). NaN results are returned as NaN; the
 * caller stores the canonical NaN.
 */
export function fusedMultiplyAdd(a: number, b: number, c: number, fmt: FloatFormat = BINARY64): number {
  if (Number.isNaN(a) || Number.isNaN(b) || Number.isNaN(c)) return NaN
  const productNegative = (a < 0 || Object.is(a, -0)) !== (b < 0 || Object.is(b, -0))
  if (!Number.isFinite(a) || !Number.isFinite(b)) {
    if (a === 0 || b === 0) return NaN // inf x 0
    if (!Number.isFinite(c) && (c < 0) !== productNegative) return NaN // inf - inf
    return productNegative ? -Infinity : Infinity
  }
  if (!Number.isFinite(c)) return c
  const da = decompose(a)
  const db = decompose(b)
  const dc = decompose(c)
  const product = da.significand * db.significand
  const productExponent = da.exponent + db.exponent
  if (product === 0n) {
    // Exact zero product: the sum is c, except for the sign of 0 + 0 (RNE: -0 only if both are -0).
    if (c !== 0) return c
    return productNegative && dc.negative ? -0 : 0
  }
  if (dc.significand === 0n) return roundExact(productNegative, product, productExponent, fmt)
  const e0 = Math.min(productExponent, dc.exponent)
  const p = product << BigInt(productExponent - e0)
  const q = dc.significand << BigInt(dc.exponent - e0)
  const sum = (productNegative ? -p : p) + (dc.negative ? -q : q)
  if (sum === 0n) return 0 // exact cancellation gives +0 in RNE
  return roundExact(sum < 0n, sum < 0n ? -sum : sum, e0, fmt)
}

/** IEEE 754-2019 minimumNumber / maximumNumber, as RISC-V fmin/fmax (F extension 2.2): -0 < +0; one NaN yields the other operand. */
export function minimumNumber(a: number, b: number): number {
  if (Number.isNaN(a)) return b
  if (Number.isNaN(b)) return a
  if (a === 0 && b === 0) return Object.is(a, -0) || Object.is(b, -0) ? -0 : 0
  return a < b ? a : b
}

export function maximumNumber(a: number, b: number): number {
  if (Number.isNaN(a)) return b
  if (Number.isNaN(b)) return a
  if (a === 0 && b === 0) return Object.is(a, 0) || Object.is(b, 0) ? 0 : -0
  return a > b ? a : b
}

/** Round to an integer, ties to even (frm = RNE). */
export function roundTiesEven(x: number): number {
  const r = Math.round(x) // ties toward +infinity
  return r - x === 0.5 && r % 2 !== 0 ? r - 1 : r
}

/**
 * Float to integer with the RISC-V saturation rules (unprivileged spec, table
 * "Domains of float-to-integer conversions"): NaN and +inf give the largest
 * value, -inf the smallest, out-of-range values saturate. Returns a BigInt.
 */
export function floatToInt(x: number, bits: number, signed: boolean, truncate: boolean): bigint {
  const max = signed ? (1n << BigInt(bits - 1)) - 1n : (1n << BigInt(bits)) - 1n
  const min = signed ? -(1n << BigInt(bits - 1)) : 0n
  if (Number.isNaN(x)) return max
  const r = truncate ? Math.trunc(x) : roundTiesEven(x)
  if (r === Infinity) return max
  if (r === -Infinity) return min
  const v = BigInt(r)
  if (v > max) return max
  if (v < min) return min
  return v
}
