/**
 * The assembler: RISC-V assembly text with the V 1.0 extension to a Program.
 * Two passes: the first lays out instructions and data and collects labels,
 * the second resolves labels and checks vector register groups. It never
 * throws on user input: every problem is a SimDiagnostic with line and column.
 *
 * Layout: text at `textBase` (default 0x10000, the start of the text segment
 * of riscv64-linux-gnu-ld's default linker script), data at the next 4 KiB
 * boundary after the text. Programs only depend on pc-relative `la`, so the
 * exact bases do not change their results.
 */
import { applyDirective, isDirective, type DataState } from './directives'
import { diag, nearest } from './diagnostics'
import type { OperandKind } from './fields'
import { formatInstruction } from './format'
import { lexLine, type Token } from './lexer'
import { parseOperand, parseVtypeOperand } from './operands'
import { PSEUDOS, pseudoNamed, type Expansion } from './pseudo'
import { OPS, opInfo, type OpInfo } from './table'
import type { Instruction, Operands, Program, SimDiagnostic, SourceLoc } from './types'
import { isUnsupportedVector } from './unsupported'
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
  label?: { name: string; column: number }
  pcrel?: { part: 'hi' | 'lo'; label: string; column: number }
  /** Address of the auipc a `lo` part is relative to. */
  pcrelBase?: number
}

const MNEMONICS: readonly string[] = [...OPS.map((o) => o.op), ...Object.keys(PSEUDOS)]

function usage(info: OpInfo): string {
  const names: Partial<Record<OperandKind, string>> = { xd: 'rd', fd: 'fd', xs1: 'rs1', fs1: 'fs1', xs2: 'rs2', fs2: 'fs2', load: 'offset(rs1)', store: 'offset(rs1)', vaddr: '(rs1)', branch: 'label', jump: 'label', simm5: 'imm', uimm5: 'uimm', avl5: 'uimm', simm12: 'imm', shamt6: 'shamt', uimm20: 'imm', vtypei11: 'vtype', vtypei10: 'vtype' }
  const parts = info.syntax.filter((k) => k !== 'vm').map((k) => names[k] ?? k)
  return parts.join(', ') + (info.syntax.includes('vm') ? '[, v0.t]' : '')
}

/** Parses a real instruction's operand tokens against its table syntax. */
function parseReal(info: OpInfo, args: Token[], loc: SourceLoc): Pending | SimDiagnostic {
  const syntax = info.syntax
  const optionalMask = syntax[syntax.length - 1] === 'vm'
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
    const ctx = { line: loc.line, op: info.op }
    const r = kind === 'vtypei11' || kind === 'vtypei10'
      ? parseVtypeOperand(kind, args.slice(i), operands, ctx)
      : parseOperand(kind, tok, operands, ctx)
    if ('code' in r) return r
    if (r.label) p.label = r.label
    for (const key of ['rd', 'rs1', 'rs2', 'vd', 'vs1', 'vs2', 'imm'] as const) {
      if (operands[key] !== undefined && p.columns[key] === undefined) p.columns[key] = tok.column
    }
    if (kind === 'vtypei11' || kind === 'vtypei10') break
  }
  if (info.vector && operands.vm === undefined) operands.vm = true
  return p
}

/**
 * Assembles RISC-V V 1.0 assembly text.
 * @example assemble('vsetvli t0, a0, e32, m4, ta, ma\nvle32.v v4, (a1)')
 */
