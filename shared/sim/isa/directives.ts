/**
 * Assembler directives as GNU as and LLVM's integrated assembler write them in
 * compiler output: sections, alignment, data, strings, constants (`.equ`,
 * `.set`) and the bookkeeping that does not change the program (`.globl`,
 * `.type`, `.size`, `.attribute`, `.cfi_*`, `.addrsig*`, `.option`, ...), which
 * is accepted and ignored. Data is little-endian, as RISC-V memory is. Every
 * data section (.data, .rodata, .sdata, .srodata, .bss, .sbss and their
 * `.name.suffix` forms) goes to the one data segment in source order; other
 * sections (.note.GNU-stack, .comment, debug information) hold nothing that
 * runs, so their contents are skipped.
 */
import { diag } from './diagnostics'
import { evalExpr, parseExpr, type Expr } from './expr'
import type { Token } from './lexer'
import { parseInteger } from './operands'
import type { SimDiagnostic, SourceLoc } from './types'

export interface DataState {
  bytes: Uint8Array
  size: number
  maxBytes: number
  /** Set once the data limit is exceeded (reported once). */
  error?: SimDiagnostic
}

export type Section = 'text' | 'data' | 'other'

/** A data value that names a label: written once the layout is known. */
export interface DataFixup {
  offset: number
  size: number
  expr: Expr
  loc: SourceLoc
  /** Data offset of the directive, for `.` in the expression. */
  dot: number
}

export interface DirectiveContext {
  section: Section
  data: DataState
  /** Address of the next instruction (the text base plus the bytes laid out so far). */
  textBytes: number
  /** Value of a constant symbol defined so far. */
  symbol: (name: string) => bigint | undefined
  rename: (name: string) => string
  defineConstant: (name: string, value: bigint, loc: SourceLoc) => SimDiagnostic | undefined
  fixups: DataFixup[]
}

export interface DirectiveResult {
  error?: SimDiagnostic
  section?: Section
  /** Bytes of nops to insert for alignment in the text section. */
  textPadding?: number
}

const INT_SIZES: Record<string, number> = {
  '.byte': 1, '.half': 2, '.2byte': 2, '.short': 2, '.hword': 2, '.word': 4, '.4byte': 4, '.long': 4, '.int': 4, '.dword': 8, '.8byte': 8, '.quad': 8,
}
const FLOAT_SIZES: Record<string, number> = { '.float': 4, '.single': 4, '.double': 8 }
const STRINGS: Record<string, boolean> = { '.ascii': false, '.asciz': true, '.string': true }
const PLAIN_SECTIONS: Record<string, Section> = {
  '.text': 'text', '.data': 'data', '.rodata': 'data', '.bss': 'data', '.sdata': 'data', '.sbss': 'data', '.srodata': 'data',
}
const DATA_PREFIXES = ['.data', '.rodata', '.srodata', '.sdata', '.bss', '.sbss', '.tdata', '.tbss']
/** Accepted and ignored: visibility, symbol types and sizes, attributes, call-frame and address-significance notes. */
const IGNORED = new Set([
  '.globl', '.global', '.local', '.weak', '.hidden', '.protected', '.internal', '.type', '.size', '.option', '.file', '.ident',
  '.attribute', '.addrsig', '.addrsig_sym', '.loc', '.variant_cc', '.end', '.previous', '.popsection',
])
const ALIGN = new Set(['.balign', '.align', '.p2align'])
const ZERO = new Set(['.zero', '.space', '.skip'])

export function isDirective(name: string): boolean {
  return name.startsWith('.')
}

/** The section a `.section` name selects. */
export function sectionOf(name: string): Section {
  const n = name.replace(/^"|"$/g, '')
  if (n === '.text' || n.startsWith('.text.')) return 'text'
  if (DATA_PREFIXES.some((p) => n === p || n.startsWith(`${p}.`))) return 'data'
  return 'other'
}

function reserve(d: DataState, n: number, loc: SourceLoc): boolean {
  if (d.size + n > d.maxBytes) {
    d.error ??= diag(loc, 'data-too-large', `the data segment would exceed its limit of ${d.maxBytes} bytes`)
    return false
  }
  if (d.size + n > d.bytes.length) {
    const grown = new Uint8Array(Math.max(d.bytes.length * 2, d.size + n))
    grown.set(d.bytes)
    d.bytes = grown
  }
  return true
}

const FLOAT = /^[+-]?((\d+\.?\d*|\.\d+)([eE][+-]?\d+)?|inf|infinity|nan)$/i

