/**
 * Pseudo-instructions and alternative operand forms, expanded into real
 * instructions of the table. Expansions follow the RISC-V assembly
 * programmer's manual pseudo-instruction tables and the V 1.0 specification
 * (sections 11.8, 13.13, 15.1 for the vector ones); GNU as produces the same
 * words, checked in tests/reference/binutils/.
 */
import type { Token } from './lexer'
import { parseExpr, type Expr } from './expr'
import { constant, immediate, parseInteger, type OperandContext } from './operands'
import { parseRegister } from './registers'
import type { Operands, SimDiagnostic } from './types'
import { diag } from './diagnostics'

/** Real instruction written as operand tokens, parsed as if the user wrote it. */
export interface TokenExpansion { op: string; args: Token[] }
/**
 * Real instruction already built; `reloc` asks for the pc-relative halves of an
 * address (`pcrel_hi` on the auipc, `pcrel_lo_prev` on the instruction after it).
 */
export interface BuiltExpansion {
  op: string
  operands: Operands
  reloc?: { op: 'pcrel_hi' | 'pcrel_lo_prev'; expr: Expr; column: number }
}
export type Expansion = TokenExpansion | BuiltExpansion

interface Pseudo {
  /** Operand forms, e.g. 'rd, rs' (for messages). */
  usage: string
  /** Whether this pseudo handles the given operands (real ops share some names). */
  applies: (args: Token[]) => boolean
  expand: (args: Token[], at: Token, line: number, ctx: OperandContext) => Expansion[] | SimDiagnostic
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
  expand: (g, _at, line, ctx) => {
    const rdTok = a(g, 0)
    const rd = parseRegister('x', rdTok.text)
    if (rd === undefined) return diag({ line, column: rdTok.column }, 'operand-kind', `li: expected an x register, found '${rdTok.text}'`)
    const t = a(g, 1)
    const v = constant(t.text, { ...ctx, line, op: 'li' })
    if (typeof v !== 'bigint') return diag({ line, column: t.column }, 'operand-kind', `li: ${v}`)
    if (v < -(1n << 63n) || v >= 1n << 64n) return diag({ line, column: t.column }, 'imm-range', `li: ${t.text} does not fit in 64 bits`)
    return liSequence(v).map((s) => ({
      op: s.op,
      operands: s.op === 'lui' ? { rd, imm: s.imm } : { rd, rs1: s.fromZero ? 0 : rd, imm: s.imm },
    }))
  },
}

/** An address operand (`sym`, `sym+8`) for la, call and tail. */
function addressExpr(t: Token, line: number, op: string, ctx: OperandContext): Expr | SimDiagnostic {
  const e = parseExpr(t.text, ctx.rename)
  if ('message' in e || e.kind === 'num') return diag({ line, column: t.column }, 'operand-kind', `${op}: expected a label, found '${t.text}'`)
  return e
}

/** auipc rd, %pcrel_hi(target) followed by `then` with %pcrel_lo of the same target (la, lla, call, tail). */
function pcrelPair(rd: number, target: Expr, column: number, then: { op: string; operands: Operands }): BuiltExpansion[] {
  return [
    { op: 'auipc', operands: { rd, imm: 0 }, reloc: { op: 'pcrel_hi', expr: target, column } },
    { ...then, reloc: { op: 'pcrel_lo_prev', expr: target, column } },
  ]
}

const la: Pseudo = {
  usage: 'rd, label',
  applies: count(2),
  expand: (g, _at, line, ctx) => {
    const rdTok = a(g, 0)
    const rd = parseRegister('x', rdTok.text)
    if (rd === undefined) return diag({ line, column: rdTok.column }, 'operand-kind', `la: expected an x register, found '${rdTok.text}'`)
    const l = a(g, 1)
    const e = addressExpr(l, line, 'la', ctx)
    if ('code' in e) return e
    return pcrelPair(rd, e, l.column, { op: 'addi', operands: { rd, rs1: rd, imm: 0 } })
  },
}

/** call: auipc ra + jalr ra; tail: auipc t1 + jalr zero (GNU as, no relaxation). */
const callLike = (link: number, scratch: number): Pseudo => ({
  usage: 'label',
  applies: count(1),
  expand: (g, _at, line, ctx) => {
    const l = a(g, 0)
    const e = addressExpr(l, line, link ? 'call' : 'tail', ctx)
    if ('code' in e) return e
    return pcrelPair(scratch, e, l.column, { op: 'jalr', operands: { rd: link, rs1: scratch, imm: 0 } })
  },
})

/** `csrrw rd, csr, 5` with an immediate is csrrwi (binutils prints the i forms so, and GNU as reads them back). */
const isImm = (t: Token | undefined): boolean => t !== undefined && parseInteger(t.text) !== undefined
const csrImmediate = (real: string): Pseudo => ({
  usage: 'rd, csr, uimm',
  applies: (g) => g.length === 3 && isImm(g[2]),
  expand: (g) => [{ op: real, args: g }],
})

