/**
 * Distance in units in the last place between two IEEE 754 binary32 or
 * binary64 values, read from their bit patterns: the count of representable
 * values from one to the other. The patterns are mapped to a line of integers
 * ordered like the values (negative ones mirrored below zero), so +0 and -0
 * both sit at 0 (distance 0, as IEEE 754 equality says), the largest finite
 * value is 1 from infinity, and the smallest subnormals of either sign are 2
 * apart. NaN has no place on the line: its distance is null.
 *
 * @example
 *   ulpDistance(bitsOf(1, 'f64'), bitsOf(1 + 2 ** -52, 'f64'), 'f64') // 1n
 */
export type FloatFormat = 'f32' | 'f64'

const WIDTH: Record<FloatFormat, bigint> = { f32: 32n, f64: 64n }

/** The bit pattern of `x` rounded to the format (binary32: round to nearest even, as Math.fround). */
export function bitsOf(x: number, format: FloatFormat): bigint {
  const view = new DataView(new ArrayBuffer(8))
  if (format === 'f32') {
    view.setFloat32(0, x)
    return BigInt(view.getUint32(0))
  }
  view.setFloat64(0, x)
  return view.getBigUint64(0)
}

/** The value of a bit pattern. */
export function valueOf(bits: bigint, format: FloatFormat): number {
  const view = new DataView(new ArrayBuffer(8))
  if (format === 'f32') {
    view.setUint32(0, Number(BigInt.asUintN(32, bits)))
    return view.getFloat32(0)
  }
  view.setBigUint64(0, BigInt.asUintN(64, bits))
  return view.getFloat64(0)
}

export function isNaNBits(bits: bigint, format: FloatFormat): boolean {
  return Number.isNaN(valueOf(bits, format))
}

function ordered(bits: bigint, format: FloatFormat): bigint {
  const w = WIDTH[format]
  const sign = 1n << (w - 1n)
  const b = BigInt.asUintN(Number(w), bits)
  return b & sign ? -(b & (sign - 1n)) : b
}

/** Ulps from `a` to `b` (patterns of the same format), or null when either is a NaN. */
export function ulpDistance(a: bigint, b: bigint, format: FloatFormat): bigint | null {
  if (isNaNBits(a, format) || isNaNBits(b, format)) return null
  const d = ordered(a, format) - ordered(b, format)
  return d < 0n ? -d : d
}
