/**
 * The F and D extensions (unprivileged ISA chapters "F" and "D"): loads,
 * stores, arithmetic, fused multiply-add, square root, sign injection,
 * min/max, compares, classification, conversions and moves. binary32 values
 * live NaN-boxed in the 64-bit f registers; an operand that is not properly
 * boxed reads as the canonical NaN. Results that are NaN are the canonical NaN.
 * The rounding mode is the instruction's rm field, or frm when rm is dyn (7).
 * Each instruction accrues its IEEE 754 exception flags into fflags (fp.ts
 * raises them; a signaling NaN operand is invalid, as are flt/fle on any NaN).
 */
import type { Instruction } from '../isa/types'
import {
  arith, BINARY32, BINARY64, CANONICAL_NAN32, CANONICAL_NAN64, floatToInt, type FloatFormat, fusedMultiplyAdd,
  intToFloat, maximumNumber, minimumNumber, NV, raiseFlags, type RoundingMode, signalingNaN, takeFlags, toBinary32,
} from './fp'
import type { Handler } from './handler'
import { operand } from './handler'
import { ExecFault, ArchState } from './machine'

type Width = 's' | 'd'
const FMT: Record<Width, FloatFormat> = { s: BINARY32, d: BINARY64 }

/** The rounding mode an instruction uses: its rm field, or frm for dyn (reserved values fault, as on hardware). */
export function roundingMode(m: ArchState, ins: Instruction): RoundingMode {
  const rm = ins.operands.rm ?? 7
  const mode = rm === 7 ? m.frm : rm
  if (mode > 4) throw new ExecFault('rounding-mode', `${ins.op}: rounding mode ${mode} is reserved (frm = ${m.frm}); use rne, rtz, rdn, rup or rmm`)
  return mode as RoundingMode
}

function get(m: ArchState, w: Width, r: number): number {
  return w === 'd' ? m.f[r]! : m.f32Operand(r)
}

function put(m: ArchState, w: Width, rd: number, value: number): void {
  if (w === 'd') {
    if (value !== value) m.fBits[rd] = CANONICAL_NAN64
    else m.f[rd] = value
  } else {
    scratch[0] = value
    m.setF32Bits(rd, value !== value ? CANONICAL_NAN32 : scratchBits[0]!)
  }
}

const scratch = new Float32Array(1)
const scratchBits = new Uint32Array(scratch.buffer)

function binaryOp(w: Width, op: 'add' | 'sub' | 'mul' | 'div'): Handler {
  return (m, ins) => put(m, w, operand(ins, 'rd'), arith(op, get(m, w, operand(ins, 'rs1')), get(m, w, operand(ins, 'rs2')), FMT[w], roundingMode(m, ins), true))
}

/** fmadd: rs1 x rs2 + rs3; fmsub: - rs3; fnmsub: -(rs1 x rs2) + rs3; fnmadd: -(rs1 x rs2) - rs3; rounded once. */
function fmaOp(w: Width, negProduct: boolean, negAddend: boolean): Handler {
  return (m, ins) => {
    const a = get(m, w, operand(ins, 'rs1'))
    const b = get(m, w, operand(ins, 'rs2'))
    const c = get(m, w, operand(ins, 'rs3'))
    put(m, w, operand(ins, 'rd'), fusedMultiplyAdd(negProduct ? -a : a, b, negAddend ? -c : c, FMT[w], roundingMode(m, ins)))
  }
}

/** Sign injection works on the raw bits, NaN payloads included (no canonicalisation). */
function sgnj(w: Width, kind: 'j' | 'n' | 'x'): Handler {
  return (m, ins) => {
    const rd = operand(ins, 'rd')
    if (w === 'd') {
      const a = m.fBits[operand(ins, 'rs1')]!
      const b = m.fBits[operand(ins, 'rs2')]!
      const sign = 1n << 63n
      const s = kind === 'j' ? b & sign : kind === 'n' ? ~b & sign : (a ^ b) & sign
      m.fBits[rd] = (a & ~sign) | s
    } else {
      const a = m.f32OperandBits(operand(ins, 'rs1'))
      const b = m.f32OperandBits(operand(ins, 'rs2'))
      const s = kind === 'j' ? b & 0x80000000 : kind === 'n' ? ~b & 0x80000000 : (a ^ b) & 0x80000000
      m.setF32Bits(rd, ((a & 0x7fffffff) | s) >>> 0)
    }
  }
}

