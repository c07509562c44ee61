/**
 * The instruction table: every supported mnemonic with its operand syntax, its
 * encoding (match bits; the mask is every bit its operands do not own) and the
 * metadata that execution and the timing model use.
 *
 * Encodings: RISC-V unprivileged ISA (RV64I, M, F, D base opcodes) and the
 * RISC-V "V" extension 1.0, sections 7 (vector loads and stores), 6 (vset*)
 * and 10/19 (arithmetic formats and the funct6 opcode tables). They are
 * checked word by word against GNU binutils in tests/reference/binutils/.
 */
import type { MemoryPattern } from '../exec/stream'
import { FIELDS, type OperandKind } from './fields'
import type { RegFile } from './registers'
import type { Sew, UnitClass, VectorShape } from './types'

/** How many registers an operand group spans. */
export type VGroup =
  | 'lmul' // LMUL registers (EMUL = LMUL)
  | 'single' // one register: a mask, or element 0 of a reduction/scalar move
  | 'eew' // EMUL = EEW / SEW x LMUL (unit-stride and strided data, index vectors)

export type OpCategory =
  | 'configuration' | 'scalar' | 'vector memory' | 'vector integer' | 'vector compare'
  | 'vector mask' | 'vector floating point' | 'vector move' | 'vector reduction' | 'vector permutation'

export interface OpInfo {
  op: string
  /** Operands in assembly order. */
  syntax: readonly OperandKind[]
  /** Fixed bits of the encoding. */
  match: number
  /** Bits fixed by the opcode: a word w is this instruction when (w & mask) === match. */
  mask: number
  category: OpCategory
  /** A vector instruction (handed to the timing model, vset* included). */
  vector: boolean
  /** vsetvli / vsetivli / vsetvl */
  config: boolean
  unit: UnitClass
  shape: VectorShape
  /** Flops per active element: 2 for FMA forms, 1 for other FP arithmetic, 0 otherwise. */
  flopsPerElement: 0 | 1 | 2
  /** May be written with v0.t. */
  maskable: boolean
  /** Element width in the mnemonic of a memory op (vle32.v: 32); mask loads/stores: 8. */
  eew?: Sew
  memory?: { pattern: MemoryPattern; isStore: boolean }
  /** Register-group size of each vector operand present (vd also names vs3 of stores). */
  groups: { vd?: VGroup; vs1?: VGroup; vs2?: VGroup }
  /** The destination is read as well (vmacc, vfmacc, ...: vd is an addend or multiplicand). */
  readsVd: boolean
  /** The destination holds a mask (compares, mask logic): it may overlap v0 when masked (spec 5.3). */
  maskDest: boolean
  /** Sources the destination group may not overlap (slides up, gathers, compress, mask scans, viota). */
  noOverlap: readonly ('vs1' | 'vs2')[]
  /** Register file of each scalar operand, as the syntax names it. */
  files: { rd?: RegFile; rs1?: RegFile; rs2?: RegFile }
}

type Meta = Partial<Omit<OpInfo, 'op' | 'syntax' | 'match' | 'mask' | 'files'>> & { category: OpCategory }

const table: OpInfo[] = []

function add(op: string, syntax: readonly OperandKind[], match: number, meta: Meta): void {
  let owned = 0
  const files: OpInfo['files'] = {}
  const groups: OpInfo['groups'] = {}
  for (const k of syntax) {
    const f = FIELDS[k]
    owned |= f.bits
    if (k === 'vaddr' || k === 'load' || k === 'store') files.rs1 = 'x'
    else if (f.file === 'v') groups[f.key as 'vd' | 'vs1' | 'vs2'] = 'lmul'
    else if (f.file && (f.key === 'rd' || f.key === 'rs1' || f.key === 'rs2')) files[f.key] = f.file
  }
  const vector = meta.vector ?? meta.category !== 'scalar'
  table.push({
    op, syntax, match: match >>> 0, mask: ~owned >>> 0,
    vector, config: false, unit: vector ? 'alu' : 'none', shape: 'elementwise', flopsPerElement: 0,
    maskable: syntax.includes('vm'), readsVd: false, maskDest: false, noOverlap: [],
    ...meta,
    groups: { ...groups, ...meta.groups },
    files,
  })
}

