/**
 * The assembler: RISC-V assembly text with the V 1.0 extension to a Program.
 * Two passes: the first lays out instructions and data and collects labels,
 * the second resolves labels and checks vector register groups. It never
 * throws on user input: every problem is a SimDiagnostic with line and column.
 *
 * Layout: text at `textBase` (default 0x10000, the start of the text segment
 * of riscv64-linux-gnu-ld's default linker script), data at the next 4 KiB
 * boundary after the text. Programs only depend on pc-relative `la`, so the
 * exact bases do not change their results. `.origin ADDRESS` at the start of
 * the text or of the data places it at that address instead (Chimeline's own
 * directive: an imported executable keeps the addresses of its file).
 * Instructions take 4 bytes, the RV64C forms written as `c.addi` ... 2.
 */
import { compressedForm, compressedWord, expandedArgs, formatCompressed } from './compressed'
import { applyDirective, isDirective, writeInt, type DataFixup, type DataState, type Section } from './directives'
import { evalExpr, parseExpr, type Expr } from './expr'
import { diag, nearest } from './diagnostics'
import type { OperandKind } from './fields'
import { formatInstruction } from './format'
import { lexLine, type Token } from './lexer'
import { parseOperand, parseVtypeOperand, type OperandContext, type Parsed } from './operands'
import { PSEUDOS, pseudoNamed, type Expansion } from './pseudo'
import { OPS, opInfo, type OpInfo } from './table'
import type { Instruction, Operands, Program, SimDiagnostic, SourceLoc } from './types'
import { checkVectorOperands, type CheckedInstruction } from './vcheck'

export interface AssembleOptions {
  /** Base address of the text segment (default 0x10000; must be a multiple of 4096). */
  textBase?: number
  /** Largest accepted source, in characters (default 1,000,000). */
  maxSourceLength?: number
  /** Most instructions after pseudo expansion (default 100,000). */
  maxInstructions?: number
  /** Largest data segment in bytes (default 16 MiB). */
  maxDataBytes?: number
  /** Stop after this many diagnostics (default 100). */
  maxErrors?: number
}

export type AssembleResult = { ok: true; program: Program } | { ok: false; errors: SimDiagnostic[] }

export const ASSEMBLE_DEFAULTS = {
  textBase: 0x10000,
  maxSourceLength: 1_000_000,
  maxInstructions: 100_000,
  maxDataBytes: 16 * 1024 * 1024,
  maxErrors: 100,
} as const satisfies Required<AssembleOptions>

interface Pending extends CheckedInstruction {
  /** The c. form it was written as (2 bytes), else absent (4 bytes). */
  compressed?: string
  label?: NonNullable<Parsed['label']>
  reloc?: NonNullable<Parsed['reloc']> | { op: 'pcrel_lo_prev'; expr: Expr; column: number }
}

const MNEMONICS: readonly string[] = [...OPS.map((o) => o.op), ...Object.keys(PSEUDOS)]
const NOP: Operands = { rd: 0, rs1: 0, imm: 0 }

function usage(info: OpInfo): string {
  const names: Partial<Record<OperandKind, string>> = { xd: 'rd', fd: 'fd', xs1: 'rs1', fs1: 'fs1', xs2: 'rs2', fs2: 'fs2', fs3: 'fs3', load: 'offset(rs1)', store: 'offset(rs1)', vaddr: '(rs1)', branch: 'label', jump: 'label', simm5: 'imm', uimm5: 'uimm', avl5: 'uimm', simm12: 'imm', shamt6: 'shamt', shamt5: 'shamt', uimm20: 'imm', vtypei11: 'vtype', vtypei10: 'vtype' }
  const parts = info.syntax.filter((k) => k !== 'vm' && k !== 'rm').map((k) => names[k] ?? k)
  return parts.join(', ') + (info.syntax.includes('vm') ? '[, v0.t]' : '') + (info.syntax.includes('rm') ? '[, rounding mode]' : '')
}

