/**
 * Program symbols a sweep may vary: those the text defines with
 * `.equ NAME, value` or `.set NAME, value` (GNU as). A point overrides a
 * symbol by rewriting its definition line, so each swept value is a distinct
 * program text: the text a point ran is the text the Bench opens for it.
 */

export interface SymbolDefinition {
  name: string
  /** 0-based line of the definition. */
  line: number
  /** The value as written. */
  value: string
}

const DEFINITION = /^(\s*(?:[A-Za-z_.$][\w.$]*:\s*)?\.(?:equ|set)\s+)([A-Za-z_.$][\w.$]*)(\s*,\s*)([^#]*?)(\s*(?:#.*)?)$/

/** Every `.equ`/`.set` definition of the text, in order. */
export function symbolDefinitions(text: string): SymbolDefinition[] {
  const out: SymbolDefinition[] = []
  text.split('\n').forEach((raw, line) => {
    const m = DEFINITION.exec(raw.replace(/\r$/, ''))
    if (m) out.push({ name: m[2] as string, line, value: (m[4] as string).trim() })
  })
  return out
}

export type SymbolCheck = { ok: true; definition: SymbolDefinition } | { ok: false; message: string }

/** The one definition of `name` a sweep rewrites; a symbol set twice has no single value to vary. */
export function sweepableSymbol(text: string, name: string): SymbolCheck {
  const defs = symbolDefinitions(text).filter((d) => d.name === name)
  if (defs.length === 0) return { ok: false, message: `the program defines no symbol ${name} (define it with .equ ${name}, value)` }
  if (defs.length > 1) return { ok: false, message: `${name} is defined ${defs.length} times (lines ${defs.map((d) => d.line + 1).join(', ')}); a swept symbol is defined once` }
  return { ok: true, definition: defs[0] as SymbolDefinition }
}

/** The text with each named symbol's definition set to the given value (other lines untouched). */
export function withSymbols(text: string, values: ReadonlyMap<string, number>): string {
  if (values.size === 0) return text
  return text
    .split('\n')
    .map((raw) => {
      const cr = raw.endsWith('\r') ? '\r' : ''
      const m = DEFINITION.exec(cr ? raw.slice(0, -1) : raw)
      const value = m ? values.get(m[2] as string) : undefined
      return m && value !== undefined ? `${m[1]}${m[2]}${m[3]}${value}${m[5]}${cr}` : raw
    })
    .join('\n')
}
