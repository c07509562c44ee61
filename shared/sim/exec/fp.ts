/**
 * IEEE 754 binary32/binary64 arithmetic as RISC-V defines it, in the five
 * rounding modes of the F extension (RNE, the user-mode default, on the fast
 * path of JavaScript's own arithmetic; RTZ, RDN, RUP and RMM on exact BigInt
 * significands rounded once).
 *
 * - Every NaN result is the canonical NaN (RISC-V unprivileged spec, "NaN
 *   generation and propagation"): 0x7ff8000000000000 / 0x7fc00000.
 * - binary32 +, -, x, /, sqrt are computed in binary64 and rounded with
 *   Math.fround: binary64 has 53 >= 2 x 24 + 2 bits, which makes that double
 *   rounding innocuous for these operations (Figueroa, "When is double rounding
 *   innocuous?", 1995).
 * - Fused multiply-add is rounded once (IEEE 754-2008 fusedMultiplyAdd), for
 *   both formats: in RNE on common operands by exact transformations in
 *   binary64 and rounding to odd, otherwise exactly on BigInt significands.
 * - IEEE 754 exception flags (section 7) are raised into an accumulator that
 *   the scalar F/D handlers take after each instruction into fflags: rounding
 *   on the exact path raises inexact, overflow and underflow (tininess
 *   detected after rounding, as RISC-V specifies), the operations raise
 *   invalid and divide-by-zero. `exact = true` sends RNE through the exact
 *   path too, so that its flags are known.
 */

/** fflags bits (F extension, "Floating-Point Control and Status Register"): invalid, divide by zero, overflow, underflow, inexact. */
export const NV = 0x10
export const DZ = 0x08
export const OF = 0x04
export const UF = 0x02
export const NX = 0x01

// The flags raised since the last takeFlags(). Module state is safe here:
// execution is synchronous and a handler takes the flags it caused before
// the next instruction runs.
let accrued = 0

export function raiseFlags(flags: number): void {
  accrued |= flags
}

/** A signaling NaN's bits at width 32 or 64: exponent all ones, fraction non-zero, quiet bit (the fraction's top) clear. */
export function signalingNaN(bits: bigint, width: 32 | 64): boolean {
  const exp = width === 64 ? 0x7ff0000000000000n : 0x7f800000n
  const frac = width === 64 ? 0x000fffffffffffffn : 0x007fffffn
  const quiet = width === 64 ? 0x0008000000000000n : 0x00400000n
  return (bits & exp) === exp && (bits & frac) !== 0n && (bits & quiet) === 0n
}

/** The flags raised since the last call, cleared. */
export function takeFlags(): number {
  const f = accrued
  accrued = 0
  return f
}

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

/** Rounding modes by their rm/frm value (F extension, "Rounding modes"). */
export const RNE = 0
export const RTZ = 1
export const RDN = 2
export const RUP = 3
export const RMM = 4
export type RoundingMode = 0 | 1 | 2 | 3 | 4

/** Whether a value cut below its last kept bit moves away from zero, by mode. */
function roundsUp(mode: RoundingMode, negative: boolean, rest: bigint, half: bigint, odd: boolean, sticky: boolean): boolean {
  const inexact = rest !== 0n || sticky
  switch (mode) {
    case RNE: return rest > half || (rest === half && (sticky || odd))
    case RMM: return rest >= half
    case RTZ: return false
    case RDN: return negative && inexact
    case RUP: return !negative && inexact
  }
}

/** The largest finite value of a format. */
function maxFinite(fmt: FloatFormat): number {
  return (2 - 2 ** (1 - fmt.precision)) * 2 ** fmt.emax
}

/**
 * Rounds the exact value (-1)^negative x (magnitude + sticky) x 2^exponent to
 * the format in `mode`, with gradual underflow and overflow (to infinity or the
 * largest finite value, as the mode says). magnitude > 0; `sticky` says that
 * nonzero bits lie below magnitude's last bit (from a division or square root).
 */
