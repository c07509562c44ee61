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
}

/** What parsing an operand adds: operand values, and a label to resolve later. */
export interface Parsed {
  label?: { name: string; column: number }
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
  const v = parseInteger(text)
  const loc = { line: ctx.line, column }
  if (v === undefined) return diag(loc, 'operand-kind', `${ctx.op}: expected an integer, found '${text}'`)
  const [lo, hi] = IMM_RANGE[kind] ?? [0, 0]
  if (v < BigInt(lo) || v > BigInt(hi)) {
    return diag(loc, 'imm-range', `${ctx.op}: immediate ${text} is out of range ${lo}..${hi}`)
  }
  return Number(v)
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
    case 'simm5': case 'uimm5': case 'avl5': case 'simm12': case 'shamt6': case 'uimm20':
      return set(immediate(kind, tok.text, tok.column, ctx))
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
      return set(offText === '' ? 0 : immediate(kind, offText, tok.column, ctx), 'imm')
    }
    case 'branch': case 'jump':
      if (!IDENT.test(tok.text)) return diag(loc, 'operand-kind', `${ctx.op}: expected a label, found '${tok.text}'`)
      return { label: { name: tok.text, column: tok.column } }
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
