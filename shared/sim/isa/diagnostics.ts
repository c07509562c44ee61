/** Building diagnostics and suggesting the nearest mnemonic. */
import { distance } from 'fastest-levenshtein'
import type { SimDiagnostic, SourceLoc } from './types'

export function diag(loc: SourceLoc, code: string, message: string): SimDiagnostic {
  return { line: loc.line, column: loc.column, code, message }
}

/** The candidate closest to `word` by edit distance, if it is close enough to be a plausible typo. */
export function nearest(word: string, candidates: Iterable<string>): string | undefined {
  let best: string | undefined
  let bestD = Infinity
  for (const c of candidates) {
    const d = distance(word, c)
    if (d < bestD) {
      best = c
      bestD = d
    }
  }
  return best !== undefined && bestD <= Math.max(2, Math.floor(word.length / 3)) ? best : undefined
}