export function roundExact(negative: boolean, magnitude: bigint, exponent: number, fmt: FloatFormat, mode: RoundingMode = RNE, sticky = false): number {
  const msb = exponent + bitLength(magnitude) - 1
  if (msb > fmt.emax) return overflow(negative, fmt, mode)
  // Tininess after rounding (RISC-V): only a value below 2^emin can be tiny.
  const tiny = msb < fmt.emin && tinyAfterRounding(negative, magnitude, exponent, msb - (fmt.precision - 1), fmt, mode, sticky)
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
    if (roundsUp(mode, negative, rest, half, (kept & 1n) === 1n, sticky)) kept += 1n
    keptExponent = lsb
    if (rest !== 0n || sticky) accrued |= tiny ? NX | UF : NX
  } else if (sticky) {
    accrued |= tiny ? NX | UF : NX
    // Everything kept is exact except the sticky tail, below half an ulp.
    if (roundsUp(mode, negative, 0n, 1n, (kept & 1n) === 1n, true)) kept += 1n
  }
  // kept < 2^(precision + 1) and the result is representable (or overflows to
  // infinity exactly when rounding carried past emax), so this product is exact.
  let value = Number(kept) * 2 ** keptExponent
  if (value > maxFinite(fmt)) return overflow(negative, fmt, mode)
  if (fmt === BINARY32) value = Math.fround(value)
  return negative ? -value : value
}

/**
 * Whether (-1)^negative x (magnitude + sticky) x 2^exponent, rounded to
 * `precision` bits at an unbounded exponent (bits below 2^lsb cut), lies
 * below 2^emin: RISC-V detects tininess after rounding; underflow is a tiny
 * result that is also inexact.
 */
function tinyAfterRounding(negative: boolean, magnitude: bigint, exponent: number, lsb: number, fmt: FloatFormat, mode: RoundingMode, sticky: boolean): boolean {
  let rounded = magnitude
  let roundedExp = exponent
  if (lsb > exponent) {
    const big = BigInt(lsb - exponent)
    rounded = magnitude >> big
    const rest = magnitude - (rounded << big)
    if (roundsUp(mode, negative, rest, 1n << (big - 1n), (rounded & 1n) === 1n, sticky)) rounded += 1n
    roundedExp = lsb
  } else if (sticky && roundsUp(mode, negative, 0n, 1n, (rounded & 1n) === 1n, true)) rounded += 1n
  return roundedExp + bitLength(rounded) - 1 < fmt.emin
}

/** IEEE 754 section 7.4: overflow gives infinity or the largest finite value, by mode and sign. */
function overflow(negative: boolean, fmt: FloatFormat, mode: RoundingMode): number {
  accrued |= OF | NX
  const toInf = mode === RNE || mode === RMM || (mode === RUP && !negative) || (mode === RDN && negative)
  const v = toInf ? Infinity : maxFinite(fmt)
  return negative ? -v : v
}

// Views of one binary64 for the round-to-odd step: words[0] is the low half of the bits (little-endian, checked in machine.ts).
const oddScratch = new Float64Array(1)
const oddWords = new Uint32Array(oddScratch.buffer)

/**
 * x rounded to odd (toward zero, then the last significand bit set if that was
 * inexact), from s = RN(x) and e = x - s != 0 exactly (TwoSum). |x| < |s|
 * when e and s differ in sign: then truncation is the next value toward zero.
 */
function roundToOdd(s: number, e: number): number {
  oddScratch[0] = s
  if (e > 0 !== s > 0) {
    // One ulp toward zero: the magnitude's bits less one (s != 0, so no borrow reaches the sign).
    if (oddWords[0] === 0) {
      oddWords[0] = 0xffffffff
      oddWords[1] = (oddWords[1] as number) - 1
    } else oddWords[0] = (oddWords[0] as number) - 1
  }
  oddWords[0] = (oddWords[0] as number) | 1
  return oddScratch[0] as number
}

// Veltkamp's split constant 2^27 + 1 and the ranges where the fast paths below need no exact arithmetic.
const SPLIT = 134217729
const FACTOR_MIN = 2 ** -450
const FACTOR_MAX = 2 ** 450
const ADDEND_MIN = 2 ** -900
const ADDEND_MAX = 2 ** 900
const F32_NORMAL_MIN = 2 ** -126
const F32_MAX = (2 - 2 ** -23) * 2 ** 127

