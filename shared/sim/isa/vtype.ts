/**
 * The vtype register and VLMAX, as the RISC-V "V" extension 1.0 defines them
 * (section 3.4 "Vector type register, vtype" and 3.4.2 "Vector Register
 * Grouping"): vlmul in bits 2:0, vsew in bits 5:3, vta bit 6, vma bit 7.
 */
import type { Lmul, Sew } from './types'

export interface Vtype {
  sew: Sew
  lmul: Lmul
  /** tail agnostic (ta) when true, undisturbed (tu) otherwise */
  ta: boolean
  /** mask agnostic (ma) when true, undisturbed (mu) otherwise */
  ma: boolean
}

const SEWS: readonly Sew[] = [8, 16, 32, 64]
/** vlmul encodings 0..7; 4 is reserved. */
const LMULS: readonly (Lmul | undefined)[] = [1, 2, 4, 8, undefined, 0.125, 0.25, 0.5]
const LMUL_NAMES: readonly [Lmul, string][] = [
  [0.125, 'mf8'], [0.25, 'mf4'], [0.5, 'mf2'], [1, 'm1'], [2, 'm2'], [4, 'm4'], [8, 'm8'],
]

export function encodeVtype(v: Vtype): number {
  const vsew = SEWS.indexOf(v.sew)
  const vlmul = LMULS.indexOf(v.lmul)
  return vlmul | (vsew << 3) | (v.ta ? 1 << 6 : 0) | (v.ma ? 1 << 7 : 0)
}

/**
 * The vtype a vsetvli/vsetivli immediate selects, or undefined when the
 * setting is reserved (vsew >= 4, vlmul = 4, or bits above 7 set): the
 * hardware then sets vill (spec 3.4.4).
 */
export function decodeVtype(bits: number): Vtype | undefined {
  if (bits >>> 8 !== 0) return undefined
  const sew = SEWS[(bits >> 3) & 7]
  const lmul = LMULS[bits & 7]
  if (sew === undefined || lmul === undefined) return undefined
  return { sew, lmul, ta: ((bits >> 6) & 1) === 1, ma: ((bits >> 7) & 1) === 1 }
}

export function lmulName(lmul: Lmul): string {
  return LMUL_NAMES.find(([l]) => l === lmul)?.[1] ?? 'm1'
}

/** `e32,m4,ta,ma`: the form objdump prints. */
export function formatVtype(v: Vtype): string {
  return `e${v.sew},${lmulName(v.lmul)},${v.ta ? 'ta' : 'tu'},${v.ma ? 'ma' : 'mu'}`
}

/** VLMAX = LMUL x VLEN / SEW (spec 3.4.2). */
export function vlmax(vlen: number, sew: Sew, lmul: Lmul): number {
  return Math.floor((lmul * vlen) / sew)
}

/**
 * Parses vtype text such as `e32, m4, ta, ma` (already split at commas).
 * SEW is required; LMUL defaults to m1 and the policies to tu, mu, as the
 * assembler syntax in the spec allows (section 6.1). Returns an error message
 * for the first bad token.
 */
export function parseVtypeTokens(tokens: string[]): { ok: true; vtype: Vtype } | { ok: false; index: number; message: string } {
  let sew: Sew | undefined
  let lmul: Lmul | undefined
  let ta: boolean | undefined
  let ma: boolean | undefined
  for (let i = 0; i < tokens.length; i++) {
    const t = (tokens[i] ?? '').trim().toLowerCase()
    const sewMatch = /^e(8|16|32|64)$/.exec(t)
    const lmulEntry = LMUL_NAMES.find(([, name]) => name === t)
    if (sewMatch && sew === undefined && i === 0) sew = Number(sewMatch[1]) as Sew
    else if (lmulEntry && lmul === undefined && sew !== undefined && ta === undefined && ma === undefined) lmul = lmulEntry[0]
    else if ((t === 'ta' || t === 'tu') && ta === undefined && sew !== undefined && ma === undefined) ta = t === 'ta'
    else if ((t === 'ma' || t === 'mu') && ma === undefined && sew !== undefined) ma = t === 'ma'
    else {
      const expected = sew === undefined ? 'an element width e8, e16, e32 or e64' : 'LMUL (mf8..m8), then ta/tu, then ma/mu'
      return { ok: false, index: i, message: `bad vtype field '${tokens[i]?.trim() ?? ''}': expected ${expected}` }
    }
  }
  if (sew === undefined) return { ok: false, index: 0, message: 'vtype needs an element width: e8, e16, e32 or e64' }
  return { ok: true, vtype: { sew, lmul: lmul ?? 1, ta: ta ?? false, ma: ma ?? false } }
}
