/**
 * The Bench's table of named data: the labels of the program's data section
 * with the values their directives give, and edits written back into the
 * program text. Editing the text (rather than keeping an override beside it)
 * keeps the program self-contained: the exported .s file, the editor's undo
 * and the assembler all see the same values.
 *
 * A label owns the data directives that follow it, up to the next label or
 * section change. Integer (.byte .. .dword) and float (.float, .double)
 * directives are editable; reserved space (.zero, .space, .skip) is shown with
 * its size but not edited.
 *
 * @example
 *   const [x] = dataEntries('.data\nx: .float 1.0, 2.0\n')
 *   setEntryValues(text, x, ['3.0', '4.0']) // { ok: true, text: '.data\nx: .float 3.0, 4.0\n' }
 */
import { lexLine, type Token } from '@shared/sim/isa/lexer'
import { parseInteger } from '@shared/sim/isa/operands'

const INT_BYTES: Record<string, number> = {
  '.byte': 1, '.half': 2, '.2byte': 2, '.short': 2, '.word': 4, '.4byte': 4, '.long': 4, '.dword': 8, '.8byte': 8, '.quad': 8,
}
const FLOAT_BYTES: Record<string, number> = { '.float': 4, '.single': 4, '.double': 8 }
const RESERVE = new Set(['.zero', '.space', '.skip'])
const DATA_SECTIONS = new Set(['.data', '.rodata', '.bss', '.sdata'])
/** A float as GNU as accepts it (decimal, exponent, inf, nan). */
const FLOAT = /^[+-]?((\d+\.?\d*|\.\d+)([eE][+-]?\d+)?|inf|infinity|nan)$/i

export type DataKind = 'int' | 'float' | 'reserve'

export interface DataValue extends Token {
  line: number
}

export interface DataEntry {
  name: string
  /** 1-based line of the label. */
  line: number
  /** The first directive, e.g. '.float'. */
  directive: string
  kind: DataKind
  /** Bytes per value (int, float); for reserve, the bytes reserved. */
  bytes: number
  values: DataValue[]
  /** Lines (1-based) of this label's data directives. */
  lines: number[]
  /** False when the label mixes directives of different kinds or sizes. */
  editable: boolean
}

function directiveKind(name: string): { kind: DataKind; bytes: number } | null {
  if (name in INT_BYTES) return { kind: 'int', bytes: INT_BYTES[name] ?? 0 }
  if (name in FLOAT_BYTES) return { kind: 'float', bytes: FLOAT_BYTES[name] ?? 0 }
  if (RESERVE.has(name)) return { kind: 'reserve', bytes: 0 }
  return null
}

/** The named data of a program text, in source order. Lines that do not lex are skipped (the linter reports them). */
export function dataEntries(text: string): DataEntry[] {
  const lines = text.split('\n')
  const out: DataEntry[] = []
  let inData = false
  let current: DataEntry | null = null
  let pendingLabel: { name: string; line: number } | null = null
  lines.forEach((source, i) => {
    const line = i + 1
    const lexed = lexLine(source, line)
    if (!('labels' in lexed)) return
    for (const l of lexed.labels) {
      pendingLabel = { name: l.text, line }
      current = null
    }
    const m = lexed.mnemonic?.text
    if (!m) return
    if (m === '.text' || (m === '.section' && !/^\.(data|rodata|bss|sdata)/.test(lexed.operands[0]?.text ?? ''))) {
      inData = false
      current = null
      pendingLabel = null
      return
    }
    if (DATA_SECTIONS.has(m) || m === '.section') {
      inData = true
      current = null
      pendingLabel = null
      return
    }
    const k = directiveKind(m)
    if (!inData || !k) return
    if (!current && pendingLabel) {
      current = { name: pendingLabel.name, line: pendingLabel.line, directive: m, kind: k.kind, bytes: 0, values: [], lines: [], editable: true }
      out.push(current)
      pendingLabel = null
    }
    if (!current) return
    const entry: DataEntry = current
    if (k.kind !== entry.kind || (k.kind !== 'reserve' && k.bytes !== (directiveKind(entry.directive)?.bytes ?? 0))) entry.editable = false
    entry.lines.push(line)
    if (k.kind === 'reserve') {
      entry.editable = false
      entry.bytes += Number(parseInteger(lexed.operands[0]?.text ?? '') ?? 0n)
    } else {
      entry.bytes = k.bytes
      for (const t of lexed.operands) entry.values.push({ ...t, line })
    }
  })
  return out
}

export type EditResult = { ok: true; text: string } | { ok: false; index: number; message: string }

/** Checks one value for an entry's directive; null when it is fine. */
export function checkValue(entry: Pick<DataEntry, 'kind' | 'bytes' | 'directive'>, value: string): string | null {
  const v = value.trim()
  if (entry.kind === 'float') return FLOAT.test(v) ? null : `'${v}' is not a number ${entry.directive} accepts`
  if (entry.kind === 'int') {
    const n = parseInteger(v)
    if (n === undefined) return `'${v}' is not an integer`
    const bits = BigInt(entry.bytes * 8)
    // GNU as accepts signed and unsigned forms of a size: -2^(n-1) .. 2^n - 1.
    if (n < -(1n << (bits - 1n)) || n >= 1n << bits) return `${v} does not fit in ${entry.bytes} byte${entry.bytes > 1 ? 's' : ''} (${entry.directive})`
    return null
  }
  return `${entry.directive} reserves space; it has no values to edit`
}

/** Splits what a user typed into values: commas or white space between them. */
export function splitValues(input: string): string[] {
  return input.split(/[\s,]+/).filter((s) => s !== '')
}

/**
 * Writes new values for an entry into the text. The same number of values
 * replaces each in place (layout and comments kept); a different number
 * rewrites the entry onto its first directive line.
 */
export function setEntryValues(text: string, entry: DataEntry, values: string[]): EditResult {
  if (!entry.editable) return { ok: false, index: -1, message: `${entry.name} cannot be edited here: it mixes directives or reserves space` }
  if (values.length === 0) return { ok: false, index: -1, message: `${entry.name} needs at least one value` }
  for (let i = 0; i < values.length; i++) {
    const problem = checkValue(entry, values[i] ?? '')
    if (problem) return { ok: false, index: i, message: `${entry.name}[${i}]: ${problem}` }
  }
  const lines = text.split('\n')
  const replace = (lineNo: number, from: number, to: number, by: string) => {
    const s = lines[lineNo - 1] ?? ''
    lines[lineNo - 1] = s.slice(0, from) + by + s.slice(to)
  }
  if (values.length === entry.values.length) {
    // Right to left, so earlier columns stay valid.
    for (let i = entry.values.length - 1; i >= 0; i--) {
      const old = entry.values[i] as DataValue
      replace(old.line, old.column - 1, old.column - 1 + old.text.length, (values[i] ?? '').trim())
    }
    return { ok: true, text: lines.join('\n') }
  }
  const first = entry.values[0]
  const firstLine = entry.lines[0]
  if (!first || firstLine === undefined) return { ok: false, index: -1, message: `${entry.name} has no values to replace` }
  const onFirst = entry.values.filter((v) => v.line === firstLine)
  const last = onFirst[onFirst.length - 1] as DataValue
  replace(firstLine, first.column - 1, last.column - 1 + last.text.length, values.map((v) => v.trim()).join(', '))
  // Continuation lines of the entry go; bottom up so that line numbers hold.
  for (const l of [...entry.lines].reverse()) if (l !== firstLine) lines.splice(l - 1, 1)
  return { ok: true, text: lines.join('\n') }
}