/**
 * binary64 a x b + c in RNE on binary64 arithmetic alone (Boldo and Melquiond,
 * "Emulation of FMA and correctly rounded sums: proved algorithms using
 * rounding to odd", IEEE Trans. Computers 57(4), 2008; glibc's software fma
 * does the same): the product exactly as uh + ul (Dekker's TwoProduct with
 * Veltkamp's split), c + uh exactly as th + tl (Knuth's TwoSum), then
 * RN(th + RO(tl + ul)). With factors within 2^+-450 and the addend zero or
 * within 2^+-900 nothing overflows and every partial result is a normal
 * number (the exact result is a multiple of 2^-1006), which the proof needs.
 * Raises inexact; NaN: outside those ranges, left to the exact path.
 */
function fastFma64(a: number, b: number, c: number): number {
  const aa = Math.abs(a)
  const ab = Math.abs(b)
  const ac = Math.abs(c)
  if (!(aa >= FACTOR_MIN && aa <= FACTOR_MAX && ab >= FACTOR_MIN && ab <= FACTOR_MAX && (c === 0 || (ac >= ADDEND_MIN && ac <= ADDEND_MAX)))) return NaN
  const uh = a * b
  let t = SPLIT * a
  const ah = t - (t - a)
  const al = a - ah
  t = SPLIT * b
  const bh = t - (t - b)
  const bl = b - bh
  const ul = ah * bh - uh + ah * bl + al * bh + al * bl
  // A nonzero product plus a zero addend of either sign is the product.
  if (c === 0) {
    if (ul !== 0) accrued |= NX
    return uh
  }
  const th = c + uh
  let bb = th - c
  const tl = c - (th - bb) + (uh - bb)
  const s = tl + ul
  bb = s - tl
  const e = tl - (s - bb) + (ul - bb)
  const v = e === 0 ? s : roundToOdd(s, e)
  const z = th + v
  bb = z - th
  // Exact only if both the odd rounding and the last sum were (an inexact v means z cannot equal th + (tl + ul)).
  if (e !== 0 || th - (z - bb) + (v - bb) !== 0) accrued |= NX
  return z
}

/**
 * binary32 a x b + c in RNE: the product of two binary32 values is exact in
 * binary64, and the sum rounded to odd in binary64 then to binary32 is
 * correctly rounded, as 53 >= 24 + 2 (Boldo and Melquiond, "When double
 * rounding is odd", 2005). Results that are zero, not normal or past the
 * largest binary32 are left to the exact path (NaN), which knows their sign,
 * underflow and overflow.
 */
function fastFma32(a: number, b: number, c: number): number {
  const p = a * b
  if (p === 0 || !Number.isFinite(p) || !Number.isFinite(c)) return NaN
  const s = p + c
  const bb = s - p
  const e = p - (s - bb) + (c - bb)
  const v = e === 0 ? s : roundToOdd(s, e)
  const r = Math.fround(v)
  const ar = Math.abs(r)
  if (!(Math.abs(v) >= F32_NORMAL_MIN && ar <= F32_MAX)) return NaN
  if (e !== 0 || r !== v) accrued |= NX
  return r
}

/**
 * fusedMultiplyAdd(a, b, c) = a x b + c rounded once, in binary64 or binary32
 * (inputs are values of that format). NaN results are returned as NaN; the
 * caller stores the canonical NaN. Finite RNE operands in the common ranges
 * take a fast path of binary64 arithmetic; the rest the exact one.
 */
export function fusedMultiplyAdd(a: number, b: number, c: number, fmt: FloatFormat = BINARY64, mode: RoundingMode = RNE): number {
  if (mode === RNE) {
    const r = fmt === BINARY64 ? fastFma64(a, b, c) : fastFma32(a, b, c)
    if (r === r) return r
  }
  return exactFusedMultiplyAdd(a, b, c, fmt, mode)
}