/** csrr rd, csr and friends: Zicsr instructions with x0 in one place (unprivileged spec, table of CSR pseudo-instructions). */
const csrRead = (csr?: string): Pseudo => simple(csr ? 'rd' : 'rd, csr', csr ? [1] : [2], (g, at) => [{ op: 'csrrs', args: [a(g, 0), csr ? tok(csr, at) : a(g, 1), tok('zero', at)] }])
const csrWrite = (real: string, csr?: string): Pseudo => simple(csr ? 'rs' : 'csr, rs', csr ? [1] : [2], (g, at) => {
  const value = csr ? a(g, 0) : a(g, 1)
  // csrw vxrm, 2 is csrwi (binutils prints csrrwi zero so).
  const op = !csr && isImm(value) && !real.endsWith('i') ? `${real}i` : real
  return [{ op, args: [tok('zero', at), csr ? tok(csr, at) : a(g, 0), value] }]
})
/** fsrm rs / fsrm rd, rs (and fscsr, fsflags): swap the field, optionally keeping the old value. */
const csrSwap = (csr: string, real = 'csrrw'): Pseudo => ({
  usage: 'rs | rd, rs',
  applies: count(1, 2),
  expand: (g, at) => [{ op: real, args: g.length === 1 ? [tok('zero', at), tok(csr, at), a(g, 0)] : [a(g, 0), tok(csr, at), a(g, 1)] }],
})
/** Unary F/D pseudos: fmv.s/d, fneg, fabs are sign injections of a register with itself. */
const fsame = (real: string): Pseudo => simple('fd, fs', [2], (g) => [{ op: real, args: [a(g, 0), a(g, 1), a(g, 1)] }])

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
  lla: la,
  call: callLike(1, 1),
  tail: callLike(0, 6),
  fence: simple('', [0], (_g, at) => [{ op: 'fence', args: [tok('iorw', at), tok('iorw', at)] }]),
  'sext.w': simple('rd, rs', [2], (g, at) => [{ op: 'addiw', args: [a(g, 0), a(g, 1), tok('0', at)] }]),
  'zext.b': simple('rd, rs', [2], (g, at) => [{ op: 'andi', args: [a(g, 0), a(g, 1), tok('255', at)] }]),
  'zext.h': simple('rd, rs', [2], (g, at) => [{ op: 'slli', args: [a(g, 0), a(g, 1), tok('48', at)] }, { op: 'srli', args: [a(g, 0), a(g, 0), tok('48', at)] }]),
  'zext.w': simple('rd, rs', [2], (g, at) => [{ op: 'slli', args: [a(g, 0), a(g, 1), tok('32', at)] }, { op: 'srli', args: [a(g, 0), a(g, 0), tok('32', at)] }]),
  negw: simple('rd, rs', [2], (g, at) => [{ op: 'subw', args: [a(g, 0), tok('zero', at), a(g, 1)] }]),
  not: simple('rd, rs', [2], (g, at) => [{ op: 'xori', args: [a(g, 0), a(g, 1), tok('-1', at)] }]),
  seqz: simple('rd, rs', [2], (g, at) => [{ op: 'sltiu', args: [a(g, 0), a(g, 1), tok('1', at)] }]),
  snez: simple('rd, rs', [2], (g, at) => [{ op: 'sltu', args: [a(g, 0), tok('zero', at), a(g, 1)] }]),
  sltz: simple('rd, rs', [2], (g, at) => [{ op: 'slt', args: [a(g, 0), a(g, 1), tok('zero', at)] }]),
  sgtz: simple('rd, rs', [2], (g, at) => [{ op: 'slt', args: [a(g, 0), tok('zero', at), a(g, 1)] }]),
  'fmv.s': fsame('fsgnj.s'),
  'fmv.d': fsame('fsgnj.d'),
  'fneg.s': fsame('fsgnjn.s'),
  'fneg.d': fsame('fsgnjn.d'),
  'fabs.s': fsame('fsgnjx.s'),
  'fabs.d': fsame('fsgnjx.d'),
  csrr: csrRead(),
  csrrw: csrImmediate('csrrwi'),
  csrrs: csrImmediate('csrrsi'),
  csrrc: csrImmediate('csrrci'),
  csrw: csrWrite('csrrw'),
  csrs: csrWrite('csrrs'),
  csrc: csrWrite('csrrc'),
  csrwi: csrWrite('csrrwi'),
  csrsi: csrWrite('csrrsi'),
  csrci: csrWrite('csrrci'),
  frcsr: csrRead('fcsr'),
  frrm: csrRead('frm'),
  frflags: csrRead('fflags'),
  rdcycle: csrRead('cycle'),
  rdtime: csrRead('time'),
  rdinstret: csrRead('instret'),
  fscsr: csrSwap('fcsr'),
  fsrm: csrSwap('frm'),
  fsflags: csrSwap('fflags'),
  fsrmi: csrSwap('frm', 'csrrwi'),
  fsflagsi: csrSwap('fflags', 'csrrwi'),
  'vwcvt.x.x.v': simple('vd, vs[, v0.t]', [2, 3], (g, at) => [{ op: 'vwadd.vx', args: [a(g, 0), a(g, 1), tok('zero', at), ...rest(g, 2)] }]),
  'vwcvtu.x.x.v': simple('vd, vs[, v0.t]', [2, 3], (g, at) => [{ op: 'vwaddu.vx', args: [a(g, 0), a(g, 1), tok('zero', at), ...rest(g, 2)] }]),
  'vncvt.x.x.w': simple('vd, vs[, v0.t]', [2, 3], (g, at) => [{ op: 'vnsrl.wx', args: [a(g, 0), a(g, 1), tok('zero', at), ...rest(g, 2)] }]),
  'vl1r.v': simple('vd, (rs1)', [2], (g) => [{ op: 'vl1re8.v', args: g }]),
  'vl2r.v': simple('vd, (rs1)', [2], (g) => [{ op: 'vl2re8.v', args: g }]),
  'vl4r.v': simple('vd, (rs1)', [2], (g) => [{ op: 'vl4re8.v', args: g }]),
  'vl8r.v': simple('vd, (rs1)', [2], (g) => [{ op: 'vl8re8.v', args: g }]),
  'vfrsqrte7.v': simple('vd, vs[, v0.t]', [2, 3], (g) => [{ op: 'vfrsqrt7.v', args: g }]),
  'vfrece7.v': simple('vd, vs[, v0.t]', [2, 3], (g) => [{ op: 'vfrec7.v', args: g }]),
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
