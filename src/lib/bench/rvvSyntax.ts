/**
 * A small tokenizer for RISC-V assembly with the V extension, in the shape
 * CodeMirror's StreamLanguage wants (a `token(stream)` that consumes one token
 * and names its style), so the editor needs no grammar package. Styles are
 * CodeMirror's standard tag names: comment, labelName, keyword (mnemonics),
 * variableName.special (vector registers), variableName (x/f registers),
 * number, meta (directives), operator (v0.t, vtype words, rounding modes,
 * %hi/%lo/%pcrel_hi/%pcrel_lo), string. Compiler output adds numeric labels
 * (`1:`, referred to as `1b`/`1f`), `.L` labels, CSR names, `@plt` and the
 * `@function`/`@progbits` types; imported executables add `c.` mnemonics and `.origin`.
 *
 * @example
 *   tokenizeLine('loop: vadd.vv v1, v2, v3 # add') // [['loop:', 'labelName'], ['vadd.vv', 'keyword'], ...]
 */

/** The part of CodeMirror's StringStream the tokenizer uses. */
export interface TokenStream {
  sol(): boolean
  eatSpace(): boolean
  match(pattern: RegExp, consume?: boolean): RegExpMatchArray | null | boolean
  skipToEnd(): void
  next(): string | void
  peek(): string | undefined
}

export interface LineState {
  /** A mnemonic or directive was already seen on this line: further words are operands. */
  seenOp: boolean
}

const X_REGS = /^(x([12]?\d|3[01])|zero|ra|sp|gp|tp|fp|t[0-6]|s([0-9]|1[01])|a[0-7])\b/
const F_REGS = /^(f([12]?\d|3[01])|ft([0-9]|1[01])|fs([0-9]|1[01])|fa[0-7])\b/
const V_REGS = /^v([12]?\d|3[01])\b/
const VTYPE_WORDS = /^(e(8|16|32|64)|mf?[1248]|t[au]|m[au])\b/
const ROUNDING_MODES = /^(rne|rtz|rdn|rup|rmm|dyn)\b/
const CSR_NAMES = /^(vl|vtype|vlenb|vstart|vxrm|vxsat|vcsr|fflags|frm|fcsr|cycle|time|instret)\b/
const NUMBER = /^[+-]?(0[xX][0-9a-fA-F]+|0[bB][01]+|\d+(\.\d*)?([eE][+-]?\d+)?|\.\d+([eE][+-]?\d+)?)\b/

export function startState(): LineState {
  return { seenOp: false }
}

export function token(stream: TokenStream, state: LineState): string | null {
  if (stream.sol()) state.seenOp = false
  if (stream.eatSpace()) return null
  if (stream.match(/^#.*/)) return 'comment'
  if (!state.seenOp && stream.match(/^([A-Za-z_.$][A-Za-z0-9_.$]*|\d+)\s*:/)) return 'labelName'
  if (!state.seenOp && stream.match(/^\.[A-Za-z0-9_]+/)) {
    state.seenOp = true
    return 'meta'
  }
  if (!state.seenOp && stream.match(/^[A-Za-z][A-Za-z0-9_.]*/)) {
    state.seenOp = true
    return 'keyword'
  }
  if (stream.match(/^v0\.t\b/)) return 'operator'
  if (stream.match(V_REGS)) return 'variableName.special'
  if (stream.match(X_REGS) || stream.match(F_REGS)) return 'variableName'
  if (stream.match(VTYPE_WORDS) || stream.match(ROUNDING_MODES)) return 'operator'
  if (stream.match(CSR_NAMES)) return 'variableName'
  if (stream.match(/^\d+[bf]\b/)) return 'labelName'
  if (stream.match(NUMBER)) return 'number'
  if (stream.match(/^%(pcrel_)?(hi|lo)\b/)) return 'operator'
  // @plt, and the symbol and section types of .type/.section (@function, @object, @progbits, @nobits).
  if (stream.match(/^@[A-Za-z_]+\b/)) return 'operator'
  if (stream.match(/^"([^"\\]|\\.)*"?/)) return 'string'
  if (stream.match(/^[A-Za-z_.$][A-Za-z0-9_.$]*/)) return 'labelName'
  stream.next()
  return null
}

/** A stream over one line, for tests and for tokenizing outside the editor. */
export function lineStream(line: string): TokenStream & { pos: number; start: number } {
  const s = {
    pos: 0,
    start: 0,
    sol: () => s.pos === 0,
    eatSpace: () => {
      const from = s.pos
      while (s.pos < line.length && /\s/.test(line[s.pos] ?? '')) s.pos++
      return s.pos > from
    },
    match: (pattern: RegExp) => {
      const m = pattern.exec(line.slice(s.pos))
      if (!m || m.index !== 0) return null
      s.pos += m[0].length
      return m
    },
    skipToEnd: () => {
      s.pos = line.length
    },
    next: () => (s.pos < line.length ? line[s.pos++] : undefined),
    peek: () => line[s.pos],
  }
  return s
}

/** [text, style] of each token of a line, spaces left out. */
export function tokenizeLine(line: string): [string, string | null][] {
  const s = lineStream(line)
  const state = startState()
  const out: [string, string | null][] = []
  while (s.pos < line.length) {
    const from = s.pos
    const style = token(s, state)
    if (s.pos > from && line.slice(from, s.pos).trim() !== '') out.push([line.slice(from, s.pos).trim(), style])
  }
  return out
}
