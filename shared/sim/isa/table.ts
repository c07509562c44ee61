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
  | 'wide' // EMUL = 2 x LMUL: the 2 x SEW operand of widening and narrowing ops
  | 'vf2' | 'vf4' | 'vf8' // EMUL = LMUL / 2, / 4, / 8: the source of vzext/vsext
  | 'whole' // `nr` whole registers, whatever vtype says (vl<nr>re, vs<nr>r, vmv<nr>r)

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
  /** The rounding mode GNU as encodes when none is written (7, dyn), for instructions with an `rm` operand. */
  rmDefault?: number
  /** Segment accesses: fields per element (2..8); whole-register forms: registers moved. */
  nf?: number
  /** Whole-register loads, stores and moves (`vl<nr>re<eew>.v`, `vs<nr>r.v`, `vmv<nr>r.v`). */
  nr?: number
  /** Widening (2) or narrowing (0.5) destination EEW over SEW; extensions: source EEW = SEW / `extend`. */
  widen?: number
  extend?: number
  /** vle<eew>ff.v and vlseg<nf>e<eew>ff.v: a fault past element 0 trims vl instead (spec 7.7). */
  faultOnlyFirst?: boolean
  /** vadc, vsbc and the carry-in forms of vmadc/vmsbc read v0 as carry or borrow bits. */
  carryIn?: boolean
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

