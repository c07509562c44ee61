/**
 * The RV64C compressed instructions (RISC-V unprivileged ISA, chapter "C"
 * Standard Extension for Compressed Instructions", RVC instruction listings
 * for RV64): each 16-bit form expands to one 32-bit instruction of the table,
 * which is what executes and what `objdump -d` prints. Linked executables
 * built for rv64gc are full of them; they are read from ELF files and
 * objdump listings, and written back as their `c.` mnemonics (GNU as syntax),
 * so that an imported program keeps every address of the file.
 *
 * One description per form serves both directions: the bits of each operand
 * (a 5-bit register, a 3-bit register x8..x15, or an immediate scattered over
 * the half-word) and how its operands map onto the expanded instruction.
 */
import { registerName } from './registers'
import { opInfo, type OpInfo } from './table'
import type { Operands } from './types'

/** Immediate bit ranges: [immediate bit high, immediate bit low, half-word bit of the low one]. */
type Scatter = readonly (readonly [number, number, number])[]

interface CForm {
  /** The c. mnemonic. */
  name: string
  /** The expanded instruction. */
  op: string
  match: number
  mask: number
  /** Register fields: full 5-bit ones at bit 7 (rd/rs1) or 2 (rs2), primed 3-bit ones at bit 7 or 2. */
  regs: readonly { key: 'rd' | 'rs1' | 'rs2'; at: 7 | 2; primed: boolean; nonzero?: boolean; not2?: boolean }[]
  imm?: { scatter: Scatter; signed: boolean; nonzero?: boolean }
  /** Operands the expanded instruction has that the form fixes (sp, zero, ra) or copies (rs1 = rd). */
  fixed?: Operands
  rs1IsRd?: boolean
  /** c.lui: the immediate is bits 17:12 of the value, the expanded lui takes its 20-bit field. */
  lui?: boolean
  /** How the form is written: its operands in order (GNU as). */
  syntax: readonly CArg[]
}

/** Operands as the c. forms are written. */
type CArg = 'rd' | 'rs1' | 'rs2' | 'imm' | 'mem' | 'sp' | 'label'

const Q = (quadrant: number, funct3: number): number => (funct3 << 13) | quadrant
const F3 = 0xe003

const rdFull = { key: 'rd', at: 7, primed: false } as const
const rdP = { key: 'rd', at: 2, primed: true } as const
const rs1P = { key: 'rs1', at: 7, primed: true } as const
const rs2P = { key: 'rs2', at: 2, primed: true } as const
const rs2Full = { key: 'rs2', at: 2, primed: false } as const
const rdP7 = { key: 'rd', at: 7, primed: true } as const

const SP: Operands = { rs1: 2 }
const ldScatter: Scatter = [[5, 3, 10], [7, 6, 5]]
const lwScatter: Scatter = [[5, 3, 10], [2, 2, 6], [6, 6, 5]]
const ldspScatter: Scatter = [[5, 5, 12], [4, 3, 5], [8, 6, 2]]
const lwspScatter: Scatter = [[5, 5, 12], [4, 2, 4], [7, 6, 2]]
const sdspScatter: Scatter = [[5, 3, 10], [8, 6, 7]]
const swspScatter: Scatter = [[5, 2, 9], [7, 6, 7]]
const imm6: Scatter = [[5, 5, 12], [4, 0, 2]]
const branchScatter: Scatter = [[8, 8, 12], [4, 3, 10], [7, 6, 5], [2, 1, 3], [5, 5, 2]]
const jumpScatter: Scatter = [[11, 11, 12], [4, 4, 11], [9, 8, 9], [10, 10, 8], [6, 6, 7], [7, 7, 6], [3, 1, 3], [5, 5, 2]]

const alu = (name: string, op: string, f2: number, w: boolean): CForm => ({
  name, op, match: 0x8c01 | (w ? 0x1000 : 0) | (f2 << 5), mask: 0xfc63, regs: [rdP7, rs2P], rs1IsRd: true, syntax: ['rd', 'rs2'],
})