/** fclass: one bit of ten (F extension, "Single-Precision Floating-Point Classify Instruction"). */
function fclass(w: Width): Handler {
  return (m, ins) => {
    const r = operand(ins, 'rs1')
    const x = get(m, w, r)
    let bit: number
    if (x !== x) {
      const quiet = w === 'd' ? ((m.fBits[r]! >> 51n) & 1n) === 1n : ((m.f32OperandBits(r) >>> 22) & 1) === 1
      bit = quiet ? 9 : 8
    } else {
      const neg = x < 0 || Object.is(x, -0)
      const ax = Math.abs(x)
      const minNormal = w === 'd' ? 2 ** -1022 : 2 ** -126
      const kind = ax === Infinity ? 0 : ax === 0 ? 3 : ax < minNormal ? 2 : 1
      bit = neg ? kind : 7 - kind
    }
    m.setX(ins.operands.rd, BigInt(1 << bit))
  }
}

/** feq is a quiet compare (invalid only for a signaling NaN, checked by accruing); flt and fle signal on any NaN. */
function compare(w: Width, fn: (a: number, b: number) => boolean, signaling: boolean): Handler {
  return (m, ins) => {
    const a = get(m, w, operand(ins, 'rs1'))
    const b = get(m, w, operand(ins, 'rs2'))
    if (signaling && (a !== a || b !== b)) raiseFlags(NV)
    m.setX(ins.operands.rd, fn(a, b) ? 1n : 0n)
  }
}

/** A signaling NaN in f register r read at width w (quiet bit clear; an unboxed binary32 reads as the quiet canonical NaN). */
function isSignaling(m: ArchState, w: Width, r: number): boolean {
  return w === 'd' ? signalingNaN(m.fBits[r]!, 64) : signalingNaN(BigInt(m.f32OperandBits(r)), 32)
}

/**
 * The handler with fflags accrual: a signaling NaN among the f sources is
 * invalid; the flags fp.ts raised while it ran are ORed into fflags. The
 * sources' width is the last suffix of the name (fcvt.s.d reads a double).
 */
function accruing(op: string, h: Handler): Handler {
  const w: Width = op.endsWith('.d') ? 'd' : 's'
  const sources = (['rs1', 'rs2', 'rs3'] as const).filter((k) => FP_SOURCES[k].test(op))
  return (m, ins, sink) => {
    takeFlags()
    h(m, ins, sink)
    let flags = takeFlags()
    for (const k of sources) if (isSignaling(m, w, ins.operands[k] ?? 0)) flags |= NV
    m.fflags |= flags
  }
}

/** Which f sources an F/D operation reads (conversions from integers read none). */
const FP_SOURCES = {
  rs1: /^f(add|sub|mul|div|sqrt|min|max|eq|lt|le|n?m(add|sub)|cvt\.(w|wu|l|lu|s|d)\.(s|d))/,
  rs2: /^f(add|sub|mul|div|min|max|eq|lt|le|n?m(add|sub))/,
  rs3: /^fn?m(add|sub)/,
}

const INT_KINDS = { w: [32, true], wu: [32, false], l: [64, true], lu: [64, false] } as const

function toInt(w: Width, kind: keyof typeof INT_KINDS): Handler {
  const [bits, signed] = INT_KINDS[kind]
  return (m, ins) => {
    const v = floatToInt(get(m, w, operand(ins, 'rs1')), bits, signed, false, roundingMode(m, ins))
    // 32-bit results are sign-extended to 64 bits, unsigned ones included (RV64F).
    m.setX(ins.operands.rd, bits === 32 ? BigInt.asIntN(32, v) : v)
  }
}

function fromInt(w: Width, kind: keyof typeof INT_KINDS): Handler {
  const [bits, signed] = INT_KINDS[kind]
  return (m, ins) => {
    const x = m.x[operand(ins, 'rs1')]!
    const v = signed ? BigInt.asIntN(bits, x) : BigInt.asUintN(bits, x)
    // fcvt.d.w/wu carry no rm (exact); the others round in the instruction's mode.
    const mode = ins.operands.rm === undefined ? 0 : roundingMode(m, ins)
    put(m, w, operand(ins, 'rd'), intToFloat(v, FMT[w], mode))
  }
}

