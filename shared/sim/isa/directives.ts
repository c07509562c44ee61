/**
 * Assembler directives (GNU as syntax): sections, alignment and data.
 * Data is little-endian, as RISC-V memory is. Data directives belong in a data
 * section: Chimeline keeps the text segment to instructions.
 */
import { diag } from './diagnostics'
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

export interface DirectiveResult {
  error?: SimDiagnostic
  section?: 'text' | 'data'
  /** Instructions (nops) to insert for alignment in the text section. */
  textPadding?: number
}

const INT_SIZES: Record<string, number> = {
  '.byte': 1, '.half': 2, '.2byte': 2, '.short': 2, '.word': 4, '.4byte': 4, '.long': 4, '.dword': 8, '.8byte': 8, '.quad': 8,
}
const FLOAT_SIZES: Record<string, number> = { '.float': 4, '.single': 4, '.double': 8 }
const SECTIONS: Record<string, 'text' | 'data'> = { '.text': 'text', '.data': 'data', '.rodata': 'data', '.bss': 'data', '.sdata': 'data' }
/** Accepted and ignored: symbol visibility and bookkeeping that do not change the program. */
const IGNORED = new Set(['.globl', '.global', '.type', '.size', '.option', '.file', '.ident', '.local'])
const ALIGN = new Set(['.balign', '.align', '.p2align'])
const ZERO = new Set(['.zero', '.space', '.skip'])

export function isDirective(name: string): boolean {
  return name.startsWith('.')
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

/** Applies one directive; `textBytes` is the size of the text laid out so far. */
export function applyDirective(name: string, args: Token[], loc: SourceLoc, section: 'text' | 'data', d: DataState, textBytes: number): DirectiveResult {
  const at = (t: Token | undefined): SourceLoc => ({ line: loc.line, column: t?.column ?? loc.column })
  if (IGNORED.has(name)) return {}
  if (name in SECTIONS) return { section: SECTIONS[name] }
  if (name === '.section') {
    const s = args[0]?.text.split(/\s+/)[0] ?? ''
    const target = SECTIONS[s] ?? (s.startsWith('.text') ? 'text' : s.startsWith('.data') || s.startsWith('.rodata') || s.startsWith('.bss') ? 'data' : undefined)
    if (!target) return { error: diag(at(args[0]), 'bad-directive', `.section: unknown section '${s}'; use .text, .data, .rodata or .bss`) }
    return { section: target }
  }
  if (ALIGN.has(name)) {
    const v = args[0] ? parseInteger(args[0].text) : undefined
    // RISC-V GNU as: .align and .p2align take a power of two, .balign a byte count.
    const bytes = v === undefined ? undefined : name === '.balign' ? Number(v) : v >= 0n && v <= 16n ? 2 ** Number(v) : undefined
    if (bytes === undefined || bytes < 1 || bytes > 65536 || (bytes & (bytes - 1)) !== 0) {
      return { error: diag(at(args[0]), 'bad-directive', `${name}: expected ${name === '.balign' ? 'a power of two from 1 to 65536' : 'an exponent 0..16'}`) }
    }
    if (section === 'text') {
      // The text base is 4 KiB-aligned, so offsets decide; pad with nops as GNU as does.
      return { textPadding: bytes <= 4 ? 0 : ((bytes - (textBytes % bytes)) % bytes) / 4 }
    }
    const fill = args[1] ? parseInteger(args[1].text) : 0n
    if (fill === undefined || fill < 0n || fill > 255n) return { error: diag(at(args[1]), 'bad-directive', `${name}: the fill byte must be 0..255`) }
    const pad = (bytes - (d.size % bytes)) % bytes
    if (!reserve(d, pad, loc)) return {}
    d.bytes.fill(Number(fill), d.size, d.size + pad)
    d.size += pad
    return {}
  }
  const intSize = INT_SIZES[name]
  const floatSize = FLOAT_SIZES[name]
  const isZero = ZERO.has(name)
  if (intSize === undefined && floatSize === undefined && !isZero) {
    return { error: diag(loc, 'bad-directive', `unknown directive '${name}'`) }
  }
  if (section === 'text') {
    return { error: diag(loc, 'data-in-text', `${name} in the text section: Chimeline keeps data apart from code; put it after .data`) }
  }
  if (args.length === 0) return { error: diag(loc, 'operand-count', `${name} needs at least one value`) }
  if (isZero) {
    const n = parseInteger(args[0]?.text ?? '')
    if (n === undefined || n < 0n) return { error: diag(at(args[0]), 'bad-directive', `${name}: expected a byte count`) }
    if (n > BigInt(d.maxBytes)) d.error ??= diag(loc, 'data-too-large', `the data segment would exceed its limit of ${d.maxBytes} bytes`)
    if (d.error || !reserve(d, Number(n), loc)) return {}
    d.bytes.fill(0, d.size, d.size + Number(n))
    d.size += Number(n)
    return {}
  }
  for (const a of args) {
    if (intSize !== undefined) {
      const v = parseInteger(a.text)
      const bits = BigInt(intSize * 8)
      if (v === undefined) return { error: diag(at(a), 'operand-kind', `${name}: expected an integer, found '${a.text}'`) }
      if (v < -(1n << (bits - 1n)) || v >= 1n << bits) return { error: diag(at(a), 'imm-range', `${name}: ${a.text} does not fit in ${intSize} byte${intSize > 1 ? 's' : ''}`) }
      if (!reserve(d, intSize, loc)) return {}
      let u = BigInt.asUintN(Number(bits), v)
      for (let i = 0; i < intSize; i++) {
        d.bytes[d.size + i] = Number(u & 0xffn)
        u >>= 8n
      }
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
