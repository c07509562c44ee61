/**
 * Pseudo-instructions and alternative operand forms, expanded into real
 * instructions of the table. Expansions follow the RISC-V assembly
 * programmer's manual pseudo-instruction tables and the V 1.0 specification
 * (sections 11.8, 13.13, 15.1 for the vector ones); GNU as produces the same
 * words, checked in tests/reference/binutils/.
 */
import type { Token } from './lexer'
import { immediate, parseInteger } from './operands'
import { parseRegister } from './registers'
import type { Operands, SimDiagnostic } from './types'
import { diag } from './diagnostics'

/** Real instruction written as operand tokens, parsed as if the user wrote it. */
export interface TokenExpansion { op: string; args: Token[] }
/** Real instruction already built; `pcrel` asks for the auipc/addi pair of `la`. */
export interface BuiltExpansion {
  op: string
  operands: Operands
  pcrel?: { part: 'hi' | 'lo'; label: string; column: number }
}
export type Expansion = TokenExpansion | BuiltExpansion

interface Pseudo {
  /** Operand forms, e.g. 'rd, rs' (for messages). */
  usage: string
  /** Whether this pseudo handles the given operands (real ops share some names). */
  applies: (args: Token[]) => boolean
  expand: (args: Token[], at: Token, line: number) => Expansion[] | SimDiagnostic
}

const isMem = (t: Token | undefined): boolean => t !== undefined && t.text.includes('(')
const tok = (text: string, like: Token): Token => ({ text, column: like.column })
/** `rs` as the memory operand `0(rs)`, keeping the register's column. */
const zeroOffset = (t: Token): Token => (isMem(t) ? t : { text: `0(${t.text})`, column: t.column - 2 })
const count = (...n: number[]) => (args: Token[]): boolean => n.includes(args.length)
const a = (args: Token[], i: number): Token => args[i] ?? { text: '', column: 1 }
/** The optional trailing v0.t, passed on unchanged. */
const rest = (args: Token[], from: number): Token[] => args.slice(from)

function simple(usage: string, n: number[], build: (args: Token[], at: Token) => TokenExpansion[]): Pseudo {
  return { usage, applies: count(...n), expand: (args, at) => build(args, at) }
}

/** Swapped-operand compares: vmsgt.vv vd, va, vb == vmslt.vv vd, vb, va (spec 11.8). */
const swapped = (real: string): Pseudo => simple('vd, vs2, vs1[, v0.t]', [3, 4], (g) => [{ op: real, args: [a(g, 0), a(g, 2), a(g, 1), ...rest(g, 3)] }])

/**
 * Immediate compares without an encoding of their own: `x < i` is `x <= i-1`
 * and `x >= i` is `x > i-1` (spec 11.8). For the unsigned forms with i = 0 the
 * result is always false / always true: vmsne.vv / vmseq.vv of a register with itself.
 */
const immMinusOne = (real: string, zeroForm?: string): Pseudo => ({
  usage: 'vd, vs2, imm[, v0.t]',
  applies: count(3, 4),
  expand: (g, _at, line) => {
    const t = a(g, 2)
    const v = immediate('simm5', String((parseInteger(t.text) ?? 0n) - 1n), t.column, { line, op: real })
    if (parseInteger(t.text) === undefined || typeof v !== 'number') {
      return diag({ line, column: t.column }, 'imm-range', `immediate '${t.text}' must be an integer in -15..16`)
    }
    if (zeroForm && v === -1) return [{ op: zeroForm, args: [a(g, 0), a(g, 1), a(g, 1), ...rest(g, 3)] }]
    return [{ op: real, args: [a(g, 0), a(g, 1), tok(String(v), t), ...rest(g, 3)] }]
  },
})

/**
 * vmsge{u}.vx (spec 11.8): unmasked, `vmslt{u}.vx vd, va, x; vmnand.mm vd, vd, vd`;
 * masked with vd != v0, `vmslt{u}.vx vd, va, x, v0.t; vmxor.mm vd, vd, v0`.
 */
const geVx = (lt: string): Pseudo => ({
  usage: 'vd, vs2, rs1[, v0.t]',
  applies: count(3, 4),
  expand: (g, _at, line) => {
    const vd = a(g, 0)
    if (g.length === 3) return [{ op: lt, args: g }, { op: 'vmnand.mm', args: [vd, vd, vd] }]
    if (parseRegister('v', vd.text) === 0) {
      return diag({ line, column: vd.column }, 'mask-overlap', `masked ${lt.replace('lt', 'ge')} needs a destination other than v0`)
    }
    return [{ op: lt, args: g }, { op: 'vmxor.mm', args: [vd, vd, tok('v0', a(g, 3))] }]
  },
})