function fload(w: Width): Handler {
  return (m, ins) => {
    const off = m.offset(ArchState.address(m.x[operand(ins, 'rs1')]!, operand(ins, 'imm')), w === 'd' ? 8 : 4)
    if (w === 'd') m.fBits[operand(ins, 'rd')] = m.mem.getBigUint64(off, true)
    else m.setF32Bits(operand(ins, 'rd'), m.mem.getUint32(off, true))
  }
}

function fstore(w: Width): Handler {
  return (m, ins) => {
    const off = m.offset(ArchState.address(m.x[operand(ins, 'rs1')]!, operand(ins, 'imm')), w === 'd' ? 8 : 4)
    if (w === 'd') m.mem.setBigUint64(off, m.fBits[operand(ins, 'rs2')]!, true)
    else m.mem.setUint32(off, m.fWords[2 * operand(ins, 'rs2')]!, true)
  }
}

export const scalarFpHandlers: Record<string, Handler> = {
  'fcvt.s.d': (m, ins) => put(m, 's', operand(ins, 'rd'), toBinary32(m.f[operand(ins, 'rs1')]!, roundingMode(m, ins), true)),
  'fcvt.d.s': (m, ins) => put(m, 'd', operand(ins, 'rd'), m.f32Operand(operand(ins, 'rs1'))),
  'fmv.x.w': (m, ins) => m.setX(ins.operands.rd, BigInt(m.fWords[2 * operand(ins, 'rs1')]! | 0)),
  'fmv.w.x': (m, ins) => m.setF32Bits(operand(ins, 'rd'), Number(BigInt.asUintN(32, m.x[operand(ins, 'rs1')]!))),
  'fmv.x.d': (m, ins) => m.setX(ins.operands.rd, BigInt.asIntN(64, m.fBits[operand(ins, 'rs1')]!)),
  'fmv.d.x': (m, ins) => {
    m.fBits[operand(ins, 'rd')] = BigInt.asUintN(64, m.x[operand(ins, 'rs1')]!)
  },
}
for (const w of ['s', 'd'] as const) {
  const h = scalarFpHandlers
  h[`fl${w === 'd' ? 'd' : 'w'}`] = fload(w)
  h[`fs${w === 'd' ? 'd' : 'w'}`] = fstore(w)
  for (const op of ['add', 'sub', 'mul', 'div'] as const) h[`f${op}.${w}`] = binaryOp(w, op)
  h[`fsqrt.${w}`] = (m, ins) => put(m, w, operand(ins, 'rd'), arith('sqrt', get(m, w, operand(ins, 'rs1')), 0, FMT[w], roundingMode(m, ins), true))
  h[`fmadd.${w}`] = fmaOp(w, false, false)
  h[`fmsub.${w}`] = fmaOp(w, false, true)
  h[`fnmsub.${w}`] = fmaOp(w, true, false)
  h[`fnmadd.${w}`] = fmaOp(w, true, true)
  h[`fsgnj.${w}`] = sgnj(w, 'j')
  h[`fsgnjn.${w}`] = sgnj(w, 'n')
  h[`fsgnjx.${w}`] = sgnj(w, 'x')
  h[`fmin.${w}`] = (m, ins) => put(m, w, operand(ins, 'rd'), minimumNumber(get(m, w, operand(ins, 'rs1')), get(m, w, operand(ins, 'rs2'))))
  h[`fmax.${w}`] = (m, ins) => put(m, w, operand(ins, 'rd'), maximumNumber(get(m, w, operand(ins, 'rs1')), get(m, w, operand(ins, 'rs2'))))
  h[`feq.${w}`] = compare(w, (a, b) => a === b, false)
  h[`flt.${w}`] = compare(w, (a, b) => a < b, true)
  h[`fle.${w}`] = compare(w, (a, b) => a <= b, true)
  h[`fclass.${w}`] = fclass(w)
  for (const kind of ['w', 'wu', 'l', 'lu'] as const) {
    h[`fcvt.${kind}.${w}`] = toInt(w, kind)
    h[`fcvt.${w}.${kind}`] = fromInt(w, kind)
  }
}
// Everything that computes accrues flags; moves, loads, stores, sign injection and fclass never raise any.
for (const [op, h] of Object.entries(scalarFpHandlers)) {
  if (!/^(fl[wd]|fs[wd]|fsgnj|fmv|fclass)/.test(op)) scalarFpHandlers[op] = accruing(op, h)
}