function parseFloatText(t: string): number | undefined {
  if (!FLOAT.test(t)) return undefined
  const s = t.toLowerCase().replace('infinity', 'inf')
  if (s.endsWith('nan')) return NaN
  if (s.endsWith('inf')) return s.startsWith('-') ? -Infinity : Infinity
  return Number(t)
}

/** A C-style string literal's bytes (UTF-8), GNU as escapes: \n \t \r \b \f \\ \" \ooo \xhh. */
function stringBytes(text: string): Uint8Array | undefined {
  if (!/^".*"$/s.test(text)) return undefined
  const body = text.slice(1, -1)
  const out: number[] = []
  const enc = new TextEncoder()
  for (let i = 0; i < body.length; i++) {
    const c = body[i] as string
    if (c !== '\\') {
      for (const b of enc.encode(c)) out.push(b)
      continue
    }
    const n = body[++i] ?? ''
    const simple: Record<string, number> = { n: 10, t: 9, r: 13, b: 8, f: 12, '\\': 92, '"': 34, "'": 39, a: 7, v: 11, e: 27 }
    if (n in simple) out.push(simple[n] as number)
    else if (/[0-7]/.test(n)) {
      let v = ''
      while (v.length < 3 && /[0-7]/.test(body[i] ?? '')) v += body[i++]
      i--
      out.push(parseInt(v, 8) & 0xff)
    } else if (n === 'x') {
      let v = ''
      while (/[0-9a-fA-F]/.test(body[i + 1] ?? '')) v += body[++i]
      if (v === '') return undefined
      out.push(parseInt(v.slice(-2), 16))
    } else return undefined
  }
  return Uint8Array.from(out)
}