/** Bits of a sign-extended 12-bit low part. */
const sext12 = (v: bigint): bigint => BigInt.asIntN(12, v)

/**
 * `li rd, imm` for any 64-bit value, with lui/addi/slli only (no addiw, so that
 * the scalar subset stays small): small values are one addi; 32-bit values whose
 * upper part fits lui's sign-extended range are lui + addi; the rest are built
 * recursively as (upper << shift) + low, the usual RV64 materialisation.
 * GNU as picks addiw for some of these, so the words can differ while the value
 * is the same (tests check the value by evaluating the sequence).
 */
export function liSequence(value: bigint): { op: 'lui' | 'addi' | 'slli'; imm: number; fromZero: boolean }[] {
  const v = BigInt.asIntN(64, value)
  if (v >= -2048n && v < 2048n) return [{ op: 'addi', imm: Number(v), fromZero: true }]
  const lo = sext12(v)
  const hi = (v - lo) >> 12n
  if (v >= -(1n << 31n) && v < 1n << 31n && hi >= -(1n << 19n) && hi < 1n << 19n) {
    const seq: ReturnType<typeof liSequence> = [{ op: 'lui', imm: Number(hi & 0xfffffn), fromZero: true }]
    if (lo !== 0n) seq.push({ op: 'addi', imm: Number(lo), fromZero: false })
    return seq
  }
  let upper = (v + 0x800n) >> 12n
  let shift = 12
  while ((upper & 1n) === 0n) {
    upper >>= 1n
    shift++
  }
  const seq = liSequence(upper)
  seq.push({ op: 'slli', imm: shift, fromZero: false })
  if (lo !== 0n) seq.push({ op: 'addi', imm: Number(lo), fromZero: false })
  return seq
}

const li: Pseudo = {
  usage: 'rd, imm',
  applies: count(2),
  expand: (g, _at, line) => {
    const rdTok = a(g, 0)
    const rd = parseRegister('x', rdTok.text)
    if (rd === undefined) return diag({ line, column: rdTok.column }, 'operand-kind', `li: expected an x register, found '${rdTok.text}'`)
    const t = a(g, 1)
    const v = parseInteger(t.text)
    if (v === undefined) return diag({ line, column: t.column }, 'operand-kind', `li: expected an integer, found '${t.text}'`)
    if (v < -(1n << 63n) || v >= 1n << 64n) return diag({ line, column: t.column }, 'imm-range', `li: ${t.text} does not fit in 64 bits`)
    return liSequence(v).map((s) => ({
      op: s.op,
      operands: s.op === 'lui' ? { rd, imm: s.imm } : { rd, rs1: s.fromZero ? 0 : rd, imm: s.imm },
    }))
  },
}

const la: Pseudo = {
  usage: 'rd, label',
  applies: count(2),
  expand: (g, _at, line) => {
    const rdTok = a(g, 0)
    const rd = parseRegister('x', rdTok.text)
    if (rd === undefined) return diag({ line, column: rdTok.column }, 'operand-kind', `la: expected an x register, found '${rdTok.text}'`)
    const l = a(g, 1)
    if (!/^[A-Za-z_.$][A-Za-z0-9_.$]*$/.test(l.text)) return diag({ line, column: l.column }, 'operand-kind', `la: expected a label, found '${l.text}'`)
    return [
      { op: 'auipc', operands: { rd, imm: 0 }, pcrel: { part: 'hi', label: l.text, column: l.column } },
      { op: 'addi', operands: { rd, rs1: rd, imm: 0 }, pcrel: { part: 'lo', label: l.text, column: l.column } },
    ]
  },
}

const branchZero = (real: string, zeroFirst: boolean): Pseudo =>
  simple('rs, label', [2], (g, at) => [{ op: real, args: zeroFirst ? [tok('zero', at), a(g, 0), a(g, 1)] : [a(g, 0), tok('zero', at), a(g, 1)] }])
const branchSwap = (real: string): Pseudo => simple('rs, rt, label', [3], (g) => [{ op: real, args: [a(g, 1), a(g, 0), a(g, 2)] }])
const sameSource = (real: string): Pseudo => simple('vd, vs[, v0.t]', [2, 3], (g) => [{ op: real, args: [a(g, 0), a(g, 1), a(g, 1), ...rest(g, 2)] }])

