/**
 * The assembler's diagnostics (1-based line and column) as editor ranges
 * (0-based offsets): each underlines the word at its column, or one character
 * when the column points at space or past the end of the line.
 *
 * @example
 *   editorDiagnostics('vadd.vv v1, v2, q3', [{ line: 1, column: 17, code: 'operand-kind', message: '...' }])
 *   // [{ from: 16, to: 18, message: '...', severity: 'error' }]
 */
import type { SimDiagnostic } from '@shared/sim/isa/types'

export interface EditorDiagnostic {
  from: number
  to: number
  message: string
  severity: 'error'
  /** "line 3, column 7", for the list under the editor and screen readers. */
  where: string
}

export function editorDiagnostics(text: string, diagnostics: SimDiagnostic[]): EditorDiagnostic[] {
  const starts = [0]
  for (let i = 0; i < text.length; i++) if (text[i] === '\n') starts.push(i + 1)
  return diagnostics.map((d) => {
    const lineIdx = Math.min(Math.max(1, d.line), starts.length) - 1
    const lineStart = starts[lineIdx] ?? 0
    const lineEnd = (starts[lineIdx + 1] ?? text.length + 1) - 1
    const from = Math.min(lineStart + Math.max(0, d.column - 1), lineEnd)
    let to = from
    while (to < lineEnd && /[^\s,()#]/.test(text[to] ?? '')) to++
    if (to === from) to = Math.min(from + 1, Math.max(lineEnd, from))
    return { from, to, message: d.message, severity: 'error' as const, where: `line ${d.line}, column ${d.column}` }
  })
}
