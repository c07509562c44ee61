/**
 * Element access at any element width, as BigInt: what the widening,
 * narrowing, extending, carry and fixed-point instructions share. Slower than
 * the typed-array loops of vint.ts, but one code path for every EEW pair.
 */
import type { Sew } from '../isa/types'
import type { ArchState } from './machine'

/** Element i of the register group starting at `reg`, read as an EEW-bit signed or unsigned integer. */
export function readElem(m: ArchState, reg: number, eew: Sew, i: number, signed: boolean): bigint {
  const at = m.base(reg, eew) + i
  switch (eew) {
    case 8: return BigInt(signed ? m.i8[at]! : m.u8[at]!)
    case 16: return BigInt(signed ? m.i16[at]! : m.u16[at]!)
    case 32: return BigInt(signed ? m.i32[at]! : m.u32[at]!)
    default: return signed ? m.i64[at]! : m.u64[at]!
  }
}

/** Writes the low EEW bits of `value` to element i of the group at `reg`. */
export function writeElem(m: ArchState, reg: number, eew: Sew, i: number, value: bigint): void {
  const at = m.base(reg, eew) + i
  switch (eew) {
    case 8: m.u8[at] = Number(BigInt.asUintN(8, value)); return
    case 16: m.u16[at] = Number(BigInt.asUintN(16, value)); return
    case 32: m.u32[at] = Number(BigInt.asUintN(32, value)); return
    default: m.u64[at] = BigInt.asUintN(64, value)
  }
}

/**
 * Fixed-point rounding increment (V 1.0 section 12.1, "roundoff"): the bit to
 * add after shifting `v` right by `d` bits, by vxrm (0 rnu, 1 rne, 2 rdn, 3 rod).
 */
export function roundingIncrement(v: bigint, d: bigint, vxrm: number): bigint {
  if (d === 0n) return 0n
  const bit = (k: bigint): bigint => (v >> k) & 1n
  const below = (k: bigint): boolean => (v & ((1n << k) - 1n)) !== 0n // bits k-1..0
  switch (vxrm) {
    case 0: return bit(d - 1n)
    case 1: return bit(d - 1n) & (below(d - 1n) || bit(d) === 1n ? 1n : 0n)
    case 2: return 0n
    default: return bit(d) === 0n && below(d) ? 1n : 0n
  }
}

/** (v >> d) rounded by vxrm: the "roundoff_signed/unsigned" of section 12.1 (BigInt >> floors, as an arithmetic shift). */
export function roundoff(v: bigint, d: bigint, vxrm: number): bigint {
  return (v >> d) + roundingIncrement(v, d, vxrm)
}