/** fusedMultiplyAdd on exact BigInt significands, rounded once: every case, every mode. */
export function exactFusedMultiplyAdd(a: number, b: number, c: number, fmt: FloatFormat = BINARY64, mode: RoundingMode = RNE): number {
  // inf x 0 is invalid even when the addend is a quiet NaN (F extension, fused multiply-add).
  if ((a === 0 && (b === Infinity || b === -Infinity)) || (b === 0 && (a === Infinity || a === -Infinity))) accrued |= NV
  if (Number.isNaN(a) || Number.isNaN(b) || Number.isNaN(c)) return NaN
  const productNegative = (a < 0 || Object.is(a, -0)) !== (b < 0 || Object.is(b, -0))
  if (!Number.isFinite(a) || !Number.isFinite(b)) {
    if (a === 0 || b === 0) return NaN // inf x 0
    if (!Number.isFinite(c) && (c < 0) !== productNegative) {
      accrued |= NV // inf - inf
      return NaN
    }
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
    if (productNegative === dc.negative) return productNegative ? -0 : 0
    return mode === RDN ? -0 : 0
  }
  if (dc.significand === 0n) return roundExact(productNegative, product, productExponent, fmt, mode)
  const e0 = Math.min(productExponent, dc.exponent)
  const p = product << BigInt(productExponent - e0)
  const q = dc.significand << BigInt(dc.exponent - e0)
  const sum = (productNegative ? -p : p) + (dc.negative ? -q : q)
  if (sum === 0n) return mode === RDN ? -0 : 0 // exact cancellation: +0, or -0 rounding down (IEEE 754 section 6.3)
  return roundExact(sum < 0n, sum < 0n ? -sum : sum, e0, fmt, mode)
}

const isNeg = (x: number): boolean => x < 0 || Object.is(x, -0)

/**
 * a + b, a - b, a x b, a / b and sqrt(a) rounded once in `mode`. RNE uses the
 * platform's binary64 arithmetic (and Math.fround for binary32, innocuous as
 * noted above); the other modes compute on exact significands.
 */
export function arith(op: 'add' | 'sub' | 'mul' | 'div' | 'sqrt', a: number, b: number, fmt: FloatFormat, mode: RoundingMode, exact = false): number {
  const fast = op === 'add' ? a + b : op === 'sub' ? a - b : op === 'mul' ? a * b : op === 'div' ? a / b : Math.sqrt(a)
  const r = fmt === BINARY32 ? Math.fround(fast) : fast
  // A NaN made from numbers is an invalid operation (inf - inf, 0 x inf, 0/0, inf/inf, sqrt of a negative).
  if (Number.isNaN(r) && !Number.isNaN(a) && (op === 'sqrt' || !Number.isNaN(b))) accrued |= NV
  if (op === 'div' && b === 0 && a !== 0 && Number.isFinite(a)) accrued |= DZ
  // NaN results and infinite operands give exact special results in every mode.
  if ((mode === RNE && !exact) || Number.isNaN(r) || !Number.isFinite(a) || (op !== 'sqrt' && !Number.isFinite(b))) return r
  if (op === 'sqrt') {
    if (a === 0 || a < 0 || !Number.isFinite(a)) return r
    const da = decompose(a)
    // sqrt(s x 2^e): make e even and give the root 2 x precision + 2 bits.
    let sig = da.significand
    let e = da.exponent
    if (e % 2 !== 0) {
      sig <<= 1n
      e -= 1
    }
    const shift = 2 * (fmt.precision + 2)
    const n = sig << BigInt(shift)
    const root = isqrt(n)
    return roundExact(false, root, (e - shift) / 2, fmt, mode, root * root !== n)
  }
  if (op === 'add' || op === 'sub') {
    const bb = op === 'sub' ? -b : b
    // Zeros: a signed sum keeps the common sign; opposite signs give +0, or -0 rounding down (IEEE 754 section 6.3).
    if (a === 0 && bb === 0) return isNeg(a) === isNeg(bb) ? a : mode === RDN ? -0 : 0
    if (!Number.isFinite(fast)) return overflow(fast < 0, fmt, mode)
    const da = decompose(a)
    const db = decompose(bb)
    const e0 = Math.min(da.exponent, db.exponent)
    const p = da.significand << BigInt(da.exponent - e0)
    const q = db.significand << BigInt(db.exponent - e0)
    const sum = (da.negative ? -p : p) + (db.negative ? -q : q)
    if (sum === 0n) return mode === RDN ? -0 : 0
    return roundExact(sum < 0n, sum < 0n ? -sum : sum, e0, fmt, mode)
  }
  const negative = isNeg(a) !== isNeg(b)
  if (op === 'mul') {
    if (!Number.isFinite(fast)) return overflow(negative, fmt, mode)
    if (a === 0 || b === 0) return negative ? -0 : 0
    const da = decompose(a)
    const db = decompose(b)
    return roundExact(negative, da.significand * db.significand, da.exponent + db.exponent, fmt, mode)
  }
  if (b === 0 || a === 0) return r
  if (!Number.isFinite(fast)) return overflow(negative, fmt, mode)
  const da = decompose(a)
  const db = decompose(b)
  // Quotient with at least precision + 2 bits, the remainder as the sticky bit.
  const shift = fmt.precision + 3 + Math.max(0, bitLength(db.significand) - bitLength(da.significand))
  const num = da.significand << BigInt(shift)
  const q = num / db.significand
  return roundExact(negative, q, da.exponent - db.exponent - shift, fmt, mode, q * db.significand !== num)
}

