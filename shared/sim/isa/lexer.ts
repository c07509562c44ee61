/**
 * Splits one source line into labels, a mnemonic or directive, and
 * comma-separated operands, keeping each token's column. `#` starts a comment
 * (GNU as for RISC-V) outside a string. Labels are symbols (`loop:`, `.LBB0_3:`) or local numeric labels
 * (`1:`, referred to as `1b` / `1f`).
 */
import type { SimDiagnostic } from './types'
import { diag } from './diagnostics'

export interface Token {
  text: string
  /** 1-based column of the token's first character. */
  column: number
}

export interface Line {
  line: number
  labels: Token[]
  mnemonic?: Token
  operands: Token[]
}

const LABEL = /^([A-Za-z_.$][A-Za-z0-9_.$]*|[0-9]+)\s*:/
const WORD = /^\S+/

export function lexLine(source: string, line: number): Line | SimDiagnostic {
  const text = source.slice(0, commentStart(source))
  const out: Line = { line, labels: [], operands: [] }
  let pos = 0
  const skip = (): void => {
    while (pos < text.length && /\s/.test(text[pos] ?? '')) pos++
  }
  skip()
  for (;;) {
    const m = LABEL.exec(text.slice(pos))
    if (!m || m[1] === undefined) break
    out.labels.push({ text: m[1], column: pos + 1 })
    pos += m[0].length
    skip()
  }
  if (pos >= text.length) return out
  const w = WORD.exec(text.slice(pos))
  if (!w) return out
  if (w[0].includes(':')) return diag({ line, column: pos + 1 }, 'bad-label', `bad label '${w[0]}': a label starts with a letter, '_', '.' or '$'`)
  out.mnemonic = { text: w[0], column: pos + 1 }
  pos += w[0].length
  skip()
  if (pos >= text.length) return out
  // Split the rest at commas outside strings; keep each operand's column.
  let start = pos
  let quoted = false
  for (let i = pos; i <= text.length; i++) {
    if (i < text.length && text[i] === '"' && text[i - 1] !== '\\') quoted = !quoted
    if (i === text.length || (text[i] === ',' && !quoted)) {
      const raw = text.slice(start, i)
      const lead = raw.length - raw.trimStart().length
      const t = raw.trim()
      if (t === '') return diag({ line, column: start + lead + 1 }, 'operand-count', 'empty operand')
      out.operands.push({ text: t, column: start + lead + 1 })
      start = i + 1
    }
  }
  return out
}

/** Where a `#` comment starts (outside double-quoted strings), or the line length. */
function commentStart(source: string): number {
  let quoted = false
  for (let i = 0; i < source.length; i++) {
    const c = source[i]
    if (c === '\\' && quoted) i++
    else if (c === '"') quoted = !quoted
    else if (c === '#' && !quoted) return i
  }
  return source.length
}