export const PSEUDOS: Record<string, Pseudo> = {
  nop: simple('', [0], (_g, at) => [{ op: 'addi', args: [tok('zero', at), tok('zero', at), tok('0', at)] }]),
  mv: simple('rd, rs', [2], (g, at) => [{ op: 'addi', args: [a(g, 0), a(g, 1), tok('0', at)] }]),
  neg: simple('rd, rs', [2], (g, at) => [{ op: 'sub', args: [a(g, 0), tok('zero', at), a(g, 1)] }]),
  li,
  la,
  j: simple('label', [1], (g, at) => [{ op: 'jal', args: [tok('zero', at), a(g, 0)] }]),
  jal: simple('label', [1], (g, at) => [{ op: 'jal', args: [tok('ra', at), a(g, 0)] }]),
  jr: simple('rs', [1], (g, at) => [{ op: 'jalr', args: [tok('zero', at), zeroOffset(a(g, 0))] }]),
  ret: simple('', [0], (_g, at) => [{ op: 'jalr', args: [tok('zero', at), tok('0(ra)', at)] }]),
  jalr: {
    usage: 'rs | rd, rs | rd, offset(rs)',
    applies: (g) => g.length === 1 || (g.length === 2 && !isMem(g[1])),
    expand: (g, at) => (g.length === 1
      ? [{ op: 'jalr', args: [tok('ra', at), zeroOffset(a(g, 0))] }]
      : [{ op: 'jalr', args: [a(g, 0), zeroOffset(a(g, 1))] }]),
  },
  beqz: branchZero('beq', false),
  bnez: branchZero('bne', false),
  bgez: branchZero('bge', false),
  bltz: branchZero('blt', false),
  blez: branchZero('bge', true),
  bgtz: branchZero('blt', true),
  bgt: branchSwap('blt'),
  ble: branchSwap('bge'),
  bgtu: branchSwap('bltu'),
  bleu: branchSwap('bgeu'),
  'vneg.v': simple('vd, vs[, v0.t]', [2, 3], (g, at) => [{ op: 'vrsub.vx', args: [a(g, 0), a(g, 1), tok('zero', at), ...rest(g, 2)] }]),
  'vnot.v': simple('vd, vs[, v0.t]', [2, 3], (g, at) => [{ op: 'vxor.vi', args: [a(g, 0), a(g, 1), tok('-1', at), ...rest(g, 2)] }]),
  'vfneg.v': sameSource('vfsgnjn.vv'),
  'vfabs.v': sameSource('vfsgnjx.vv'),
  'vmnot.m': simple('vd, vs', [2], (g) => [{ op: 'vmnand.mm', args: [a(g, 0), a(g, 1), a(g, 1)] }]),
  'vmmv.m': simple('vd, vs', [2], (g) => [{ op: 'vmand.mm', args: [a(g, 0), a(g, 1), a(g, 1)] }]),
  'vmclr.m': simple('vd', [1], (g) => [{ op: 'vmxor.mm', args: [a(g, 0), a(g, 0), a(g, 0)] }]),
  'vmset.m': simple('vd', [1], (g) => [{ op: 'vmxnor.mm', args: [a(g, 0), a(g, 0), a(g, 0)] }]),
  'vmsgt.vv': swapped('vmslt.vv'),
  'vmsgtu.vv': swapped('vmsltu.vv'),
  'vmsge.vv': swapped('vmsle.vv'),
  'vmsgeu.vv': swapped('vmsleu.vv'),
  'vmfgt.vv': swapped('vmflt.vv'),
  'vmfge.vv': swapped('vmfle.vv'),
  'vmslt.vi': immMinusOne('vmsle.vi'),
  'vmsltu.vi': immMinusOne('vmsleu.vi', 'vmsne.vv'),
  'vmsge.vi': immMinusOne('vmsgt.vi'),
  'vmsgeu.vi': immMinusOne('vmsgtu.vi', 'vmseq.vv'),
  'vmsge.vx': geVx('vmslt.vx'),
  'vmsgeu.vx': geVx('vmsltu.vx'),
}

/** The pseudo-instruction called `name` (own keys only: user text may say `__proto__`). */
export function pseudoNamed(name: string): Pseudo | undefined {
  return Object.hasOwn(PSEUDOS, name) ? PSEUDOS[name] : undefined
}
