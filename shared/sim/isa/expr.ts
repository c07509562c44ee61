/**
 * Assembler expressions as GNU as reads them in operands and data: integers,
 * symbols, `.` (the current location), unary - ~ +, binary * / % << >> & | ^ + -
 * with C precedence, and parentheses. Compiler output uses them for sizes
 * (`.Lfunc_end0-daxpy`), data (`.quad sym+8`, jump tables `.word .LBB0_3-.LJTI0_0`)
 * and constants (`.equ N, 4*64`). Values are 64-bit two's complement (BigInt).
 */

export type Expr =
  | { kind: 'num'; value: bigint }
  | { kind: 'sym'; name: string }
  | { kind: 'dot' }
  | { kind: 'unary'; op: '-' | '~' | '+'; a: Expr }
  | { kind: 'binary'; op: string; a: Expr; b: Expr }

export interface ExprError {
  message: string
  /** 0-based offset in the text. */
  offset: number
}

const TOKEN = /\s*(0[xX][0-9a-fA-F]+|0[bB][01]+|[0-9]+[bf](?![0-9A-Za-z_])|[0-9]+|[A-Za-z_.$][A-Za-z0-9_.$@]*|<<|>>|[-+*/%&|^~()])/y

const PRECEDENCE: Record<string, number> = { '|': 1, '^': 2, '&': 3, '<<': 4, '>>': 4, '+': 5, '-': 5, '*': 6, '/': 6, '%': 6 }

function integer(text: string): bigint | undefined {
  if (/^0[0-7]+$/.test(text)) return BigInt(`0o${text.slice(1)}`)
  if (/^(0[xX][0-9a-fA-F]+|0[bB][01]+|[0-9]+)$/.test(text)) return BigInt(text)
  return undefined
}

/**
 * Parses `text`; `rename` maps each symbol as written (numeric label references
 * `1b`/`1f` included) to the name it is looked up by.
 */
export function parseExpr(text: string, rename: (name: string) => string = (n) => n): Expr | ExprError {
  const toks: { t: string; at: number }[] = []
  let pos = 0
  while (pos < text.length) {
    if (/^\s*$/.test(text.slice(pos))) break
    TOKEN.lastIndex = pos
    const m = TOKEN.exec(text)
    if (!m || m[1] === undefined) return { message: `cannot read '${text.slice(pos).trim()}' in the expression '${text.trim()}'`, offset: pos }
    toks.push({ t: m[1], at: pos + m[0].length - m[1].length })
    pos = TOKEN.lastIndex
  }
  if (toks.length === 0) return { message: 'empty expression', offset: 0 }
  let i = 0
  const fail = (message: string): ExprError => ({ message, offset: toks[i]?.at ?? text.length })
  const primary = (): Expr | ExprError => {
    const tok = toks[i]
    if (!tok) return fail(`the expression '${text.trim()}' ends early`)
    i++
    if (tok.t === '(') {
      const e = binary(0)
      if ('message' in e) return e
      if (toks[i]?.t !== ')') return fail(`missing ')' in '${text.trim()}'`)
      i++
      return e
    }
    if (tok.t === '-' || tok.t === '~' || tok.t === '+') {
      const a = primary()
      return 'message' in a ? a : { kind: 'unary', op: tok.t, a }
    }
    if (tok.t === '.') return { kind: 'dot' }
    const n = integer(tok.t)
    if (n !== undefined) return { kind: 'num', value: n }
    if (/^[0-9]+[bf]$/.test(tok.t) || /^[A-Za-z_.$]/.test(tok.t)) return { kind: 'sym', name: rename(tok.t.replace(/@plt$/, '')) }
    i--
    return fail(`unexpected '${tok.t}' in '${text.trim()}'`)
  }
  const binary = (min: number): Expr | ExprError => {
    let a = primary()
    if ('message' in a) return a
    for (;;) {
      const op = toks[i]?.t
      const p = op === undefined ? undefined : PRECEDENCE[op]
      if (op === undefined || p === undefined || p <= min - 1 || p < min) break
      i++
      const b = binary(p + 1)
      if ('message' in b) return b
      a = { kind: 'binary', op, a, b }
    }
    return a
  }
  const e = binary(1)
  if ('message' in e) return e
  if (i < toks.length) return fail(`unexpected '${toks[i]?.t}' in '${text.trim()}'`)
  return e
}

/** The symbols an expression names. */
export function symbolsOf(e: Expr, out: string[] = []): string[] {
  if (e.kind === 'sym') out.push(e.name)
  else if (e.kind === 'unary') symbolsOf(e.a, out)
  else if (e.kind === 'binary') {
    symbolsOf(e.a, out)
    symbolsOf(e.b, out)
  }
  return out
}

export type EvalResult = { ok: true; value: bigint } | { ok: false; missing?: string; message: string }

/** Evaluates with `lookup` for symbols and `dot` for `.`; 64-bit wrap-around. */
export function evalExpr(e: Expr, lookup: (name: string) => bigint | undefined, dot?: bigint): EvalResult {
  const go = (x: Expr): bigint => {
    switch (x.kind) {
      case 'num': return x.value
      case 'dot':
        if (dot === undefined) throw { missing: '.', message: "'.' (the current location) is not available here" }
        return dot
      case 'sym': {
        const v = lookup(x.name)
        if (v === undefined) throw { missing: x.name, message: `undefined symbol '${x.name}'` }
        return v
      }
      case 'unary': {
        const a = go(x.a)
        return x.op === '-' ? -a : x.op === '~' ? ~a : a
      }
      case 'binary': {
        const a = go(x.a)
        const b = go(x.b)
        switch (x.op) {
          case '+': return BigInt.asIntN(64, a + b)
          case '-': return BigInt.asIntN(64, a - b)
          case '*': return BigInt.asIntN(64, a * b)
          case '/': if (b === 0n) throw { message: 'division by zero' }; return a / b
          case '%': if (b === 0n) throw { message: 'division by zero' }; return a % b
          case '<<': return BigInt.asIntN(64, a << (b & 63n))
          case '>>': return a >> (b & 63n)
          case '&': return a & b
          case '|': return a | b
          default: return a ^ b
        }
      }
    }
  }
  try {
    return { ok: true, value: go(e) }
  } catch (err) {
    const f = err as { missing?: string; message: string }
    return { ok: false, ...(f.missing ? { missing: f.missing } : {}), message: f.message }
  }
}
