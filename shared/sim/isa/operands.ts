/**
 * Parsing one operand token for an operand kind: registers, immediates (with
 * their ranges), memory operands, masks, labels and vtype text.
 */
import { FIELDS, IMM_RANGE, type OperandKind } from './fields'
import type { Token } from './lexer'
import { parseRegister, registerFileOf, type RegFile } from './registers'
import type { Operands, SimDiagnostic } from './types'
import { diag } from './diagnostics'
import { encodeVtype, parseVtypeTokens } from './vtype'
import { evalExpr, parseExpr, type Expr } from './expr'
import { csrNumber } from './csr'

/** Rounding-mode names by their field value (F extension, "Rounding modes"); 5 and 6 are reserved. */
export const ROUNDING_MODES = ['rne', 'rtz', 'rdn', 'rup', 'rmm', '', '', 'dyn'] as const

/**
 * An integer as GNU as reads it: decimal, 0x hex, 0b binary, and a leading 0
 * for octal; an optional sign. Undefined when the text is not an integer.
 */
export function parseInteger(text: string): bigint | undefined {
  const m = /^([+-]?)(0[xX][0-9a-fA-F]+|0[bB][01]+|0[0-7]*|[1-9][0-9]*)$/.exec(text.trim())
  if (!m || m[2] === undefined) return undefined
  const body = m[2]
  const value = /^0[0-7]+$/.test(body) ? BigInt(`0o${body.slice(1)}`) : BigInt(body)
  return m[1] === '-' ? -value : value
}

const FILE_WORD: Record<RegFile, string> = { x: 'an x register', f: 'an f register', v: 'a vector register' }

export interface OperandContext {
  line: number
  op: string
  /** Value of a constant symbol (`.equ`/`.set`) defined so far. */
  symbol?: (name: string) => bigint | undefined
  /** Lookup name of a symbol as written (numeric label references `1b`/`1f`). */
  rename?: (name: string) => string
}

/** Relocation operators of compiler output (RISC-V psABI, "Assembler Relocation Functions"). */
export type RelocOp = 'hi' | 'lo' | 'pcrel_hi' | 'pcrel_lo'

/** What parsing an operand adds: operand values, and a label or relocation to resolve after layout. */
export interface Parsed {
  /** `name` as written; `key` the symbol it is looked up by. */
  label?: { name: string; key: string; column: number }
  reloc?: { op: RelocOp; expr: Expr; column: number }
}

const RELOC = /^%(hi|lo|pcrel_hi|pcrel_lo)\s*\((.*)\)$/
const RELOC_KINDS: Partial<Record<OperandKind, RelocOp[]>> = {
  uimm20: ['hi', 'pcrel_hi'], simm12: ['lo', 'pcrel_lo'], load: ['lo', 'pcrel_lo'], store: ['lo', 'pcrel_lo'],
}

/** `%hi(sym)`-style operand text as a relocation, or undefined when it is none. */
export function parseReloc(kind: OperandKind, text: string, column: number, ctx: OperandContext): Parsed['reloc'] | SimDiagnostic | undefined {
  const m = RELOC.exec(text.trim())
  if (!m || m[1] === undefined || m[2] === undefined) return undefined
  const op = m[1] as RelocOp
  const loc = { line: ctx.line, column }
  if (!RELOC_KINDS[kind]?.includes(op)) return diag(loc, 'operand-kind', `${ctx.op}: %${op}(...) does not fit this operand`)
  const e = parseExpr(m[2], ctx.rename)
  if ('message' in e) return diag(loc, 'operand-kind', `${ctx.op}: ${e.message}`)
  return { op, expr: e, column }
}

function reg(file: RegFile, tok: Token, ctx: OperandContext): number | SimDiagnostic {
  const n = parseRegister(file, tok.text)
  if (n !== undefined) return n
  const other = registerFileOf(tok.text)
  const found = other ? `${FILE_WORD[other].replace(/^an? /, '')} '${tok.text}'` : `'${tok.text}'`
  return diag({ line: ctx.line, column: tok.column }, 'operand-kind', `${ctx.op}: expected ${FILE_WORD[file]}, found ${found}`)
}

