/**
 * vfrec7.v and vfrsqrt7.v (RISC-V V 1.0 sections 13.9 and 13.10): 7-bit
 * estimates of 1/x and 1/sqrt(x). The specification gives each as a
 * 128-entry table; these are the closed forms that reproduce both tables
 * entry for entry (checked against QEMU 7.2, which implements the tables, by
 * tests/reference/qemu): for the index i (vfrec7: the 7 leading fraction bits;
 * vfrsqrt7: the biased exponent's low bit and the 6 leading fraction bits),
 * the output fraction is round(128 x (2 / m - 1)) with m the midpoint of the
 * input interval (1 + (i + 0.5) / 128; under the square root
 * (1 + (j + 0.5) / 64), doubled when the biased exponent is even), at most 127.
 */
import { DZ, NV, NX, OF, raiseFlags, RDN, RTZ, RUP, type RoundingMode, signalingNaN, takeFlags } from './fp'
import type { Handler } from './handler'
import { checkMaskOverlap, requireFpSew, vectorRoundingMode } from './handler'
import { checkGroup, type ArchState, regGroup } from './machine'
import { readElem, writeElem } from './velem'

const REC7 = Array.from({ length: 128 }, (_, i) => Math.min(127, Math.floor((2 / (1 + (i + 0.5) / 128) - 1) * 128 + 0.5)))
// The index's top bit is the biased exponent's low bit: an even biased exponent
// (an odd unbiased one) puts the input in [2, 4) relative to the result's scale.
const RSQRT7 = Array.from({ length: 128 }, (_, k) => {
  const oddBiased = k >> 6
  const j = k & 63
  return Math.min(127, Math.floor((2 / Math.sqrt((1 + (j + 0.5) / 64) * (oddBiased ? 1 : 2)) - 1) * 128 + 0.5))
})

interface Format { width: 32 | 64; frac: bigint; bias: bigint; expMask: bigint }
const F32: Format = { width: 32, frac: 23n, bias: 127n, expMask: 0xffn }
const F64: Format = { width: 64, frac: 52n, bias: 1023n, expMask: 0x7ffn }

function canonicalNaN(f: Format): bigint {
  return f.width === 64 ? 0x7ff8000000000000n : 0x7fc00000n
}

/** Sign, the normalized biased exponent (<= 0 for subnormals) and the fraction without its leading one. */
function normalize(bits: bigint, f: Format): { sign: bigint; exp: bigint; frac: bigint } {
  const sign = bits >> BigInt(f.width - 1)
  let exp = (bits >> f.frac) & f.expMask
  let frac = bits & ((1n << f.frac) - 1n)
  if (exp === 0n) {
    while (((frac >> (f.frac - 1n)) & 1n) === 0n) {
      frac <<= 1n
      exp -= 1n
    }
    frac = (frac << 1n) & ((1n << f.frac) - 1n)
  }
  return { sign, exp, frac }
}

function largest(sign: bigint, f: Format): bigint {
  return (sign << BigInt(f.width - 1)) | (((f.expMask - 1n) << f.frac) | ((1n << f.frac) - 1n))
}

/** vfrec7 of a raw pattern; `mode` decides overflow for tiny inputs. */
export function rec7(bits: bigint, f: Format, mode: RoundingMode): bigint {
  const sign = bits >> BigInt(f.width - 1)
  const expField = (bits >> f.frac) & f.expMask
  const fracField = bits & ((1n << f.frac) - 1n)
  const signBit = sign << BigInt(f.width - 1)
  if (expField === f.expMask) {
    if (fracField !== 0n && signalingNaN(bits, f.width)) raiseFlags(NV)
    return fracField === 0n ? signBit : canonicalNaN(f) // 1/inf = 0; NaN
  }
  if (expField === 0n && fracField === 0n) {
    raiseFlags(DZ)
    return signBit | (f.expMask << f.frac) // 1/0 = inf
  }
  const n = normalize(bits, f)
  const outExp = 2n * f.bias - 1n - n.exp
  if (outExp >= f.expMask) {
    // The reciprocal of a tiny subnormal overflows: infinity or the largest finite value, by mode (13.9).
    raiseFlags(OF | NX)
    const toMax = mode === RTZ || (mode === RDN && sign === 0n) || (mode === RUP && sign === 1n)
    return toMax ? largest(sign, f) : signBit | (f.expMask << f.frac)
  }
  let outFrac = BigInt(REC7[Number(n.frac >> (f.frac - 7n))]!) << (f.frac - 7n)
  let e = outExp
  if (e <= 0n) {
    // A subnormal result: the significand with its leading one, shifted right.
    outFrac = ((1n << f.frac) | outFrac) >> (1n - e)
    e = 0n
  }
  return signBit | (e << f.frac) | outFrac
}

/** vfrsqrt7 of a raw pattern. */
export function rsqrt7(bits: bigint, f: Format): bigint {
  const sign = bits >> BigInt(f.width - 1)
  const expField = (bits >> f.frac) & f.expMask
  const fracField = bits & ((1n << f.frac) - 1n)
  const signBit = sign << BigInt(f.width - 1)
  if (expField === f.expMask && fracField !== 0n) {
    if (signalingNaN(bits, f.width)) raiseFlags(NV)
    return canonicalNaN(f)
  }
  if (expField === 0n && fracField === 0n) {
    raiseFlags(DZ)
    return signBit | (f.expMask << f.frac) // 1/sqrt(+-0) = +-inf
  }
  if (sign === 1n) {
    raiseFlags(NV)
    return canonicalNaN(f) // negative: invalid
  }
  if (expField === f.expMask) return 0n // 1/sqrt(+inf) = +0
  const n = normalize(bits, f)
  const index = Number(((n.exp & 1n) << 6n) | (n.frac >> (f.frac - 6n)))
  const outExp = (3n * f.bias - 1n - n.exp) / 2n
  return (outExp << f.frac) | (BigInt(RSQRT7[index]!) << (f.frac - 7n))
}

function estimate(kind: 'rec' | 'rsqrt'): Handler {
  return (m: ArchState, ins, rec) => {
    const sew = requireFpSew(m, ins)
    const lmul = m.vtype.lmul
    const vd = checkGroup(ins.operands.vd, lmul, 'vd', ins)
    const vs2 = checkGroup(ins.operands.vs2, lmul, 'vs2', ins)
    checkMaskOverlap(ins, vd)
    const mode = vectorRoundingMode(m, ins)
    const f = sew === 64 ? F64 : F32
    takeFlags()
    for (let i = 0; i < m.vl; i++) {
      if (!m.active(ins.operands.vm, i)) continue
      const x = readElem(m, vs2, sew, i, false)
      writeElem(m, vd, sew, i, kind === 'rec' ? rec7(x, f, mode) : rsqrt7(x, f))
    }
    // Subnormal results raise no underflow: the estimate loses no precision there (as QEMU).
    if (m.readsFpFlags) m.fflags |= takeFlags()
    if (rec.on) rec.vector(ins, { dstRegs: regGroup(vd, lmul), srcRegs: [regGroup(vs2, lmul)] })
  }
}

export const estimateHandlers: Record<string, Handler> = {
  'vfrec7.v': estimate('rec'),
  'vfrsqrt7.v': estimate('rsqrt'),
}