/** Applies one directive. */
export function applyDirective(name: string, args: Token[], loc: SourceLoc, ctx: DirectiveContext): DirectiveResult {
  const { data: d, section } = ctx
  const at = (t: Token | undefined): SourceLoc => ({ line: loc.line, column: t?.column ?? loc.column })
  if (IGNORED.has(name) || name.startsWith('.cfi_')) return {}
  if (name in PLAIN_SECTIONS) return { section: PLAIN_SECTIONS[name] }
  if (name === '.section' || name === '.pushsection') {
    const s = args[0]?.text.split(/\s+/)[0] ?? ''
    if (s === '') return { error: diag(loc, 'operand-count', `${name} needs a section name`) }
    return { section: sectionOf(s) }
  }
  if (name === '.equ' || name === '.set' || name === '.equiv') {
    const sym = args[0]
    const value = args[1]
    if (!sym || !value || args.length !== 2 || !/^[A-Za-z_.$][A-Za-z0-9_.$]*$/.test(sym.text)) {
      return { error: diag(loc, 'operand-count', `${name} takes a symbol name and a value: ${name} NAME, 64`) }
    }
    const e = parseExpr(value.text, ctx.rename)
    if ('message' in e) return { error: diag(at(value), 'operand-kind', `${name}: ${e.message}`) }
    const r = evalExpr(e, ctx.symbol)
    if (!r.ok) return { error: diag(at(value), 'operand-kind', `${name} ${sym.text}: ${r.message}; the value must be a constant (numbers and symbols set earlier)`) }
    return { error: ctx.defineConstant(sym.text, r.value, at(sym)) }
  }
  if (section === 'other') return {}
  if (ALIGN.has(name)) {
    const v = args[0] ? parseInteger(args[0].text) : undefined
    // RISC-V GNU as: .align and .p2align take a power of two, .balign a byte count.
    const bytes = v === undefined ? undefined : name === '.balign' ? Number(v) : v >= 0n && v <= 16n ? 2 ** Number(v) : undefined
    if (bytes === undefined || bytes < 1 || bytes > 65536 || (bytes & (bytes - 1)) !== 0) {
      return { error: diag(at(args[0]), 'bad-directive', `${name}: expected ${name === '.balign' ? 'a power of two from 1 to 65536' : 'an exponent 0..16'}`) }
    }
    if (section === 'text') {
      // The next instruction's address decides (instructions are 2 or 4 bytes, so at least 2-byte aligned).
      return { textPadding: bytes <= 2 ? 0 : (bytes - (ctx.textBytes % bytes)) % bytes }
    }
    const fill = args[1] && args[1].text !== '' ? parseInteger(args[1].text) : 0n
    if (fill === undefined || fill < 0n || fill > 255n) return { error: diag(at(args[1]), 'bad-directive', `${name}: the fill byte must be 0..255`) }
    const pad = (bytes - (d.size % bytes)) % bytes
    if (!reserve(d, pad, loc)) return {}
    d.bytes.fill(Number(fill), d.size, d.size + pad)
    d.size += pad
    return {}
  }
  if (name === '.comm' || name === '.lcomm') {
    return { error: diag(loc, 'bad-directive', `${name} is not supported: define the variable in .bss with a label and .zero`) }
  }
  const intSize = INT_SIZES[name]
  const floatSize = FLOAT_SIZES[name]
  const isZero = ZERO.has(name)
  const str = STRINGS[name]
  if (intSize === undefined && floatSize === undefined && !isZero && str === undefined) {
    return { error: diag(loc, 'bad-directive', `unknown directive '${name}'`) }
  }
  if (section === 'text') {
    return { error: diag(loc, 'data-in-text', `${name} in the text section: Chimeline keeps data apart from code; put it after .data`) }
  }
  if (args.length === 0) return { error: diag(loc, 'operand-count', `${name} needs at least one value`) }
  if (isZero) {
    const n = constantOf(args[0] as Token, ctx)
    if (typeof n !== 'bigint' || n < 0n) return { error: diag(at(args[0]), 'bad-directive', `${name}: expected a byte count`) }
    const fill = args[1] ? constantOf(args[1], ctx) : 0n
    if (typeof fill !== 'bigint') return { error: diag(at(args[1]), 'bad-directive', `${name}: expected a fill byte`) }
    if (n > BigInt(d.maxBytes)) d.error ??= diag(loc, 'data-too-large', `the data segment would exceed its limit of ${d.maxBytes} bytes`)
    if (d.error || !reserve(d, Number(n), loc)) return {}
    d.bytes.fill(Number(BigInt.asUintN(8, fill)), d.size, d.size + Number(n))
    d.size += Number(n)
    return {}
  }
  for (const a of args) {
    if (str !== undefined) {
      const bytes = stringBytes(a.text)
      if (!bytes) return { error: diag(at(a), 'operand-kind', `${name}: expected a string in double quotes, found '${a.text}'`) }
      const n = bytes.length + (str ? 1 : 0)
      if (!reserve(d, n, loc)) return {}
      d.bytes.set(bytes, d.size)
      if (str) d.bytes[d.size + bytes.length] = 0
      d.size += n
    } else if (intSize !== undefined) {
      const bits = BigInt(intSize * 8)
      const e = parseExpr(a.text, ctx.rename)
      if ('message' in e) return { error: diag(at(a), 'operand-kind', `${name}: expected an integer or an expression, found '${a.text}'`) }
      if (!reserve(d, intSize, loc)) return {}
      const r = evalExpr(e, ctx.symbol, BigInt(d.size))
      if (!r.ok) {
        // A label (or '.'): written after layout, when addresses are known.
        ctx.fixups.push({ offset: d.size, size: intSize, expr: e, loc: at(a), dot: d.size })
        d.size += intSize
        continue
      }
      const v = r.value
      if (v < -(1n << (bits - 1n)) || v >= 1n << bits) return { error: diag(at(a), 'imm-range', `${name}: ${a.text} does not fit in ${intSize} byte${intSize > 1 ? 's' : ''}`) }
      writeInt(d.bytes, d.size, intSize, v)
      d.size += intSize
    } else if (floatSize !== undefined) {
      const f = parseFloatText(a.text)
      if (f === undefined) return { error: diag(at(a), 'operand-kind', `${name}: expected a number, found '${a.text}'`) }
      if (!reserve(d, floatSize, loc)) return {}
      const view = new DataView(d.bytes.buffer, d.bytes.byteOffset + d.size, floatSize)
      if (floatSize === 4) view.setFloat32(0, f, true)
      else view.setFloat64(0, f, true)
      d.size += floatSize
    }
  }
  return {}
}

function constantOf(t: Token, ctx: DirectiveContext): bigint | undefined {
  const e = parseExpr(t.text, ctx.rename)
  if ('message' in e) return undefined
  const r = evalExpr(e, ctx.symbol)
  return r.ok ? r.value : undefined
}

/** Little-endian integer of `size` bytes (two's complement wrap). */
export function writeInt(bytes: Uint8Array, offset: number, size: number, value: bigint): void {
  let u = BigInt.asUintN(size * 8, value)
  for (let i = 0; i < size; i++) {
    bytes[offset + i] = Number(u & 0xffn)
    u >>= 8n
  }
}
