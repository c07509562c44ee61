/**
 * Until the assembler reads `.equ`/`.set` itself, a sweep hands it text with
 * each definition line blanked (line numbers kept) and each later use of the
 * symbol replaced by its value. Only whole decimal values are inlined, as GNU
 * as would evaluate them; a definition by an expression is left to the
 * assembler, which then names the line.
 */
const DEFINITION = /^\s*\.(?:equ|set)\s+([A-Za-z_.$][\w.$]*)\s*,\s*(-?\d+)\s*(?:#.*)?$/

export function inlineSymbols(text: string): string {
  const values = new Map<string, string>()
  return text
    .split('\n')
    .map((line) => {
      const def = DEFINITION.exec(line.replace(/\r$/, ''))
      if (def) {
        values.set(def[1] as string, def[2] as string)
        return ''
      }
      if (values.size === 0) return line
      const hash = line.indexOf('#')
      const code = hash >= 0 ? line.slice(0, hash) : line
      const replaced = code.replace(/[A-Za-z_.$][\w.$]*/g, (word) => values.get(word) ?? word)
      return hash >= 0 ? replaced + line.slice(hash) : replaced
    })
    .join('\n')
}