/** In decoding order: a form with a fixed field comes before the general one it is carved from. */
export const C_FORMS: readonly CForm[] = [
  // Quadrant 0
  { name: 'c.addi4spn', op: 'addi', match: Q(0, 0), mask: F3, regs: [rdP], imm: { scatter: [[5, 4, 11], [9, 6, 7], [2, 2, 6], [3, 3, 5]], signed: false, nonzero: true }, fixed: SP, syntax: ['rd', 'sp', 'imm'] },
  { name: 'c.fld', op: 'fld', match: Q(0, 1), mask: F3, regs: [rdP, rs1P], imm: { scatter: ldScatter, signed: false }, syntax: ['rd', 'mem'] },
  { name: 'c.lw', op: 'lw', match: Q(0, 2), mask: F3, regs: [rdP, rs1P], imm: { scatter: lwScatter, signed: false }, syntax: ['rd', 'mem'] },
  { name: 'c.ld', op: 'ld', match: Q(0, 3), mask: F3, regs: [rdP, rs1P], imm: { scatter: ldScatter, signed: false }, syntax: ['rd', 'mem'] },
  { name: 'c.fsd', op: 'fsd', match: Q(0, 5), mask: F3, regs: [rs2P, rs1P], imm: { scatter: ldScatter, signed: false }, syntax: ['rs2', 'mem'] },
  { name: 'c.sw', op: 'sw', match: Q(0, 6), mask: F3, regs: [rs2P, rs1P], imm: { scatter: lwScatter, signed: false }, syntax: ['rs2', 'mem'] },
  { name: 'c.sd', op: 'sd', match: Q(0, 7), mask: F3, regs: [rs2P, rs1P], imm: { scatter: ldScatter, signed: false }, syntax: ['rs2', 'mem'] },
  // Quadrant 1
  { name: 'c.nop', op: 'addi', match: 0x0001, mask: 0xffff, regs: [], fixed: { rd: 0, rs1: 0, imm: 0 }, syntax: [] },
  { name: 'c.addi', op: 'addi', match: Q(1, 0), mask: F3, regs: [rdFull], imm: { scatter: imm6, signed: true }, rs1IsRd: true, syntax: ['rd', 'imm'] },
  { name: 'c.addiw', op: 'addiw', match: Q(1, 1), mask: F3, regs: [{ ...rdFull, nonzero: true }], imm: { scatter: imm6, signed: true }, rs1IsRd: true, syntax: ['rd', 'imm'] },
  { name: 'c.li', op: 'addi', match: Q(1, 2), mask: F3, regs: [rdFull], imm: { scatter: imm6, signed: true }, fixed: { rs1: 0 }, syntax: ['rd', 'imm'] },
  { name: 'c.addi16sp', op: 'addi', match: Q(1, 3) | (2 << 7), mask: F3 | (0x1f << 7), regs: [], imm: { scatter: [[9, 9, 12], [4, 4, 6], [6, 6, 5], [8, 7, 3], [5, 5, 2]], signed: true, nonzero: true }, fixed: { rd: 2, rs1: 2 }, syntax: ['sp', 'imm'] },
  { name: 'c.lui', op: 'lui', match: Q(1, 3), mask: F3, regs: [{ ...rdFull, not2: true }], imm: { scatter: [[17, 17, 12], [16, 12, 2]], signed: true, nonzero: true }, lui: true, syntax: ['rd', 'imm'] },
  { name: 'c.srli', op: 'srli', match: 0x8001, mask: 0xec03, regs: [rdP7], imm: { scatter: imm6, signed: false }, rs1IsRd: true, syntax: ['rd', 'imm'] },
  { name: 'c.srai', op: 'srai', match: 0x8401, mask: 0xec03, regs: [rdP7], imm: { scatter: imm6, signed: false }, rs1IsRd: true, syntax: ['rd', 'imm'] },
  { name: 'c.andi', op: 'andi', match: 0x8801, mask: 0xec03, regs: [rdP7], imm: { scatter: imm6, signed: true }, rs1IsRd: true, syntax: ['rd', 'imm'] },
  alu('c.sub', 'sub', 0, false),
  alu('c.xor', 'xor', 1, false),
  alu('c.or', 'or', 2, false),
  alu('c.and', 'and', 3, false),
  alu('c.subw', 'subw', 0, true),
  alu('c.addw', 'addw', 1, true),
  { name: 'c.j', op: 'jal', match: Q(1, 5), mask: F3, regs: [], imm: { scatter: jumpScatter, signed: true }, fixed: { rd: 0 }, syntax: ['label'] },
  { name: 'c.beqz', op: 'beq', match: Q(1, 6), mask: F3, regs: [rs1P], imm: { scatter: branchScatter, signed: true }, fixed: { rs2: 0 }, syntax: ['rs1', 'label'] },
  { name: 'c.bnez', op: 'bne', match: Q(1, 7), mask: F3, regs: [rs1P], imm: { scatter: branchScatter, signed: true }, fixed: { rs2: 0 }, syntax: ['rs1', 'label'] },
  // Quadrant 2
  { name: 'c.slli', op: 'slli', match: Q(2, 0), mask: F3, regs: [rdFull], imm: { scatter: imm6, signed: false }, rs1IsRd: true, syntax: ['rd', 'imm'] },
  { name: 'c.fldsp', op: 'fld', match: Q(2, 1), mask: F3, regs: [rdFull], imm: { scatter: ldspScatter, signed: false }, fixed: SP, syntax: ['rd', 'mem'] },
  { name: 'c.lwsp', op: 'lw', match: Q(2, 2), mask: F3, regs: [{ ...rdFull, nonzero: true }], imm: { scatter: lwspScatter, signed: false }, fixed: SP, syntax: ['rd', 'mem'] },
  { name: 'c.ldsp', op: 'ld', match: Q(2, 3), mask: F3, regs: [{ ...rdFull, nonzero: true }], imm: { scatter: ldspScatter, signed: false }, fixed: SP, syntax: ['rd', 'mem'] },
  { name: 'c.jr', op: 'jalr', match: 0x8002, mask: 0xf07f, regs: [{ key: 'rs1', at: 7, primed: false, nonzero: true }], fixed: { rd: 0, imm: 0 }, syntax: ['rs1'] },
  { name: 'c.mv', op: 'add', match: 0x8002, mask: 0xf003, regs: [rdFull, { ...rs2Full, nonzero: true }], fixed: { rs1: 0 }, syntax: ['rd', 'rs2'] },
  { name: 'c.ebreak', op: 'ebreak', match: 0x9002, mask: 0xffff, regs: [], syntax: [] },
  { name: 'c.jalr', op: 'jalr', match: 0x9002, mask: 0xf07f, regs: [{ key: 'rs1', at: 7, primed: false, nonzero: true }], fixed: { rd: 1, imm: 0 }, syntax: ['rs1'] },
  { name: 'c.add', op: 'add', match: 0x9002, mask: 0xf003, regs: [rdFull, { ...rs2Full, nonzero: true }], rs1IsRd: true, syntax: ['rd', 'rs2'] },
  { name: 'c.fsdsp', op: 'fsd', match: Q(2, 5), mask: F3, regs: [rs2Full], imm: { scatter: sdspScatter, signed: false }, fixed: SP, syntax: ['rs2', 'mem'] },
  { name: 'c.swsp', op: 'sw', match: Q(2, 6), mask: F3, regs: [rs2Full], imm: { scatter: swspScatter, signed: false }, fixed: SP, syntax: ['rs2', 'mem'] },
  { name: 'c.sdsp', op: 'sd', match: Q(2, 7), mask: F3, regs: [rs2Full], imm: { scatter: sdspScatter, signed: false }, fixed: SP, syntax: ['rs2', 'mem'] },
]