// ---- scalar subset (RV64I, M, D) ----
const R = (f7: number, f3: number): number => (f7 << 25) | (f3 << 12) | 0x33
const scalar: Meta = { category: 'scalar' }
for (const [op, f7, f3] of [['add', 0, 0], ['sub', 0x20, 0], ['mul', 1, 0], ['and', 0, 7], ['or', 0, 6], ['xor', 0, 4]] as const) {
  add(op, ['xd', 'xs1', 'xs2'], R(f7, f3), scalar)
}
for (const [op, f3] of [['addi', 0], ['andi', 7], ['ori', 6]] as const) add(op, ['xd', 'xs1', 'simm12'], (f3 << 12) | 0x13, scalar)
for (const [op, f6, f3] of [['slli', 0, 1], ['srli', 0, 5], ['srai', 0x10, 5]] as const) {
  add(op, ['xd', 'xs1', 'shamt6'], (f6 << 26) | (f3 << 12) | 0x13, scalar)
}
add('lui', ['xd', 'uimm20'], 0x37, scalar)
add('auipc', ['xd', 'uimm20'], 0x17, scalar)
for (const [op, f3] of [['beq', 0], ['bne', 1], ['blt', 4], ['bge', 5], ['bltu', 6], ['bgeu', 7]] as const) {
  add(op, ['xs1', 'xs2', 'branch'], (f3 << 12) | 0x63, scalar)
}
add('jal', ['xd', 'jump'], 0x6f, scalar)
add('jalr', ['xd', 'load'], 0x67, scalar)
add('ld', ['xd', 'load'], (3 << 12) | 0x03, scalar)
add('lw', ['xd', 'load'], (2 << 12) | 0x03, scalar)
add('sd', ['xs2', 'store'], (3 << 12) | 0x23, scalar)
add('sw', ['xs2', 'store'], (2 << 12) | 0x23, scalar)
add('fld', ['fd', 'load'], (3 << 12) | 0x07, scalar)
add('flw', ['fd', 'load'], (2 << 12) | 0x07, scalar)
add('fsd', ['fs2', 'store'], (3 << 12) | 0x27, scalar)
add('fsw', ['fs2', 'store'], (2 << 12) | 0x27, scalar)
add('fmv.d.x', ['fd', 'xs1'], (0x79 << 25) | 0x53, scalar)
add('fmv.x.d', ['xd', 'fs1'], (0x71 << 25) | 0x53, scalar)
add('ecall', [], 0x73, scalar)

// ---- configuration (spec section 6) ----
const CFG = (7 << 12) | 0x57
const config: Meta = { category: 'configuration', config: true, unit: 'none' }
add('vsetvli', ['xd', 'xs1', 'vtypei11'], CFG, config)
add('vsetivli', ['xd', 'avl5', 'vtypei10'], CFG | (3 << 30), config)
add('vsetvl', ['xd', 'xs1', 'xs2'], CFG | (1 << 31), config)

// ---- vector memory (spec section 7) ----
const WIDTH: Record<Sew, number> = { 8: 0, 16: 5, 32: 6, 64: 7 }
const LOAD = 0x07
const STORE = 0x27
const mem = (isStore: boolean, pattern: MemoryPattern, eew: Sew, extra: Meta['groups'] = {}): Meta => ({
  category: 'vector memory', unit: isStore ? 'store' : 'load', shape: 'memory', eew,
  memory: { pattern, isStore }, groups: { vd: pattern === 'indexed' ? 'lmul' : 'eew', ...extra },
})
for (const eew of [8, 16, 32, 64] as const) {
  const w = WIDTH[eew] << 12
  add(`vle${eew}.v`, ['vd', 'vaddr', 'vm'], LOAD | w, mem(false, 'unit', eew))
  add(`vse${eew}.v`, ['vs3', 'vaddr', 'vm'], STORE | w, mem(true, 'unit', eew))
  add(`vlse${eew}.v`, ['vd', 'vaddr', 'xs2', 'vm'], LOAD | w | (2 << 26), mem(false, 'strided', eew))
  add(`vsse${eew}.v`, ['vs3', 'vaddr', 'xs2', 'vm'], STORE | w | (2 << 26), mem(true, 'strided', eew))
  for (const [kind, mop] of [['u', 1], ['o', 3]] as const) {
    add(`vl${kind}xei${eew}.v`, ['vd', 'vaddr', 'vs2', 'vm'], LOAD | w | (mop << 26), mem(false, 'indexed', eew, { vs2: 'eew' }))
    add(`vs${kind}xei${eew}.v`, ['vs3', 'vaddr', 'vs2', 'vm'], STORE | w | (mop << 26), mem(true, 'indexed', eew, { vs2: 'eew' }))
  }
}
add('vlm.v', ['vd', 'vaddr'], LOAD | (1 << 25) | (0b01011 << 20), { ...mem(false, 'mask', 8), groups: { vd: 'single' } })
add('vsm.v', ['vs3', 'vaddr'], STORE | (1 << 25) | (0b01011 << 20), { ...mem(true, 'mask', 8), groups: { vd: 'single' } })