export function assemble(text: string, options: AssembleOptions = {}): AssembleResult {
  const opt = { ...ASSEMBLE_DEFAULTS, ...options }
  if (text.length > opt.maxSourceLength) {
    return { ok: false, errors: [diag({ line: 1, column: 1 }, 'too-large', `the source is ${text.length} characters; the limit is ${opt.maxSourceLength}`)] }
  }
  const errors: SimDiagnostic[] = []
  const report = (d: SimDiagnostic): void => {
    if (errors.length < opt.maxErrors) errors.push(d)
  }
  const code: Pending[] = []
  const data: DataState = { bytes: new Uint8Array(256), size: 0, maxBytes: opt.maxDataBytes }
  let section: 'text' | 'data' = 'text'
  const textLabels = new Map<string, { index: number; loc: SourceLoc }>()
  const dataLabels = new Map<string, { offset: number; loc: SourceLoc }>()
  let tooMany = false

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
      const prev = textLabels.get(l.text)?.loc ?? dataLabels.get(l.text)?.loc
      if (prev) report(diag(loc, 'duplicate-label', `label '${l.text}' is already defined on line ${prev.line}`))
      else if (section === 'text') textLabels.set(l.text, { index: code.length, loc })
      else dataLabels.set(l.text, { offset: data.size, loc })
    }
    const m = lexed.mnemonic
    if (!m) continue
    const loc = { line: lineNo, column: m.column }
    const name = m.text.toLowerCase()
    if (isDirective(name)) {
      const r = applyDirective(name, lexed.operands, loc, section, data, code.length * 4)
      if (r.error) report(r.error)
      if (r.section) section = r.section
      for (let k = 0; k < (r.textPadding ?? 0); k++) code.push({ info: opInfo('addi') as OpInfo, operands: { rd: 0, rs1: 0, imm: 0 }, address: 0, loc, columns: {} })
      continue
    }
    if (section !== 'text') {
      report(diag(loc, 'instruction-in-data', `instruction '${m.text}' in the data section: put it after .text`))
      continue
    }
    let expansions: Expansion[] | SimDiagnostic
    const pseudo = pseudoNamed(name)
    const info = opInfo(name)
    if (pseudo && (!info || pseudo.applies(lexed.operands))) {
      expansions = pseudo.applies(lexed.operands)
        ? pseudo.expand(lexed.operands, m, lineNo)
        : diag(loc, 'operand-count', `${name} takes ${pseudo.usage || 'no operands'}; found ${lexed.operands.length} operand${lexed.operands.length === 1 ? '' : 's'}`)
    } else if (info) expansions = [{ op: name, args: lexed.operands }]
    else if (isUnsupportedVector(name)) {
      report(diag(loc, 'unsupported', `not supported yet: ${name} (see README, Supported instructions)`))
      continue
    } else {
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
      if ('args' in e) p = parseReal(einfo, e.args, loc)
      else {
        p = { info: einfo, operands: { ...e.operands }, address: 0, loc, columns: {}, pcrel: e.pcrel }
        if (einfo.vector) p.operands.vm = true
      }
      if ('code' in p) {
        report(p)
        break
      }
      code.push(p)
    }
    if (code.length > opt.maxInstructions) {
      report(diag(loc, 'too-many-instructions', `more than ${opt.maxInstructions} instructions (after expanding pseudo-instructions)`))
      tooMany = true
    }
  }
  if (data.error) report(data.error)
  if (errors.length) return { ok: false, errors }

  // ---- layout and label resolution ----
  const textBase = opt.textBase
  const textEnd = textBase + code.length * 4
  const dataBase = Math.ceil(textEnd / 4096) * 4096
  // No prototype: a label may be called __proto__ or constructor.
  const symbols = Object.create(null) as Record<string, number>
  for (const [n, l] of textLabels) symbols[n] = textBase + l.index * 4
  for (const [n, l] of dataLabels) symbols[n] = dataBase + l.offset
  code.forEach((p, i) => {
    p.address = textBase + i * 4
  })
  const resolve = (name: string, column: number, line: number): number | undefined => {
    const a = symbols[name]
    if (a === undefined) {
      const near = nearest(name, Object.keys(symbols))
      report(diag({ line, column }, 'undefined-label', `undefined label '${name}'${near ? `; did you mean '${near}'?` : ''}`))
    }
    return a
  }
  let hiAddress = 0
  for (const p of code) {
    if (p.label) {
      const a = resolve(p.label.name, p.label.column, p.loc.line)
      if (a === undefined) continue
      const off = a - p.address
      const isJump = p.info.op === 'jal'
      const [lo, hi] = isJump ? [-(1 << 20), (1 << 20) - 2] : [-4096, 4094]
      if (off < lo || off > hi) report(diag({ line: p.loc.line, column: p.label.column }, 'imm-range', `${p.info.op}: '${p.label.name}' is ${off} bytes away; the reach is ${lo}..${hi}`))
      p.operands.imm = off
      p.columns.imm = p.label.column
    } else if (p.pcrel) {
      const a = resolve(p.pcrel.label, p.pcrel.column, p.loc.line)
      if (p.pcrel.part === 'hi') hiAddress = p.address
      if (a === undefined) continue
      const off = a - hiAddress
      const low = (off << 20) >> 20
      p.operands.imm = p.pcrel.part === 'hi' ? ((off - low) >> 12) & 0xfffff : low
    }
  }
  if (errors.length) return { ok: false, errors }
  for (const d of checkVectorOperands(code, textBase)) report(d)
  if (errors.length) return { ok: false, errors }

  const instructions: Instruction[] = code.map((p) => {
    const label = p.label?.name
    const ins: Instruction = {
      op: p.info.op, operands: p.operands, address: p.address,
      text: formatInstruction(p.info, p.operands, p.address, label), loc: p.loc,
    }
    if (label) ins.label = label
    return ins
  })
  const sorted = [...dataLabels.entries()].sort((x, y) => x[1].offset - y[1].offset)
  const program: Program = {
    instructions, textBase, data: data.bytes.slice(0, data.size), dataBase, symbols,
    dataLabels: sorted.map(([name, l], i) => ({
      name, address: dataBase + l.offset, size: (sorted[i + 1]?.[1].offset ?? data.size) - l.offset, loc: l.loc,
    })),
  }
  return { ok: true, program }
}