// ---- scalar: RV64I, M, A, F, D and Zicsr (unprivileged ISA, opcode map) ----
const R = (f7: number, f3: number, opcode = 0x33): number => (f7 << 25) | (f3 << 12) | opcode
const scalar: Meta = { category: 'scalar' }
for (const [op, f7, f3] of [
  ['add', 0, 0], ['sub', 0x20, 0], ['sll', 0, 1], ['slt', 0, 2], ['sltu', 0, 3], ['xor', 0, 4], ['srl', 0, 5], ['sra', 0x20, 5], ['or', 0, 6], ['and', 0, 7],
  ['mul', 1, 0], ['mulh', 1, 1], ['mulhsu', 1, 2], ['mulhu', 1, 3], ['div', 1, 4], ['divu', 1, 5], ['rem', 1, 6], ['remu', 1, 7],
] as const) add(op, ['xd', 'xs1', 'xs2'], R(f7, f3), scalar)
for (const [op, f7, f3] of [
  ['addw', 0, 0], ['subw', 0x20, 0], ['sllw', 0, 1], ['srlw', 0, 5], ['sraw', 0x20, 5],
  ['mulw', 1, 0], ['divw', 1, 4], ['divuw', 1, 5], ['remw', 1, 6], ['remuw', 1, 7],
] as const) add(op, ['xd', 'xs1', 'xs2'], R(f7, f3, 0x3b), scalar)
for (const [op, f3] of [['addi', 0], ['slti', 2], ['sltiu', 3], ['xori', 4], ['ori', 6], ['andi', 7]] as const) add(op, ['xd', 'xs1', 'simm12'], (f3 << 12) | 0x13, scalar)
for (const [op, f6, f3] of [['slli', 0, 1], ['srli', 0, 5], ['srai', 0x10, 5]] as const) {
  add(op, ['xd', 'xs1', 'shamt6'], (f6 << 26) | (f3 << 12) | 0x13, scalar)
}
add('addiw', ['xd', 'xs1', 'simm12'], 0x1b, scalar)
for (const [op, f7, f3] of [['slliw', 0, 1], ['srliw', 0, 5], ['sraiw', 0x20, 5]] as const) add(op, ['xd', 'xs1', 'shamt5'], R(f7, f3, 0x1b), scalar)
add('lui', ['xd', 'uimm20'], 0x37, scalar)
add('auipc', ['xd', 'uimm20'], 0x17, scalar)
for (const [op, f3] of [['beq', 0], ['bne', 1], ['blt', 4], ['bge', 5], ['bltu', 6], ['bgeu', 7]] as const) {
  add(op, ['xs1', 'xs2', 'branch'], (f3 << 12) | 0x63, scalar)
}
add('jal', ['xd', 'jump'], 0x6f, scalar)
add('jalr', ['xd', 'load'], 0x67, scalar)
for (const [op, f3] of [['lb', 0], ['lh', 1], ['lw', 2], ['ld', 3], ['lbu', 4], ['lhu', 5], ['lwu', 6]] as const) add(op, ['xd', 'load'], (f3 << 12) | 0x03, scalar)
for (const [op, f3] of [['sb', 0], ['sh', 1], ['sw', 2], ['sd', 3]] as const) add(op, ['xs2', 'store'], (f3 << 12) | 0x23, scalar)
add('fence', ['pred', 'succ'], 0x0f, scalar)
add('fence.i', [], 0x100f, scalar)
add('ecall', [], 0x73, scalar)
add('ebreak', [], 0x00100073, scalar)
for (const [op, f3] of [['csrrw', 1], ['csrrs', 2], ['csrrc', 3]] as const) add(op, ['xd', 'csr', 'xs1'], (f3 << 12) | 0x73, scalar)
for (const [op, f3] of [['csrrwi', 5], ['csrrsi', 6], ['csrrci', 7]] as const) add(op, ['xd', 'csr', 'uimm5'], (f3 << 12) | 0x73, scalar)
// A: lr/sc and the AMOs, each with the .aq, .rl and .aqrl orderings (bits 26, 25).
for (const [w, f3] of [['w', 2], ['d', 3]] as const) {
  for (const [order, bits] of [['', 0], ['.aq', 2], ['.rl', 1], ['.aqrl', 3]] as const) {
    const base = (f3 << 12) | 0x2f | (bits << 25)
    add(`lr.${w}${order}`, ['xd', 'vaddr'], base | (0x02 << 27), scalar)
    add(`sc.${w}${order}`, ['xd', 'xs2', 'vaddr'], base | (0x03 << 27), scalar)
    for (const [amo, f5] of [['amoswap', 0x01], ['amoadd', 0x00], ['amoxor', 0x04], ['amoand', 0x0c], ['amoor', 0x08], ['amomin', 0x10], ['amomax', 0x14], ['amominu', 0x18], ['amomaxu', 0x1c]] as const) {
      add(`${amo}.${w}${order}`, ['xd', 'xs2', 'vaddr'], base | (f5 << 27), scalar)
    }
  }
}
// F and D (fmt bits 26:25: 0 single, 1 double).
add('flw', ['fd', 'load'], (2 << 12) | 0x07, scalar)
add('fld', ['fd', 'load'], (3 << 12) | 0x07, scalar)
add('fsw', ['fs2', 'store'], (2 << 12) | 0x27, scalar)
add('fsd', ['fs2', 'store'], (3 << 12) | 0x27, scalar)
const FP = (f5: number, fmt: number, rs2 = 0): number => (f5 << 27) | (fmt << 25) | (rs2 << 20) | 0x53
const rounded: Meta = { ...scalar, rmDefault: 7 }
for (const [t, fmt] of [['s', 0], ['d', 1]] as const) {
  for (const [op, opcode] of [['fmadd', 0x43], ['fmsub', 0x47], ['fnmsub', 0x4b], ['fnmadd', 0x4f]] as const) {
    add(`${op}.${t}`, ['fd', 'fs1', 'fs2', 'fs3', 'rm'], (fmt << 25) | opcode, rounded)
  }
  for (const [op, f5] of [['fadd', 0], ['fsub', 1], ['fmul', 2], ['fdiv', 3]] as const) add(`${op}.${t}`, ['fd', 'fs1', 'fs2', 'rm'], FP(f5, fmt), rounded)
  add(`fsqrt.${t}`, ['fd', 'fs1', 'rm'], FP(0x0b, fmt), rounded)
  for (const [op, f3] of [['fsgnj', 0], ['fsgnjn', 1], ['fsgnjx', 2]] as const) add(`${op}.${t}`, ['fd', 'fs1', 'fs2'], FP(4, fmt) | (f3 << 12), scalar)
  for (const [op, f3] of [['fmin', 0], ['fmax', 1]] as const) add(`${op}.${t}`, ['fd', 'fs1', 'fs2'], FP(5, fmt) | (f3 << 12), scalar)
  for (const [op, f3] of [['fle', 0], ['flt', 1], ['feq', 2]] as const) add(`${op}.${t}`, ['xd', 'fs1', 'fs2'], FP(0x14, fmt) | (f3 << 12), scalar)
  add(`fclass.${t}`, ['xd', 'fs1'], FP(0x1c, fmt) | (1 << 12), scalar)
  for (const [it, code] of [['w', 0], ['wu', 1], ['l', 2], ['lu', 3]] as const) {
    add(`fcvt.${it}.${t}`, ['xd', 'fs1', 'rm'], FP(0x18, fmt, code), rounded)
    // A 32-bit integer to double is exact: binutils 2.40 takes no rounding mode there and encodes rne (0).
    if (t === 'd' && (it === 'w' || it === 'wu')) add(`fcvt.${t}.${it}`, ['fd', 'xs1'], FP(0x1a, fmt, code), scalar)
    else add(`fcvt.${t}.${it}`, ['fd', 'xs1', 'rm'], FP(0x1a, fmt, code), rounded)
  }
}
add('fcvt.s.d', ['fd', 'fs1', 'rm'], FP(0x08, 0, 1), rounded)
add('fcvt.d.s', ['fd', 'fs1'], FP(0x08, 1, 0), scalar)
add('fmv.x.w', ['xd', 'fs1'], FP(0x1c, 0), scalar)
add('fmv.w.x', ['fd', 'xs1'], FP(0x1e, 0), scalar)
add('fmv.x.d', ['xd', 'fs1'], FP(0x1c, 1), scalar)
add('fmv.d.x', ['fd', 'xs1'], FP(0x1e, 1), scalar)

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
const VM1_MEM = 1 << 25
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
for (const eew of [8, 16, 32, 64] as const) {
  const w = WIDTH[eew] << 12
  // Fault-only-first (spec 7.7): lumop 10000.
  add(`vle${eew}ff.v`, ['vd', 'vaddr', 'vm'], LOAD | w | (0b10000 << 20), { ...mem(false, 'unit', eew), faultOnlyFirst: true })
  // Segments (spec 7.8): nf - 1 in bits 31:29.
  for (let nf = 2; nf <= 8; nf++) {
    const f = ((nf - 1) << 29) >>> 0
    const seg = (isStore: boolean, pattern: MemoryPattern, extra: Meta['groups'] = {}): Meta => ({ ...mem(isStore, pattern, eew, extra), nf })
    add(`vlseg${nf}e${eew}.v`, ['vd', 'vaddr', 'vm'], LOAD | w | f, seg(false, 'unit'))
    add(`vlseg${nf}e${eew}ff.v`, ['vd', 'vaddr', 'vm'], LOAD | w | f | (0b10000 << 20), { ...seg(false, 'unit'), faultOnlyFirst: true })
    add(`vsseg${nf}e${eew}.v`, ['vs3', 'vaddr', 'vm'], STORE | w | f, seg(true, 'unit'))
    add(`vlsseg${nf}e${eew}.v`, ['vd', 'vaddr', 'xs2', 'vm'], LOAD | w | f | (2 << 26), seg(false, 'strided'))
    add(`vssseg${nf}e${eew}.v`, ['vs3', 'vaddr', 'xs2', 'vm'], STORE | w | f | (2 << 26), seg(true, 'strided'))
    for (const [kind, mop] of [['u', 1], ['o', 3]] as const) {
      add(`vl${kind}xseg${nf}ei${eew}.v`, ['vd', 'vaddr', 'vs2', 'vm'], LOAD | w | f | (mop << 26), seg(false, 'indexed', { vs2: 'eew' }))
      add(`vs${kind}xseg${nf}ei${eew}.v`, ['vs3', 'vaddr', 'vs2', 'vm'], STORE | w | f | (mop << 26), seg(true, 'indexed', { vs2: 'eew' }))
    }
  }
  // Whole-register loads (spec 7.9): lumop 01000, vm = 1, nf = registers - 1.
  for (const nr of [1, 2, 4, 8]) {
    add(`vl${nr}re${eew}.v`, ['vd', 'vaddr'], LOAD | w | VM1_MEM | (0b01000 << 20) | (((nr - 1) << 29) >>> 0), { ...mem(false, 'unit', eew), nr, groups: { vd: 'whole' } })
  }
}
for (const nr of [1, 2, 4, 8]) {
  add(`vs${nr}r.v`, ['vs3', 'vaddr'], STORE | VM1_MEM | (0b01000 << 20) | (((nr - 1) << 29) >>> 0), { ...mem(true, 'unit', 8), nr, groups: { vd: 'whole' } })
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

// ---- add-with-carry and subtract-with-borrow (spec 11.4) ----
const carry: Meta = { category: 'vector integer', unit: 'alu' }
add('vadc.vvm', ['vd', 'vs2', 'vs1', 'v0'], opv(0b010000, IVV), { ...carry, carryIn: true })
add('vadc.vxm', ['vd', 'vs2', 'xs1', 'v0'], opv(0b010000, IVX), { ...carry, carryIn: true })
add('vadc.vim', ['vd', 'vs2', 'simm5', 'v0'], opv(0b010000, IVI), { ...carry, carryIn: true })
add('vsbc.vvm', ['vd', 'vs2', 'vs1', 'v0'], opv(0b010010, IVV), { ...carry, carryIn: true })
add('vsbc.vxm', ['vd', 'vs2', 'xs1', 'v0'], opv(0b010010, IVX), { ...carry, carryIn: true })
const carryOut: Meta = { ...carry, maskDest: true, groups: { vd: 'single' } }
add('vmadc.vvm', ['vd', 'vs2', 'vs1', 'v0'], opv(0b010001, IVV), { ...carryOut, carryIn: true })
add('vmadc.vxm', ['vd', 'vs2', 'xs1', 'v0'], opv(0b010001, IVX), { ...carryOut, carryIn: true })
add('vmadc.vim', ['vd', 'vs2', 'simm5', 'v0'], opv(0b010001, IVI), { ...carryOut, carryIn: true })
add('vmadc.vv', ['vd', 'vs2', 'vs1'], opv(0b010001, IVV, VM1), carryOut)
add('vmadc.vx', ['vd', 'vs2', 'xs1'], opv(0b010001, IVX, VM1), carryOut)
add('vmadc.vi', ['vd', 'vs2', 'simm5'], opv(0b010001, IVI, VM1), carryOut)
add('vmsbc.vvm', ['vd', 'vs2', 'vs1', 'v0'], opv(0b010011, IVV), { ...carryOut, carryIn: true })
add('vmsbc.vxm', ['vd', 'vs2', 'xs1', 'v0'], opv(0b010011, IVX), { ...carryOut, carryIn: true })
add('vmsbc.vv', ['vd', 'vs2', 'vs1'], opv(0b010011, IVV, VM1), carryOut)
add('vmsbc.vx', ['vd', 'vs2', 'xs1'], opv(0b010011, IVX, VM1), carryOut)

// ---- more integer ops (spec 11.10, 11.3) ----
binary('vmulhsu', 0b100110, ['vv', 'vx'], 'm', imul)
const ext: Meta = { category: 'vector integer', unit: 'alu' }
for (const [name, code, f] of [['vzext.vf8', 0b00010, 8], ['vsext.vf8', 0b00011, 8], ['vzext.vf4', 0b00100, 4], ['vsext.vf4', 0b00101, 4], ['vzext.vf2', 0b00110, 2], ['vsext.vf2', 0b00111, 2]] as const) {
  add(name, ['vd', 'vs2', 'vm'], opv(0b010010, MVV, vs1Fixed(code)), { ...ext, extend: f, groups: { vs2: `vf${f}` } })
}

// ---- widening integer (spec 11.2, 11.12, 11.14): the destination is 2 x SEW ----
const wide: Meta = { category: 'vector integer', unit: 'alu', widen: 2, groups: { vd: 'wide' } }
binary('vwaddu', 0b110000, ['vv', 'vx'], 'm', wide)
binary('vwadd', 0b110001, ['vv', 'vx'], 'm', wide)
binary('vwsubu', 0b110010, ['vv', 'vx'], 'm', wide)
binary('vwsub', 0b110011, ['vv', 'vx'], 'm', wide)
const wideW: Meta = { ...wide, groups: { vd: 'wide', vs2: 'wide' } }
for (const [name, f6] of [['vwaddu', 0b110100], ['vwadd', 0b110101], ['vwsubu', 0b110110], ['vwsub', 0b110111]] as const) {
  add(`${name}.wv`, FORM_SYNTAX.vv, opv(f6, MVV), wideW)
  add(`${name}.wx`, FORM_SYNTAX.vx, opv(f6, MVX), wideW)
}
const wmul: Meta = { ...wide, unit: 'mul' }
binary('vwmulu', 0b111000, ['vv', 'vx'], 'm', wmul)
binary('vwmulsu', 0b111010, ['vv', 'vx'], 'm', wmul)
binary('vwmul', 0b111011, ['vv', 'vx'], 'm', wmul)
const wmacc: Meta = { ...wmul, readsVd: true }
binary('vwmaccu', 0b111100, ['vv', 'vx'], 'm', wmacc, true)
binary('vwmacc', 0b111101, ['vv', 'vx'], 'm', wmacc, true)
binary('vwmaccus', 0b111110, ['vx'], 'm', wmacc, true)
binary('vwmaccsu', 0b111111, ['vv', 'vx'], 'm', wmacc, true)

// ---- narrowing shifts and clips (spec 11.7, 12.5): vs2 is 2 x SEW ----
const narrow: Meta = { category: 'vector integer', unit: 'alu', widen: 0.5, groups: { vs2: 'wide' } }
for (const [name, f6] of [['vnsrl', 0b101100], ['vnsra', 0b101101], ['vnclipu', 0b101110], ['vnclip', 0b101111]] as const) {
  add(`${name}.wv`, FORM_SYNTAX.vv, opv(f6, IVV), narrow)
  add(`${name}.wx`, FORM_SYNTAX.vx, opv(f6, IVX), narrow)
  add(`${name}.wi`, FORM_SYNTAX.vu, opv(f6, IVI), narrow)
}

// ---- fixed point (spec 12) ----
const fixed: Meta = { category: 'vector integer', unit: 'alu' }
binary('vsaddu', 0b100000, ['vv', 'vx', 'vi'], 'i', fixed)
binary('vsadd', 0b100001, ['vv', 'vx', 'vi'], 'i', fixed)
binary('vssubu', 0b100010, ['vv', 'vx'], 'i', fixed)
binary('vssub', 0b100011, ['vv', 'vx'], 'i', fixed)
binary('vaaddu', 0b001000, ['vv', 'vx'], 'm', fixed)
binary('vaadd', 0b001001, ['vv', 'vx'], 'm', fixed)
binary('vasubu', 0b001010, ['vv', 'vx'], 'm', fixed)
binary('vasub', 0b001011, ['vv', 'vx'], 'm', fixed)
binary('vsmul', 0b100111, ['vv', 'vx'], 'i', { ...fixed, unit: 'mul' })
binary('vssrl', 0b101010, ['vv', 'vx', 'vu'], 'i', fixed)
binary('vssra', 0b101011, ['vv', 'vx', 'vu'], 'i', fixed)

// ---- widening reductions (spec 14.2, 14.3): vd and vs1 hold a 2 x SEW element 0 ----
add('vwredsumu.vs', ['vd', 'vs2', 'vs1', 'vm'], opv(0b110000, IVV), { ...red, widen: 2 })
add('vwredsum.vs', ['vd', 'vs2', 'vs1', 'vm'], opv(0b110001, IVV), { ...red, widen: 2 })
add('vfwredusum.vs', ['vd', 'vs2', 'vs1', 'vm'], opv(0b110001, FVV), { ...fred, flopsPerElement: 1, widen: 2 })
add('vfwredosum.vs', ['vd', 'vs2', 'vs1', 'vm'], opv(0b110011, FVV), { ...fred, flopsPerElement: 1, shape: 'ordered-reduction', widen: 2 })

// ---- widening FP (spec 13.3, 13.5, 13.7) ----
const fwide: Meta = { ...fpu, widen: 2, groups: { vd: 'wide' } }
binary('vfwadd', 0b110000, ['vv', 'vf'], 'f', fwide)
binary('vfwsub', 0b110010, ['vv', 'vf'], 'f', fwide)
binary('vfwmul', 0b111000, ['vv', 'vf'], 'f', fwide)
for (const [name, f6] of [['vfwadd', 0b110100], ['vfwsub', 0b110110]] as const) {
  add(`${name}.wv`, FORM_SYNTAX.vv, opv(f6, FVV), { ...fwide, groups: { vd: 'wide', vs2: 'wide' } })
  add(`${name}.wf`, FORM_SYNTAX.vf, opv(f6, FVF), { ...fwide, groups: { vd: 'wide', vs2: 'wide' } })
}
const fwmacc: Meta = { ...fwide, flopsPerElement: 2, readsVd: true }
binary('vfwmacc', 0b111100, ['vv', 'vf'], 'f', fwmacc, true)
binary('vfwnmacc', 0b111101, ['vv', 'vf'], 'f', fwmacc, true)
binary('vfwmsac', 0b111110, ['vv', 'vf'], 'f', fwmacc, true)
binary('vfwnmsac', 0b111111, ['vv', 'vf'], 'f', fwmacc, true)

// ---- FP unary ops and the remaining conversions (spec 13.8 to 13.10, 13.14, 13.17 to 13.19) ----
add('vfrsqrt7.v', ['vd', 'vs2', 'vm'], opv(0b010011, FVV, vs1Fixed(0b00100)), fpu0)
add('vfrec7.v', ['vd', 'vs2', 'vm'], opv(0b010011, FVV, vs1Fixed(0b00101)), fpu0)
add('vfclass.v', ['vd', 'vs2', 'vm'], opv(0b010011, FVV, vs1Fixed(0b10000)), fpu0)
add('vfcvt.rtz.xu.f.v', ['vd', 'vs2', 'vm'], opv(0b010010, FVV, vs1Fixed(0b00110)), fpu0)
for (const [suffix, code] of [['xu.f', 0b01000], ['x.f', 0b01001], ['f.xu', 0b01010], ['f.x', 0b01011], ['f.f', 0b01100], ['rtz.xu.f', 0b01110], ['rtz.x.f', 0b01111]] as const) {
  add(`vfwcvt.${suffix}.v`, ['vd', 'vs2', 'vm'], opv(0b010010, FVV, vs1Fixed(code)), { ...fpu0, widen: 2, groups: { vd: 'wide' } })
}
for (const [suffix, code] of [['xu.f', 0b10000], ['x.f', 0b10001], ['f.xu', 0b10010], ['f.x', 0b10011], ['f.f', 0b10100], ['rod.f.f', 0b10101], ['rtz.xu.f', 0b10110], ['rtz.x.f', 0b10111]] as const) {
  add(`vfncvt.${suffix}.w`, ['vd', 'vs2', 'vm'], opv(0b010010, FVV, vs1Fixed(code)), { ...fpu0, widen: 0.5, groups: { vs2: 'wide' } })
}

// ---- gathers with 16-bit indices and whole-register moves (spec 16.4, 16.6) ----
add('vrgatherei16.vv', FORM_SYNTAX.vv, opv(0b001110, IVV), { ...perm, groups: { vs1: 'eew' }, eew: 16, noOverlap: ['vs1', 'vs2'] })
for (const nr of [1, 2, 4, 8]) {
  add(`vmv${nr}r.v`, ['vd', 'vs2'], opv(0b100111, IVI, VM1 | vs1Fixed(nr - 1)), { ...move, nr, groups: { vd: 'whole', vs2: 'whole' } })
}

/** Every supported instruction, in table order (the README lists them in this order). */
export const OPS: readonly OpInfo[] = table

const byName = new Map(table.map((e) => [e.op, e]))

/** The table entry of a canonical mnemonic, or undefined. */
export function opInfo(op: string): OpInfo | undefined {
  return byName.get(op)
}