const BY_NAME = new Map(C_FORMS.map((f) => [f.name, f]))

/** The c. form called `name`, if any. */
export function compressedForm(name: string): CForm | undefined {
  return BY_NAME.get(name)
}

export interface Expanded {
  form: CForm
  op: string
  operands: Operands
}

function immOf(h: number, imm: NonNullable<CForm['imm']>): number {
  let v = 0
  let top = 0
  for (const [hi, lo, at] of imm.scatter) {
    const n = hi - lo + 1
    v |= ((h >>> at) & ((1 << n) - 1)) << lo
    top = Math.max(top, hi)
  }
  return imm.signed && (v >>> top) & 1 ? v - 2 ** (top + 1) : v
}

/** The 32-bit equivalent of a 16-bit instruction, or undefined for a reserved or unknown half-word. */
export function expandCompressed(half: number): Expanded | undefined {
  const h = half & 0xffff
  if ((h & 3) === 3) return undefined
  for (const form of C_FORMS) {
    if ((h & form.mask) !== form.match) continue
    const operands: Operands = { ...form.fixed }
    let ok = true
    for (const r of form.regs) {
      const n = r.primed ? 8 + ((h >>> r.at) & 7) : (h >>> r.at) & 0x1f
      if ((r.nonzero && n === 0) || (r.not2 && n === 2)) ok = false
      operands[r.key] = n
    }
    if (!ok) continue
    if (form.imm) {
      const v = immOf(h, form.imm)
      if (form.imm.nonzero && v === 0) continue
      operands.imm = form.lui ? (v >> 12) & 0xfffff : v
    }
    if (form.rs1IsRd) operands.rs1 = operands.rd
    return { form, op: form.op, operands }
  }
  return undefined
}