/** Range-checks an immediate; `what` names it in the message. */
export function immediate(kind: OperandKind, text: string, column: number, ctx: OperandContext): number | SimDiagnostic {
  const loc = { line: ctx.line, column }
  const v = constant(text, ctx)
  if (typeof v !== 'bigint') return diag(loc, 'operand-kind', `${ctx.op}: ${v}`)
  const [lo, hi] = IMM_RANGE[kind] ?? [0, 0]
  if (v < BigInt(lo) || v > BigInt(hi)) {
    return diag(loc, 'imm-range', `${ctx.op}: immediate ${text} is out of range ${lo}..${hi}`)
  }
  return Number(v)
}

/**
 * An integer operand: a number, or an expression over numbers and constant
 * symbols defined earlier (`.equ AVL, 64`); a message when it is neither.
 */
export function constant(text: string, ctx: OperandContext): bigint | string {
  const direct = parseInteger(text)
  if (direct !== undefined) return direct
  const e = parseExpr(text, ctx.rename)
  if ('message' in e) return `expected an integer, found '${text}'`
  const r = evalExpr(e, (n) => ctx.symbol?.(n))
  if (r.ok) return r.value
  return r.missing && r.missing !== '.' ? `'${r.missing}' is not a constant defined before this line (.equ/.set), in '${text}'` : `expected an integer, found '${text}'`
}

const MEM = /^(.*?)\(\s*([A-Za-z0-9]+)\s*\)$/
const IDENT = /^[A-Za-z_.$][A-Za-z0-9_.$]*$/

/**
 * Parses `tok` as `kind` into `ops`. Returns a diagnostic, or what else the
 * caller must do (resolve a label).
 */