// ---- OP-V arithmetic (spec section 10: funct3 selects the operand form) ----
const IVV = 0, FVV = 1, MVV = 2, IVI = 3, IVX = 4, FVF = 5, MVX = 6
const opv = (f6: number, f3: number, extra = 0): number => (f6 << 26) | (f3 << 12) | 0x57 | extra
const VM1 = 1 << 25
const vs1Fixed = (n: number): number => n << 15

type Form = 'vv' | 'vx' | 'vi' | 'vf' | 'vu' // vu: .vi with an unsigned immediate
const FORM_SYNTAX: Record<Form, readonly OperandKind[]> = {
  vv: ['vd', 'vs2', 'vs1', 'vm'],
  vx: ['vd', 'vs2', 'xs1', 'vm'],
  vi: ['vd', 'vs2', 'simm5', 'vm'],
  vu: ['vd', 'vs2', 'uimm5', 'vm'],
  vf: ['vd', 'vs2', 'fs1', 'vm'],
}
const FMA_SYNTAX: Partial<Record<Form, readonly OperandKind[]>> = {
  vv: ['vd', 'vs1', 'vs2', 'vm'],
  vx: ['vd', 'xs1', 'vs2', 'vm'],
  vf: ['vd', 'fs1', 'vs2', 'vm'],
}

/** Adds `name.vv`, `name.vx`, ... for the forms listed; OPI or OPM funct3 by `group`. */
function binary(name: string, f6: number, forms: Form[], group: 'i' | 'm' | 'f', meta: Meta, fma = false): void {
  for (const form of forms) {
    const f3 = form === 'vv' ? (group === 'i' ? IVV : group === 'm' ? MVV : FVV)
      : form === 'vx' ? (group === 'i' ? IVX : MVX)
        : form === 'vf' ? FVF : IVI
    const syntax = (fma ? FMA_SYNTAX[form] : undefined) ?? FORM_SYNTAX[form]
    add(`${name}.${form === 'vu' ? 'vi' : form}`, syntax, opv(f6, f3), meta)
  }
}

