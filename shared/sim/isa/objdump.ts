/**
 * Readers for machine code brought in as text: the listing `objdump -d`
 * prints (GNU binutils: "address: word<TAB>text" rows under "<symbol>:"
 * headers, with 8 hex digits for a 32-bit instruction and 4 for a 16-bit
 * compressed one) and plain 32-bit hex words. Both decode through the shared
 * decoder into a Program.
 */
import { decodeHalf, decodeWord } from './decoder'
import { diag } from './diagnostics'
import { formatInstruction } from './format'
import { opInfo, type OpInfo } from './table'
import { instructionSize, type Instruction, type Program, type SimDiagnostic } from './types'

export interface ObjdumpRow {
  address: number
  word: number
  /** 2 for a 16-bit (compressed) row, else 4. */
  size: 2 | 4
  /** The text objdump printed, as it printed it (empty for raw hex words). */
  text: string
  line: number
  /** Column of the hex word. */
  column: number
}

export interface ReadOptions {
  /** Most instructions accepted (default 100,000). */
  maxInstructions?: number
  /** Address of the first word for parseHexWords (default 0x10000). */
  textBase?: number
}

export type ReadResult = { ok: true; program: Program; rows: ObjdumpRow[] } | { ok: false; errors: SimDiagnostic[] }

const ROW = /^(\s*)([0-9a-fA-F]+):(\s+)([0-9a-fA-F]+)(?:\s+(.*))?$/
const SYMBOL = /^([0-9a-fA-F]+)\s+<([^>]+)>:\s*$/
const MAX_ERRORS = 100
const DEFAULT_MAX = 100_000

/** Decodes rows that must be contiguous from the first one; names branch targets from `symbols`. */
function build(rows: ObjdumpRow[], symbols: Record<string, number>, textBase: number): ReadResult {
  const errors: SimDiagnostic[] = []
  const instructions: Instruction[] = []
  const nameAt = new Map(Object.entries(symbols).map(([n, a]) => [a, n]))
  let expected = textBase
  for (const r of rows) {
    if (errors.length >= MAX_ERRORS) break
    const loc = { line: r.line, column: r.column }
    if (r.address !== expected) {
      errors.push(diag(loc, 'address-gap', `address ${r.address.toString(16)} does not follow the previous instruction (expected ${expected.toString(16)})`))
      expected = r.address + r.size
      continue
    }
    expected += r.size
    const d = r.size === 2 ? decodeHalf(r.word, r.address) : decodeWord(r.word, r.address)
    if (!d.ok) {
      errors.push(diag(loc, d.error.code, d.error.message))
      continue
    }
    const ins = d.instruction
    ins.loc = loc
    const info = opInfo(ins.op) as OpInfo
    if (info.syntax.includes('branch') || info.syntax.includes('jump')) {
      const name = nameAt.get(r.address + (ins.operands.imm ?? 0))
      if (name) {
        ins.label = name
        ins.text = formatInstruction(info, ins.operands, ins.address, name)
      }
    }
    instructions.push(ins)
  }
  if (errors.length) return { ok: false, errors }
  const last = instructions[instructions.length - 1]
  const dataBase = Math.ceil((last ? last.address + instructionSize(last) : textBase) / 4096) * 4096
  return { ok: true, rows, program: { instructions, textBase, data: new Uint8Array(0), dataBase, symbols, dataLabels: [] } }
}

/**
 * Reads `objdump -d` output: instruction rows and symbol headers; other lines
 * (file header, section titles, blank lines) are skipped.
 */
export function parseObjdump(text: string, options: ReadOptions = {}): ReadResult {
  const max = options.maxInstructions ?? DEFAULT_MAX
  const rows: ObjdumpRow[] = []
  const symbols = Object.create(null) as Record<string, number> // symbol names are user text
  const lines = text.split(/\r\n|\n|\r/)
  for (const [i, raw] of lines.entries()) {
    const s = SYMBOL.exec(raw)
    if (s && s[1] !== undefined && s[2] !== undefined) {
      symbols[s[2]] ??= parseInt(s[1], 16)
      continue
    }
    const m = ROW.exec(raw)
    if (!m || m[2] === undefined || m[4] === undefined) continue
    const column = (m[1]?.length ?? 0) + m[2].length + 1 + (m[3]?.length ?? 0) + 1
    if (m[4].length !== 8 && m[4].length !== 4) {
      return { ok: false, errors: [diag({ line: i + 1, column }, 'bad-word', `${m[4]} is neither a 32-bit instruction (8 hex digits) nor a 16-bit compressed one (4)`)] }
    }
    if (rows.length >= max) return { ok: false, errors: [diag({ line: i + 1, column: 1 }, 'too-many-instructions', `more than ${max} instructions`)] }
    rows.push({ address: parseInt(m[2], 16), word: parseInt(m[4], 16) >>> 0, size: m[4].length === 4 ? 2 : 4, text: (m[5] ?? '').trim(), line: i + 1, column })
  }
  if (rows.length === 0) return { ok: false, errors: [diag({ line: 1, column: 1 }, 'empty', 'no instruction rows found (expected lines like "   0:\t0d25f557\tvsetvli a0,a1,e32,m4,ta,ma")')] }
  return build(rows, symbols, rows[0]?.address ?? 0)
}

/**
 * Reads 32-bit hex words separated by spaces, commas or new lines, with or
 * without 0x; `#` starts a comment. The first word sits at `textBase`.
 */
export function parseHexWords(text: string, options: ReadOptions = {}): ReadResult {
  const max = options.maxInstructions ?? DEFAULT_MAX
  const textBase = options.textBase ?? 0x10000
  const rows: ObjdumpRow[] = []
  const lines = text.split(/\r\n|\n|\r/)
  for (const [i, raw] of lines.entries()) {
    const body = raw.split('#')[0] ?? ''
    for (const m of body.matchAll(/[^\s,]+/g)) {
      const t = m[0]
      const column = (m.index ?? 0) + 1
      if (!/^(0x)?[0-9a-fA-F]{1,8}$/i.test(t)) return { ok: false, errors: [diag({ line: i + 1, column }, 'bad-word', `'${t}' is not a 32-bit hex word`)] }
      if (rows.length >= max) return { ok: false, errors: [diag({ line: i + 1, column }, 'too-many-instructions', `more than ${max} instructions`)] }
      rows.push({ address: textBase + rows.length * 4, word: parseInt(t.replace(/^0x/i, ''), 16) >>> 0, size: 4, text: '', line: i + 1, column })
    }
  }
  if (rows.length === 0) return { ok: false, errors: [diag({ line: 1, column: 1 }, 'empty', 'no hex words found')] }
  return build(rows, {}, textBase)
}