export function parseOperand(kind: OperandKind, tok: Token, ops: Operands, ctx: OperandContext): Parsed | SimDiagnostic {
  const spec = FIELDS[kind]
  const loc = { line: ctx.line, column: tok.column }
  const set = (v: number | SimDiagnostic, key = spec.key): Parsed | SimDiagnostic => {
    if (typeof v !== 'number') return v
    ;(ops as Record<string, number>)[key] = v
    return {}
  }
  switch (kind) {
    case 'xd': case 'xs1': case 'xs2': case 'fd': case 'fs1': case 'fs2':
    case 'vd': case 'vs1': case 'vs2': case 'vs3':
      return set(reg(spec.file ?? 'x', tok, ctx))
    case 'simm5': case 'uimm5': case 'avl5': case 'simm12': case 'shamt6': case 'shamt5': case 'uimm20': {
      const r = parseReloc(kind, tok.text, tok.column, ctx)
      if (r && 'code' in r) return r
      if (r) {
        ops.imm = 0
        return { reloc: r }
      }
      return set(immediate(kind, tok.text, tok.column, ctx))
    }
    case 'fs3':
      return set(reg('f', tok, ctx))
    case 'rm': {
      const n = (ROUNDING_MODES as readonly string[]).indexOf(tok.text.toLowerCase())
      if (n < 0 || n === 5 || n === 6) return diag(loc, 'operand-kind', `${ctx.op}: expected a rounding mode (rne, rtz, rdn, rup, rmm or dyn), found '${tok.text}'`)
      ops.rm = n
      return {}
    }
    case 'csr': {
      const n = csrNumber(tok.text)
      if (n !== undefined) {
        ops.csr = n
        return {}
      }
      const v = parseInteger(tok.text)
      if (v === undefined || v < 0n || v > 0xfffn) return diag(loc, 'operand-kind', `${ctx.op}: expected a CSR name (vl, vtype, vlenb, vstart, vxrm, vxsat, vcsr, fflags, frm, fcsr, ...) or number 0..4095, found '${tok.text}'`)
      ops.csr = Number(v)
      return {}
    }
    case 'pred': case 'succ': {
      const t = tok.text.toLowerCase() === '0' ? '' : tok.text.toLowerCase()
      if (!/^i?o?r?w?$/.test(t) || tok.text === '') return diag(loc, 'operand-kind', `${ctx.op}: expected a fence set of i, o, r, w in that order (e.g. rw), found '${tok.text}'`)
      ops[kind] = (t.includes('i') ? 8 : 0) | (t.includes('o') ? 4 : 0) | (t.includes('r') ? 2 : 0) | (t.includes('w') ? 1 : 0)
      return {}
    }
    case 'load': case 'store': case 'vaddr': {
      const m = MEM.exec(tok.text)
      const shape = kind === 'vaddr' ? '(rs1)' : 'offset(rs1)'
      if (!m || m[1] === undefined || m[2] === undefined) return diag(loc, 'operand-kind', `${ctx.op}: expected a memory operand ${shape}, found '${tok.text}'`)
      const base = reg('x', { text: m[2], column: tok.column + tok.text.indexOf('(') + 1 }, ctx)
      if (typeof base !== 'number') return base
      ops.rs1 = base
      const offText = m[1].trim()
      if (kind === 'vaddr') {
        if (offText !== '' && parseInteger(offText) !== 0n) return diag(loc, 'operand-kind', `${ctx.op}: vector memory operands take no offset: write (${m[2]})`)
        return {}
      }
      const r = offText === '' ? undefined : parseReloc(kind, offText, tok.column, ctx)
      if (r && 'code' in r) return r
      if (r) {
        ops.imm = 0
        return { reloc: r }
      }
      return set(offText === '' ? 0 : immediate(kind, offText, tok.column, ctx), 'imm')
    }
    case 'branch': case 'jump': {
      const name = tok.text.replace(/@plt$/, '')
      if (!IDENT.test(name) && !/^[0-9]+[bf]$/.test(name)) return diag(loc, 'operand-kind', `${ctx.op}: expected a label, found '${tok.text}'`)
      return { label: { name, key: ctx.rename ? ctx.rename(name) : name, column: tok.column } }
    }
    case 'vm':
      if (tok.text.toLowerCase() === 'v0.t') {
        ops.vm = false
        return {}
      }
      return diag(loc, 'bad-mask', `${ctx.op}: only v0.t can mask an instruction, found '${tok.text}'`)
    case 'v0':
      if (tok.text.toLowerCase() === 'v0') {
        ops.vm = false
        return {}
      }
      return diag(loc, 'operand-kind', `${ctx.op}: the last operand must be v0 (the merge mask), found '${tok.text}'`)
    case 'vtypei11': case 'vtypei10':
      return parseVtypeOperand(kind, [tok], ops, ctx)
  }
}

/** The vtype operand: the remaining tokens (`e32, m4, ta, ma`) or one integer. */
export function parseVtypeOperand(kind: 'vtypei11' | 'vtypei10', toks: Token[], ops: Operands, ctx: OperandContext): Parsed | SimDiagnostic {
  const first = toks[0]
  if (!first) return diag({ line: ctx.line, column: 1 }, 'operand-count', `${ctx.op}: missing vtype (e.g. e32, m4, ta, ma)`)
  if (toks.length === 1 && parseInteger(first.text) !== undefined) {
    const v = immediate(kind, first.text, first.column, ctx)
    if (typeof v !== 'number') return v
    ops.vtypei = v
    return {}
  }
  const r = parseVtypeTokens(toks.map((t) => t.text))
  if (!r.ok) return diag({ line: ctx.line, column: toks[r.index]?.column ?? first.column }, 'bad-vtype', `${ctx.op}: ${r.message}`)
  ops.vtypei = encodeVtype(r.vtype)
  return {}
}