/** Parses a real instruction's operand tokens against its table syntax. */
function parseReal(info: OpInfo, args: Token[], loc: SourceLoc, ctx: OperandContext): Pending | SimDiagnostic {
  const syntax = info.syntax
  const optionalMask = syntax[syntax.length - 1] === 'vm' || syntax[syntax.length - 1] === 'rm'
  const required = optionalMask ? syntax.length - 1 : syntax.length
  const vtypeLast = syntax[syntax.length - 1] === 'vtypei11' || syntax[syntax.length - 1] === 'vtypei10'
  const countOk = vtypeLast ? args.length >= required : args.length === required || (optionalMask && args.length === required + 1)
  if (!countOk) {
    const at = args[Math.min(args.length, required)] ?? args[args.length - 1]
    return diag({ line: loc.line, column: at?.column ?? loc.column }, 'operand-count',
      `${info.op} takes ${usage(info) || 'no operands'}; found ${args.length} operand${args.length === 1 ? '' : 's'}`)
  }
  const operands: Operands = {}
  const p: Pending = { info, operands, address: 0, loc, columns: {} }
  for (let i = 0; i < syntax.length; i++) {
    const kind = syntax[i] as OperandKind
    const tok = args[i]
    if (tok === undefined) break // the optional v0.t was left out
    const octx = { ...ctx, line: loc.line, op: info.op }
    const r = kind === 'vtypei11' || kind === 'vtypei10'
      ? parseVtypeOperand(kind, args.slice(i), operands, octx)
      : parseOperand(kind, tok, operands, octx)
    if ('code' in r) return r
    if (r.label) p.label = r.label
    if (r.reloc) p.reloc = r.reloc
    for (const key of ['rd', 'rs1', 'rs2', 'vd', 'vs1', 'vs2', 'imm'] as const) {
      if (operands[key] !== undefined && p.columns[key] === undefined) p.columns[key] = tok.column
    }
    if (kind === 'vtypei11' || kind === 'vtypei10') break
  }
  if (info.vector && operands.vm === undefined) operands.vm = true
  if (info.rmDefault !== undefined && operands.rm === undefined) operands.rm = info.rmDefault
  return p
}

/** Where a numeric label's definitions are, for `1b` / `1f` (GNU as local labels). */
const NUMERIC_REF = /^([0-9]+)([bf])$/
const localKey = (n: string, k: number): string => `${n}\u0000${k}`

/**
 * Assembles RISC-V assembly text: the V 1.0 extension, RV64GC's scalar
 * instructions, and the directives and syntax of compiler output.
 * @example assemble('vsetvli t0, a0, e32, m4, ta, ma\nvle32.v v4, (a1)')
 */