const int: Meta = { category: 'vector integer', unit: 'alu' }
binary('vadd', 0b000000, ['vv', 'vx', 'vi'], 'i', int)
binary('vsub', 0b000010, ['vv', 'vx'], 'i', int)
binary('vrsub', 0b000011, ['vx', 'vi'], 'i', int)
binary('vminu', 0b000100, ['vv', 'vx'], 'i', int)
binary('vmin', 0b000101, ['vv', 'vx'], 'i', int)
binary('vmaxu', 0b000110, ['vv', 'vx'], 'i', int)
binary('vmax', 0b000111, ['vv', 'vx'], 'i', int)
binary('vand', 0b001001, ['vv', 'vx', 'vi'], 'i', int)
binary('vor', 0b001010, ['vv', 'vx', 'vi'], 'i', int)
binary('vxor', 0b001011, ['vv', 'vx', 'vi'], 'i', int)
binary('vsll', 0b100101, ['vv', 'vx', 'vu'], 'i', int)
binary('vsrl', 0b101000, ['vv', 'vx', 'vu'], 'i', int)
binary('vsra', 0b101001, ['vv', 'vx', 'vu'], 'i', int)
const imul: Meta = { category: 'vector integer', unit: 'mul' }
binary('vmulhu', 0b100100, ['vv', 'vx'], 'm', imul)
binary('vmul', 0b100101, ['vv', 'vx'], 'm', imul)
binary('vmulh', 0b100111, ['vv', 'vx'], 'm', imul)
const idiv: Meta = { category: 'vector integer', unit: 'div' }
binary('vdivu', 0b100000, ['vv', 'vx'], 'm', idiv)
binary('vdiv', 0b100001, ['vv', 'vx'], 'm', idiv)
binary('vremu', 0b100010, ['vv', 'vx'], 'm', idiv)
binary('vrem', 0b100011, ['vv', 'vx'], 'm', idiv)
const imacc: Meta = { category: 'vector integer', unit: 'mul', readsVd: true }
binary('vmadd', 0b101001, ['vv', 'vx'], 'm', imacc, true)
binary('vnmsub', 0b101011, ['vv', 'vx'], 'm', imacc, true)
binary('vmacc', 0b101101, ['vv', 'vx'], 'm', imacc, true)
binary('vnmsac', 0b101111, ['vv', 'vx'], 'm', imacc, true)
// vmerge: vm = 0 selects by v0 (spec 11.15)
add('vmerge.vvm', ['vd', 'vs2', 'vs1', 'v0'], opv(0b010111, IVV), int)
add('vmerge.vxm', ['vd', 'vs2', 'xs1', 'v0'], opv(0b010111, IVX), int)
add('vmerge.vim', ['vd', 'vs2', 'simm5', 'v0'], opv(0b010111, IVI), int)
add('vid.v', ['vd', 'vm'], opv(0b010100, MVV, vs1Fixed(0b10001)), int)

// ---- compares (spec 11.8): the destination is a mask register ----
const cmp: Meta = { category: 'vector compare', unit: 'alu', maskDest: true, groups: { vd: 'single' } }
binary('vmseq', 0b011000, ['vv', 'vx', 'vi'], 'i', cmp)
binary('vmsne', 0b011001, ['vv', 'vx', 'vi'], 'i', cmp)
binary('vmsltu', 0b011010, ['vv', 'vx'], 'i', cmp)
binary('vmslt', 0b011011, ['vv', 'vx'], 'i', cmp)
binary('vmsleu', 0b011100, ['vv', 'vx', 'vi'], 'i', cmp)
binary('vmsle', 0b011101, ['vv', 'vx', 'vi'], 'i', cmp)
binary('vmsgtu', 0b011110, ['vx', 'vi'], 'i', cmp)
binary('vmsgt', 0b011111, ['vx', 'vi'], 'i', cmp)

// ---- mask logic and scans (spec 15) ----
const maskLogic: Meta = { category: 'vector mask', unit: 'alu', shape: 'mask', maskDest: true, groups: { vd: 'single', vs1: 'single', vs2: 'single' } }
for (const [op, f6] of [
  ['vmandn', 0b011000], ['vmand', 0b011001], ['vmor', 0b011010], ['vmxor', 0b011011],
  ['vmorn', 0b011100], ['vmnand', 0b011101], ['vmnor', 0b011110], ['vmxnor', 0b011111],
] as const) add(`${op}.mm`, ['vd', 'vs2', 'vs1'], opv(f6, MVV, VM1), maskLogic)
const scalarMask: Meta = { category: 'vector mask', unit: 'alu', shape: 'scalar-result', groups: { vs2: 'single' } }
add('vcpop.m', ['xd', 'vs2', 'vm'], opv(0b010000, MVV, vs1Fixed(0b10000)), scalarMask)
add('vfirst.m', ['xd', 'vs2', 'vm'], opv(0b010000, MVV, vs1Fixed(0b10001)), scalarMask)
const scan: Meta = { ...maskLogic, noOverlap: ['vs2'] }
add('vmsbf.m', ['vd', 'vs2', 'vm'], opv(0b010100, MVV, vs1Fixed(0b00001)), scan)
add('vmsof.m', ['vd', 'vs2', 'vm'], opv(0b010100, MVV, vs1Fixed(0b00010)), scan)
add('vmsif.m', ['vd', 'vs2', 'vm'], opv(0b010100, MVV, vs1Fixed(0b00011)), scan)
add('viota.m', ['vd', 'vs2', 'vm'], opv(0b010100, MVV, vs1Fixed(0b10000)),
  { category: 'vector mask', unit: 'alu', shape: 'mask', groups: { vd: 'lmul', vs2: 'single' }, noOverlap: ['vs2'] })

