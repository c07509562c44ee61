/**
 * The vtype CSR as execution sees it (RISC-V "V" extension 1.0, section 3.4
 * "Vector type register, vtype", and section 6 "Configuration-Setting
 * Instructions"): the field layout comes from the isa module, vill and the vl
 * rule are decided here.
 */
import { decodeVtype as decodeFields, type Vtype as VtypeFields } from '../isa/vtype'

/** The largest element width this implementation supports (ELEN). */
export const ELEN = 64

export interface Vtype extends VtypeFields {
  /** true when the requested configuration is unsupported: vl = 0 and vector instructions are illegal. */
  vill: boolean
  /** The vtype CSR value: the vtypei bits, or only vill (bit XLEN-1) when illegal. */
  raw: bigint
}

/** vtype after reset, and after an unsupported request: vill set, everything else zero. */
export const VTYPE_ILLEGAL: Vtype = { vill: true, sew: 8, lmul: 1, ta: false, ma: false, raw: 1n << 63n }

/**
 * Decodes a vtype value. Reserved encodings and non-zero reserved bits give
 * vill (section 3.4.4), and so does a fractional LMUL with SEW > LMUL x ELEN:
 * section 3.4.2 only requires SEW up to LMUL x ELEN, and Chimeline supports no
 * more, so e16/mf8, e32/mf8, e32/mf4, e64/mf8, e64/mf4 and e64/mf2 are illegal.
 */
export function decodeVtype(value: bigint): Vtype {
  const v = BigInt.asUintN(64, value)
  if (v >> 8n !== 0n) return VTYPE_ILLEGAL
  const fields = decodeFields(Number(v))
  if (fields === undefined) return VTYPE_ILLEGAL
  if (fields.lmul < 1 && fields.sew > fields.lmul * ELEN) return VTYPE_ILLEGAL
  return { ...fields, vill: false, raw: v }
}

/**
 * The new vl for an application vector length (section 6.3): the
 * specification allows any value between ceil(AVL / 2) and VLMAX when
 * VLMAX < AVL < 2 x VLMAX; Chimeline (like QEMU) takes vl = min(AVL, VLMAX).
 */
export function computeVl(avl: bigint, max: number): number {
  return avl < BigInt(max) ? Number(avl) : max
}

/** Whether VLEN is one this implementation accepts: a power of two from 64 to 65536 bits. */
export function isValidVlen(vlen: number): boolean {
  return Number.isInteger(vlen) && vlen >= 64 && vlen <= 65536 && (vlen & (vlen - 1)) === 0
}