export function assemble(text: string, options: AssembleOptions = {}): AssembleResult {
  const opt = { ...ASSEMBLE_DEFAULTS, ...options }
  if (text.length > opt.maxSourceLength) {
    return { ok: false, errors: [diag({ line: 1, column: 1 }, 'too-large', `the source is ${text.length} characters; the limit is ${opt.maxSourceLength}`)] }
  }
  const errors: SimDiagnostic[] = []
  const report = (d: SimDiagnostic | undefined): void => {
    if (d && errors.length < opt.maxErrors) errors.push(d)
  }
  const code: Pending[] = []
  const data: DataState = { bytes: new Uint8Array(256), size: 0, maxBytes: opt.maxDataBytes }
  let section: Section = 'text'
  const textLabels = new Map<string, { index: number; offset: number; loc: SourceLoc }>()
  const dataLabels = new Map<string, { offset: number; loc: SourceLoc }>()
  const constants = new Map<string, { value: bigint; loc: SourceLoc }>()
  const numericCount = new Map<string, number>()
  const fixups: DataFixup[] = []
  let tooMany = false
  /** Bytes of text so far; `.origin` of the text and of the data. */
  let textSize = 0
  let textOrigin: number | undefined
  let dataOrigin: { address: number; loc: SourceLoc } | undefined
  const push = (p: Pending): void => {
    p.address = textSize // an offset until the layout adds the base
    code.push(p)
    textSize += p.compressed ? 2 : 4
  }

  // `1b` is the latest definition of 1 so far, `1f` the next one.
  const rename = (name: string): string => {
    const m = NUMERIC_REF.exec(name)
    if (!m || m[1] === undefined) return name
    const n = numericCount.get(m[1]) ?? 0
    return localKey(m[1], m[2] === 'b' ? n : n + 1)
  }
  const symbol = (name: string): bigint | undefined => constants.get(name)?.value
  const operandCtx: OperandContext = { line: 0, op: '', symbol, rename }
  const defineConstant = (name: string, value: bigint, loc: SourceLoc): SimDiagnostic | undefined => {
    const prev = textLabels.get(name)?.loc ?? dataLabels.get(name)?.loc
    if (prev) return diag(loc, 'duplicate-label', `'${name}' is already a label on line ${prev.line}`)
    constants.set(name, { value, loc })
    return undefined
  }

  const lines = text.split(/\r\n|\n|\r/)
  for (let li = 0; li < lines.length && errors.length < opt.maxErrors && !tooMany; li++) {
    const lineNo = li + 1
    const lexed = lexLine(lines[li] ?? '', lineNo)
    if ('code' in lexed) {
      report(lexed)
      continue
    }
    for (const l of lexed.labels) {
      const loc = { line: lineNo, column: l.column }
      if (section === 'other') continue
      let key = l.text
      if (/^[0-9]+$/.test(l.text)) {
        const n = (numericCount.get(l.text) ?? 0) + 1
        numericCount.set(l.text, n)
        key = localKey(l.text, n)
      } else {
        const prev = textLabels.get(key)?.loc ?? dataLabels.get(key)?.loc ?? constants.get(key)?.loc
        if (prev) {
          report(diag(loc, 'duplicate-label', `label '${l.text}' is already defined on line ${prev.line}`))
          continue
        }
      }
      if (section === 'text') textLabels.set(key, { index: code.length, offset: textSize, loc })
      else dataLabels.set(key, { offset: data.size, loc })
    }
    const m = lexed.mnemonic
    if (!m) continue
    const loc = { line: lineNo, column: m.column }
    const name = m.text.toLowerCase()
    if (name === '.origin') {
      const where = originOf(lexed.operands, loc, section, section === 'text' ? code.length > 0 : data.size > 0, operandCtx)
      if ('code' in where) report(where)
      else if (section === 'text') textOrigin = where.address
      else if (section === 'data') dataOrigin = { address: where.address, loc }
      continue
    }
    if (isDirective(name)) {
      const r = applyDirective(name, lexed.operands, loc, { section, data, textBytes: (textOrigin ?? opt.textBase) + textSize, symbol, rename, defineConstant, fixups })
      report(r.error)
      if (r.section) section = r.section
      // Padding with nops as GNU as does: 4-byte ones, and a c.nop for a 2-byte remainder.
      for (let k = r.textPadding ?? 0; k > 0; k -= k >= 4 ? 4 : 2) {
        push({ info: opInfo('addi') as OpInfo, operands: { ...NOP }, address: 0, loc, columns: {}, ...(k >= 4 ? {} : { compressed: 'c.nop' }) })
      }
      continue
    }
    if (section !== 'text') {
      report(diag(loc, 'instruction-in-data', `instruction '${m.text}' in ${section === 'data' ? 'the data section' : 'a section that is not .text'}: put it after .text`))
      continue
    }
    let expansions: Expansion[] | SimDiagnostic
    const pseudo = pseudoNamed(name)
    const info = opInfo(name)
    const cform = compressedForm(name)
    if (cform) {
      const args = expandedArgs(cform, lexed.operands, (text, like) => ({ text, column: like.column }))
      expansions = typeof args === 'number'
        ? diag(loc, 'operand-count', `${name} takes ${args} operand${args === 1 ? '' : 's'}; found ${lexed.operands.length}`)
        : [{ op: cform.op, args }]
    } else if (pseudo && (!info || pseudo.applies(lexed.operands))) {
      expansions = pseudo.applies(lexed.operands)
        ? pseudo.expand(lexed.operands, m, lineNo, operandCtx)
        : diag(loc, 'operand-count', `${name} takes ${pseudo.usage || 'no operands'}; found ${lexed.operands.length} operand${lexed.operands.length === 1 ? '' : 's'}`)
    } else if (info) expansions = [{ op: name, args: lexed.operands }]
    else {
      const near = nearest(name, MNEMONICS)
      report(diag(loc, 'unknown-mnemonic', `unknown instruction '${m.text}'${near ? `; did you mean '${near}'?` : ''}`))
      continue
    }
    if ('code' in expansions) {
      report(expansions)
      continue
    }
    for (const e of expansions) {
      const einfo = opInfo(e.op) as OpInfo
      let p: Pending | SimDiagnostic
      if ('args' in e) p = parseReal(einfo, e.args, loc, operandCtx)
      else {
        p = { info: einfo, operands: { ...e.operands }, address: 0, loc, columns: {} }
        if (e.reloc) p.reloc = e.reloc
        if (einfo.vector) p.operands.vm = true
        if (einfo.rmDefault !== undefined && p.operands.rm === undefined) p.operands.rm = einfo.rmDefault
      }
      if ('code' in p) {
        report(p)
        break
      }
      if (cform) p.compressed = cform.name
      push(p)
    }
    if (code.length > opt.maxInstructions) {
      report(diag(loc, 'too-many-instructions', `more than ${opt.maxInstructions} instructions (after expanding pseudo-instructions)`))
      tooMany = true
    }
  }
  report(data.error)
  if (errors.length) return { ok: false, errors }

  // ---- layout and symbol resolution ----
  const textBase = textOrigin ?? opt.textBase
  const textEnd = textBase + textSize
  const dataBase = dataOrigin?.address ?? Math.ceil(textEnd / 4096) * 4096
  if (dataOrigin && data.size > 0 && dataBase < textEnd && dataBase + data.size > textBase) {
    report(diag(dataOrigin.loc, 'bad-directive', `.origin: the data at 0x${dataBase.toString(16)} would overlap the text (0x${textBase.toString(16)}..0x${(textEnd - 1).toString(16)})`))
    return { ok: false, errors }
  }
  // No prototype: a label may be called __proto__ or constructor.
  const symbols = Object.create(null) as Record<string, number>
  for (const [n, c] of constants) symbols[n] = Number(c.value)
  for (const [n, l] of textLabels) symbols[n] = textBase + l.offset
  for (const [n, l] of dataLabels) symbols[n] = dataBase + l.offset
  for (const p of code) p.address += textBase
  const shown = (key: string): string => key.split('\u0000')[0] ?? key
  const lookup = (name: string): bigint | undefined => (name in symbols ? BigInt(symbols[name] as number) : undefined)
  const resolveExpr = (e: Expr, column: number, line: number, dot?: number): bigint | undefined => {
    const r = evalExpr(e, lookup, dot === undefined ? undefined : BigInt(dot))
    if (r.ok) return r.value
    if (r.missing && r.missing !== '.') {
      const near = nearest(r.missing, Object.keys(symbols).filter((k) => !k.includes('\u0000')))
      // A local label's key is `N\0k`: k = 0 is a `Nb` with no definition before, else a `Nf` with none after.
      const backward = r.missing.endsWith('\u00000')
      report(diag({ line, column }, 'undefined-label', r.missing.includes('\u0000')
        ? `no local label '${shown(r.missing)}${backward ? 'b' : 'f'}' ${backward ? 'before' : 'after'} this line`
        : `undefined label '${r.missing}'${near ? `; did you mean '${near}'?` : ''}`))
    } else report(diag({ line, column }, 'operand-kind', r.message))
    return undefined
  }
  // %pcrel_hi targets by the address of their auipc, for %pcrel_lo(label).
  const pcrelHi = new Map<number, bigint>()
  for (const p of code) {
    if (p.reloc?.op !== 'pcrel_hi') continue
    const v = resolveExpr(p.reloc.expr, p.reloc.column, p.loc.line)
    if (v !== undefined) pcrelHi.set(p.address, v - BigInt(p.address))
  }
  const hi20 = (v: bigint): number => Number(BigInt.asUintN(20, (v + 0x800n) >> 12n))
  const lo12 = (v: bigint): number => Number(BigInt.asIntN(12, v))
  for (const p of code) {
    if (p.label) {
      const a = lookup(p.label.key)
      if (a === undefined) {
        resolveExpr({ kind: 'sym', name: p.label.key }, p.label.column, p.loc.line)
        continue
      }
      const off = Number(a) - p.address
      const isJump = p.info.op === 'jal'
      const [lo, hi] = isJump ? [-(1 << 20), (1 << 20) - 2] : [-4096, 4094]
      if (off < lo || off > hi) report(diag({ line: p.loc.line, column: p.label.column }, 'imm-range', `${p.info.op}: '${p.label.name}' is ${off} bytes away; the reach is ${lo}..${hi}`))
      p.operands.imm = off
      p.columns.imm = p.label.column
    } else if (p.reloc) {
      const r = p.reloc
      const at = { line: p.loc.line, column: r.column }
      if (r.op === 'pcrel_hi') {
        const off = pcrelHi.get(p.address)
        if (off !== undefined) p.operands.imm = hi20(off)
      } else if (r.op === 'pcrel_lo') {
        // The operand names the label of the auipc whose %pcrel_hi this completes (psABI).
        const a = resolveExpr(r.expr, r.column, p.loc.line)
        if (a === undefined) continue
        const off = pcrelHi.get(Number(a))
        if (off === undefined) report(diag(at, 'operand-kind', `${p.info.op}: %pcrel_lo names 0x${a.toString(16)}, which is no auipc with %pcrel_hi`))
        else p.operands.imm = lo12(off)
      } else {
        const v = resolveExpr(r.expr, r.column, p.loc.line)
        if (v === undefined) continue
        if (r.op === 'hi') p.operands.imm = hi20(v)
        else if (r.op === 'lo') p.operands.imm = lo12(v)
        else p.operands.imm = lo12(v - BigInt(p.address - 4)) // the low part of the auipc just before (la, call, tail)
      }
    }
  }
  for (const p of code) {
    if (!p.compressed) continue
    const form = compressedForm(p.compressed)
    if (form && compressedWord(form, p.info.op, p.operands) === undefined) {
      report(diag(p.loc, 'no-compressed-form', `${p.compressed}: ${formatCompressed(form, p.operands, p.label?.name)} has no 16-bit encoding (3-bit register fields take x8..x15, s0-s1 and a0-a5; immediates have a smaller range and some must be non-zero or aligned)`))
    }
  }
  for (const f of fixups) {
    const v = resolveExpr(f.expr, f.loc.column, f.loc.line, dataBase + f.dot)
    if (v !== undefined) writeInt(data.bytes, f.offset, f.size, v)
  }
  if (errors.length) return { ok: false, errors }
  for (const d of checkVectorOperands(code, textLabels.get('_start')?.index)) report(d)
  if (errors.length) return { ok: false, errors }

  const instructions: Instruction[] = code.map((p) => {
    const label = p.label?.name
    const ins: Instruction = {
      op: p.info.op, operands: p.operands, address: p.address,
      text: formatInstruction(p.info, p.operands, p.address, label), loc: p.loc,
    }
    if (label) ins.label = label
    if (p.compressed) ins.compressed = p.compressed
    return ins
  })
  const visible = [...dataLabels.entries()].filter(([n]) => !n.includes('\u0000'))
  const sorted = visible.sort((x, y) => x[1].offset - y[1].offset)
  for (const k of Object.keys(symbols)) if (k.includes('\u0000')) delete symbols[k]
  const start = textLabels.get('_start')
  const program: Program = {
    instructions, textBase, data: data.bytes.slice(0, data.size), dataBase, symbols,
    dataLabels: sorted.map(([name, l], i) => ({
      name, address: dataBase + l.offset, size: (sorted[i + 1]?.[1].offset ?? data.size) - l.offset, loc: l.loc,
    })),
  }
  if (start) program.entry = textBase + start.offset
  return { ok: true, program }
}

/** The address of `.origin ADDRESS`, allowed once at the start of the text or of the data. */
function originOf(args: Token[], loc: SourceLoc, section: Section, started: boolean, ctx: OperandContext): { address: number } | SimDiagnostic {
  const t = args[0]
  if (section === 'other') return diag(loc, 'bad-directive', '.origin places the text or the data: use it after .text or .data')
  if (started) return diag(loc, 'bad-directive', `.origin must come before the first ${section === 'text' ? 'instruction' : 'data'} of the ${section}`)
  const e = t && args.length === 1 ? parseExpr(t.text, ctx.rename) : undefined
  const v = e && !('message' in e) ? evalExpr(e, (n) => ctx.symbol?.(n)) : undefined
  if (!v?.ok || v.value < 0n || v.value >= 1n << 48n || (section === 'text' && v.value % 2n !== 0n)) {
    return diag({ line: loc.line, column: t?.column ?? loc.column }, 'bad-directive', `.origin takes one address${section === 'text' ? ' (even, as instructions are 2-byte aligned)' : ''}: .origin 0x10000`)
  }
  return { address: Number(v.value) }
}