// ---- floating point (spec 13) ----
const fpu: Meta = { category: 'vector floating point', unit: 'fpu', flopsPerElement: 1 }
const fpu0: Meta = { ...fpu, flopsPerElement: 0 }
const fdiv: Meta = { ...fpu, unit: 'div' }
binary('vfadd', 0b000000, ['vv', 'vf'], 'f', fpu)
binary('vfsub', 0b000010, ['vv', 'vf'], 'f', fpu)
binary('vfrsub', 0b100111, ['vf'], 'f', fpu)
binary('vfmul', 0b100100, ['vv', 'vf'], 'f', fpu)
binary('vfdiv', 0b100000, ['vv', 'vf'], 'f', fdiv)
binary('vfrdiv', 0b100001, ['vf'], 'f', fdiv)
// min/max and sign injection are counted as 0 flops (common practice: not arithmetic)
binary('vfmin', 0b000100, ['vv', 'vf'], 'f', fpu0)
binary('vfmax', 0b000110, ['vv', 'vf'], 'f', fpu0)
binary('vfsgnj', 0b001000, ['vv', 'vf'], 'f', fpu0)
binary('vfsgnjn', 0b001001, ['vv', 'vf'], 'f', fpu0)
binary('vfsgnjx', 0b001010, ['vv', 'vf'], 'f', fpu0)
const ffma: Meta = { ...fpu, flopsPerElement: 2, readsVd: true }
binary('vfmadd', 0b101000, ['vv', 'vf'], 'f', ffma, true)
binary('vfnmadd', 0b101001, ['vv', 'vf'], 'f', ffma, true)
binary('vfmsub', 0b101010, ['vv', 'vf'], 'f', ffma, true)
binary('vfnmsub', 0b101011, ['vv', 'vf'], 'f', ffma, true)
binary('vfmacc', 0b101100, ['vv', 'vf'], 'f', ffma, true)
binary('vfnmacc', 0b101101, ['vv', 'vf'], 'f', ffma, true)
binary('vfmsac', 0b101110, ['vv', 'vf'], 'f', ffma, true)
binary('vfnmsac', 0b101111, ['vv', 'vf'], 'f', ffma, true)
add('vfsqrt.v', ['vd', 'vs2', 'vm'], opv(0b010011, FVV, vs1Fixed(0)), fdiv)
for (const [suffix, code] of [['xu.f', 0b00000], ['x.f', 0b00001], ['f.xu', 0b00010], ['f.x', 0b00011], ['rtz.x.f', 0b00111]] as const) {
  add(`vfcvt.${suffix}.v`, ['vd', 'vs2', 'vm'], opv(0b010010, FVV, vs1Fixed(code)), fpu0)
}
const fcmp: Meta = { ...cmp, unit: 'fpu' }
binary('vmfeq', 0b011000, ['vv', 'vf'], 'f', fcmp)
binary('vmfle', 0b011001, ['vv', 'vf'], 'f', fcmp)
binary('vmflt', 0b011011, ['vv', 'vf'], 'f', fcmp)
binary('vmfne', 0b011100, ['vv', 'vf'], 'f', fcmp)
binary('vmfgt', 0b011101, ['vf'], 'f', fcmp)
binary('vmfge', 0b011111, ['vf'], 'f', fcmp)
add('vfmerge.vfm', ['vd', 'vs2', 'fs1', 'v0'], opv(0b010111, FVF), { category: 'vector floating point', unit: 'alu' })

