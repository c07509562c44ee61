/**
 * Splits one source line into labels, a mnemonic or directive, and
 * comma-separated operands, keeping each token's column. `#` starts a comment
 * (GNU as for RISC-V).
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

const LABEL = /^([A-Za-z_.$][A-Za-z0-9_.$]*)\s*:/
const WORD = /^\S+/

export function lexLine(source: string, line: number): Line | SimDiagnostic {
  const hash = source.indexOf('#')
  const text = hash >= 0 ? source.slice(0, hash) : source
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
  // Split the rest at top-level commas; keep each operand's column.
  let start = pos
  for (let i = pos; i <= text.length; i++) {
    if (i === text.length || text[i] === ',') {
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