/**
 * The half-word of `form` for the expanded instruction `op operands`, or
 * undefined when they have no encoding in that form (a register outside
 * x8..x15, an immediate out of range or misaligned): the expansion of the
 * result must give back exactly the same instruction.
 */
export function compressedWord(form: CForm, op: string, operands: Operands): number | undefined {
  if (op !== form.op) return undefined
  let h = form.match
  for (const r of form.regs) {
    const n = operands[r.key]
    if (n === undefined) return undefined
    if (r.primed) {
      if (n < 8 || n > 15) return undefined
      h |= (n - 8) << r.at
    } else h |= (n & 0x1f) << r.at
  }
  if (form.imm) {
    let v = operands.imm ?? 0
    if (form.lui) v = (v << 12) >> 0 // the 20-bit field, sign-extended from bit 31 as lui does
    for (const [hi, lo, at] of form.imm.scatter) h |= ((v >> lo) & ((1 << (hi - lo + 1)) - 1)) << at
  }
  const back = expandCompressed(h)
  if (!back || back.form !== form) return undefined
  const keys = new Set([...Object.keys(operands), ...Object.keys(back.operands)]) as Set<keyof Operands>
  for (const k of keys) if (operands[k] !== back.operands[k]) return undefined
  return h
}

/** The expanded table entry of a form. */
export function expandedInfo(form: CForm): OpInfo {
  return opInfo(form.op) as OpInfo
}

/**
 * The form written as GNU as reads it (`c.addi a0,1`, `c.ld a5,8(a0)`,
 * `c.beqz a3,label`); `label` names a branch or jump target.
 */
export function formatCompressed(form: CForm, operands: Operands, label?: string): string {
  const info = expandedInfo(form)
  const fp = (key: 'rd' | 'rs2'): boolean => info.syntax.includes(key === 'rd' ? 'fd' : 'fs2')
  const parts = form.syntax.map((a) => {
    switch (a) {
      case 'rd': return registerName(fp('rd') ? 'f' : 'x', operands.rd ?? 0)
      case 'rs2': return registerName(fp('rs2') ? 'f' : 'x', operands.rs2 ?? 0)
      case 'rs1': return registerName('x', operands.rs1 ?? 0)
      case 'sp': return registerName('x', operands.rs1 ?? 2)
      case 'imm': return form.lui ? `0x${(operands.imm ?? 0).toString(16)}` : String(operands.imm ?? 0)
      case 'mem': return `${operands.imm ?? 0}(${registerName('x', operands.rs1 ?? 0)})`
      case 'label': return label ?? String(operands.imm ?? 0)
    }
  })
  return parts.length ? `${form.name} ${parts.join(',')}` : form.name
}

/**
 * The operand tokens of the expanded instruction for a c. form's tokens, in
 * the order the table's syntax wants them (for the assembler), or the number
 * of operands the form takes when `args` has another count.
 */
export function expandedArgs<T extends { text: string; column: number }>(form: CForm, args: readonly T[], make: (text: string, like: T) => T): T[] | number {
  if (args.length !== form.syntax.length) return form.syntax.length
  const by = new Map<CArg, T>()
  form.syntax.forEach((a, i) => by.set(a, args[i] as T))
  const first = args[0] ?? ({ text: '', column: 1 } as T)
  const reg = (n: number): T => make(registerName('x', n), first)
  const get = (a: CArg): T => by.get(a) as T
  switch (form.op) {
    case 'jal': return [reg(0), get('label')]
    case 'beq': case 'bne': return [get('rs1'), reg(0), get('label')]
    case 'jalr': return [reg(form.fixed?.rd ?? 0), make(`0(${get('rs1').text})`, get('rs1'))]
    case 'ebreak': return []
    case 'lui': return [get('rd'), get('imm')]
    case 'add': return [get('rd'), form.rs1IsRd ? get('rd') : reg(0), get('rs2')]
  }
  if (form.syntax.includes('mem')) return [get(form.syntax[0] as CArg), get('mem')]
  if (form.name === 'c.nop') return [reg(0), reg(0), make('0', first)]
  if (form.name === 'c.addi16sp') return [get('sp'), get('sp'), get('imm')]
  if (form.name === 'c.addi4spn') return [get('rd'), get('sp'), get('imm')]
  if (form.name === 'c.li') return [get('rd'), reg(0), get('imm')]
  // rd, rd, imm / rd, rd, rs2
  return [get('rd'), get('rd'), by.get('imm') ?? get('rs2')]
}