/** floor(sqrt(n)): Newton's iteration from a power of two above the root, which decreases to it. */
function isqrt(n: bigint): bigint {
  if (n < 2n) return n
  let x = 1n << BigInt(Math.ceil(bitLength(n) / 2))
  for (;;) {
    const y = (x + n / x) >> 1n
    if (y >= x) return x
    x = y
  }
}

/** A binary64 value converted to binary32 in `mode` (fcvt.s.d, vfncvt.f.f.w). */
export function toBinary32(x: number, mode: RoundingMode, exact = false): number {
  if ((mode === RNE && !exact) || !Number.isFinite(x) || x === 0) return Math.fround(x)
  const d = decompose(x)
  return roundExact(d.negative, d.significand, d.exponent, BINARY32, mode)
}

/** An integer (BigInt) converted to a float format in `mode` (fcvt.s.w, fcvt.d.l, ...). */
export function intToFloat(v: bigint, fmt: FloatFormat, mode: RoundingMode): number {
  if (v === 0n) return 0
  return roundExact(v < 0n, v < 0n ? -v : v, 0, fmt, mode)
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

/** Round to an integer in `mode`. */
export function roundToInteger(x: number, mode: RoundingMode): number {
  switch (mode) {
    case RNE: return roundTiesEven(x)
    case RTZ: return Math.trunc(x)
    case RDN: return Math.floor(x)
    case RUP: return Math.ceil(x)
    case RMM: return x < 0 ? -Math.round(-x) : Math.round(x)
  }
}

/**
 * Float to integer with the RISC-V saturation rules (unprivileged spec, table
 * "Domains of float-to-integer conversions"): NaN and +inf give the largest
 * value, -inf the smallest, out-of-range values saturate. Returns a BigInt.
 * `truncate` is the rtz forms; otherwise `mode` rounds (default RNE).
 */
export function floatToInt(x: number, bits: number, signed: boolean, truncate: boolean, mode: RoundingMode = RNE): bigint {
  const max = signed ? (1n << BigInt(bits - 1)) - 1n : (1n << BigInt(bits)) - 1n
  const min = signed ? -(1n << BigInt(bits - 1)) : 0n
  if (Number.isNaN(x)) {
    accrued |= NV
    return max
  }
  const r = roundToInteger(x, truncate ? RTZ : mode)
  if (r === Infinity || r === -Infinity) {
    accrued |= NV
    return r > 0 ? max : min
  }
  const v = BigInt(r)
  if (v > max || v < min) {
    accrued |= NV // out of range: invalid, not inexact (unprivileged spec, float-to-integer conversions)
    return v > max ? max : min
  }
  if (r !== x) accrued |= NX
  return v
}
