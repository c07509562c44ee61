/**
 * Typed elements out of bytes (registers, data memory) and the expected
 * values of a claim, both as bit patterns of the element's width, so that
 * 64-bit integers stay exact and floating point compares by ulps.
 */
import type { ElementType } from '../schemas/expectation'
import { bitsOf, ulpDistance, valueOf, type FloatFormat } from './ulp'

export const ELEMENT_BYTES: Record<ElementType, number> = { i8: 1, u8: 1, i16: 2, u16: 2, i32: 4, u32: 4, i64: 8, u64: 8, f32: 4, f64: 8 }

export function isFloat(type: ElementType): type is FloatFormat {
  return type === 'f32' || type === 'f64'
}

/** The little-endian bit patterns of `count` elements from `offset`. */
export function readBits(bytes: Uint8Array, offset: number, count: number, type: ElementType): bigint[] {
  const size = ELEMENT_BYTES[type]
  const out: bigint[] = []
  for (let i = 0; i < count; i++) {
    let v = 0n
    for (let k = size - 1; k >= 0; k--) v = (v << 8n) | BigInt(bytes[offset + i * size + k] ?? 0)
    out.push(v)
  }
  return out
}

/**
 * The bit pattern an expected text stands for, or a message. Decimal integers
 * must fit the type; hex text is a bit pattern of the element's width (so
 * 0xff is -1 as i8). FP text is rounded to the format.
 */
export function expectedBits(text: string, type: ElementType): bigint | string {
  const bits = ELEMENT_BYTES[type] * 8
  if (isFloat(type)) {
    const t = text.toLowerCase().replace(/^\+/, '')
    const v = /^-?inf(inity)?$/.test(t) ? (t.startsWith('-') ? -Infinity : Infinity) : /^-?nan$/.test(t) ? NaN : Number(t)
    if (Number.isNaN(v) && !/nan$/.test(t)) return `"${text}" is not a number`
    return bitsOf(v, type)
  }
  if (!/^[+-]?(\d+|0x[0-9a-f]+)$/i.test(text)) return `"${text}" is not an integer`
  const negative = text.startsWith('-')
  const magnitude = BigInt(text.replace(/^[+-]/, ''))
  if (/0x/i.test(text)) {
    if (magnitude >= 1n << BigInt(bits)) return `${text} is wider than ${bits} bits`
    return BigInt.asUintN(bits, negative ? -magnitude : magnitude)
  }
  const v = negative ? -magnitude : magnitude
  const signed = type.startsWith('i')
  const min = signed ? -(1n << BigInt(bits - 1)) : 0n
  const max = signed ? (1n << BigInt(bits - 1)) - 1n : (1n << BigInt(bits)) - 1n
  if (v < min || v > max) return `${text} is outside the range of ${type} (${min}..${max})`
  return BigInt.asUintN(bits, v)
}

/** An element as people write it: signed or unsigned decimal, or the FP value (NaN, Infinity, -0 spelled out). */
export function elementText(bits: bigint, type: ElementType): string {
  if (isFloat(type)) {
    const v = valueOf(bits, type)
    return Object.is(v, -0) ? '-0' : String(v)
  }
  const width = ELEMENT_BYTES[type] * 8
  return (type.startsWith('i') ? BigInt.asIntN(width, bits) : BigInt.asUintN(width, bits)).toString()
}

/** Whether a measured element matches the expected one: same bits for integers, within `ulps` for FP (NaN matches NaN). */
export function elementMatches(measured: bigint, expected: bigint, type: ElementType, ulps: number): { match: boolean; ulps: bigint | null } {
  if (!isFloat(type)) return { match: measured === expected, ulps: null }
  const d = ulpDistance(measured, expected, type)
  if (d === null) {
    const bothNaN = Number.isNaN(valueOf(measured, type)) && Number.isNaN(valueOf(expected, type))
    return { match: bothNaN, ulps: null }
  }
  return { match: d <= BigInt(ulps), ulps: d }
}