// ---- moves (spec 11.16, 16.1, 16.2) ----
const move: Meta = { category: 'vector move', unit: 'alu' }
add('vmv.v.v', ['vd', 'vs1'], opv(0b010111, IVV, VM1), move)
add('vmv.v.x', ['vd', 'xs1'], opv(0b010111, IVX, VM1), move)
add('vmv.v.i', ['vd', 'simm5'], opv(0b010111, IVI, VM1), move)
add('vfmv.v.f', ['vd', 'fs1'], opv(0b010111, FVF, VM1), move)
const toScalar: Meta = { category: 'vector move', unit: 'alu', shape: 'scalar-result', groups: { vs2: 'single' } }
add('vmv.x.s', ['xd', 'vs2'], opv(0b010000, MVV, VM1), toScalar)
add('vfmv.f.s', ['fd', 'vs2'], opv(0b010000, FVV, VM1), toScalar)
const insert: Meta = { category: 'vector move', unit: 'alu', shape: 'scalar-insert', groups: { vd: 'single' } }
add('vmv.s.x', ['vd', 'xs1'], opv(0b010000, MVX, VM1), insert)
add('vfmv.s.f', ['vd', 'fs1'], opv(0b010000, FVF, VM1), insert)

// ---- reductions (spec 14): vd and vs1 hold element 0 only ----
const red: Meta = { category: 'vector reduction', unit: 'alu', shape: 'reduction', groups: { vd: 'single', vs1: 'single' } }
for (const [op, f6] of [
  ['vredsum', 0], ['vredand', 1], ['vredor', 2], ['vredxor', 3], ['vredminu', 4], ['vredmin', 5], ['vredmaxu', 6], ['vredmax', 7],
] as const) add(`${op}.vs`, ['vd', 'vs2', 'vs1', 'vm'], opv(f6, MVV), red)
const fred: Meta = { ...red, unit: 'fpu' }
add('vfredusum.vs', ['vd', 'vs2', 'vs1', 'vm'], opv(0b000001, FVV), { ...fred, flopsPerElement: 1 })
add('vfredosum.vs', ['vd', 'vs2', 'vs1', 'vm'], opv(0b000011, FVV), { ...fred, flopsPerElement: 1, shape: 'ordered-reduction' })
add('vfredmin.vs', ['vd', 'vs2', 'vs1', 'vm'], opv(0b000101, FVV), fred)
add('vfredmax.vs', ['vd', 'vs2', 'vs1', 'vm'], opv(0b000111, FVV), fred)

// ---- permutations (spec 16.3 to 16.5) ----
const perm: Meta = { category: 'vector permutation', unit: 'alu', shape: 'permutation' }
const permUp: Meta = { ...perm, noOverlap: ['vs2'] }
add('vslideup.vx', FORM_SYNTAX.vx, opv(0b001110, IVX), permUp)
add('vslideup.vi', FORM_SYNTAX.vu, opv(0b001110, IVI), permUp)
add('vslidedown.vx', FORM_SYNTAX.vx, opv(0b001111, IVX), perm)
add('vslidedown.vi', FORM_SYNTAX.vu, opv(0b001111, IVI), perm)
add('vslide1up.vx', FORM_SYNTAX.vx, opv(0b001110, MVX), permUp)
add('vslide1down.vx', FORM_SYNTAX.vx, opv(0b001111, MVX), perm)
add('vfslide1up.vf', FORM_SYNTAX.vf, opv(0b001110, FVF), permUp)
add('vfslide1down.vf', FORM_SYNTAX.vf, opv(0b001111, FVF), perm)
add('vrgather.vv', FORM_SYNTAX.vv, opv(0b001100, IVV), { ...perm, noOverlap: ['vs1', 'vs2'] })
add('vrgather.vx', FORM_SYNTAX.vx, opv(0b001100, IVX), permUp)
add('vrgather.vi', FORM_SYNTAX.vu, opv(0b001100, IVI), permUp)
add('vcompress.vm', ['vd', 'vs2', 'vs1'], opv(0b010111, MVV, VM1), { ...perm, groups: { vs1: 'single' }, noOverlap: ['vs1', 'vs2'] })

/** Every supported instruction, in table order (the README lists them in this order). */
export const OPS: readonly OpInfo[] = table

const byName = new Map(table.map((e) => [e.op, e]))

/** The table entry of a canonical mnemonic, or undefined. */
export function opInfo(op: string): OpInfo | undefined {
  return byName.get(op)
}
