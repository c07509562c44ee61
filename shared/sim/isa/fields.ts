/**
 * Operand kinds: how each operand is written in assembly and where its bits
 * sit in the 32-bit word (RISC-V unprivileged ISA, chapter "RV32I Base Integer
 * Instruction Set", instruction formats R/I/S/B/U/J; RISC-V V 1.0 section 10
 * "Vector Arithmetic Instruction Formats" and section 7 for vector memory).
 */
import type { Operands } from './types'
import type { RegFile } from './registers'

export type OperandKind =
  | 'xd' | 'xs1' | 'xs2' // x registers in rd / rs1 / rs2
  | 'fd' | 'fs1' | 'fs2' | 'fs3' // f registers in rd / rs1 / rs2 / rs3 (bits 31:27, fused multiply-add)
  | 'vd' | 'vs1' | 'vs2' | 'vs3' // vector registers (vs3 = store data, in the vd field)
  | 'simm5' | 'uimm5' // OPIVI immediate in bits 19:15
  | 'avl5' // vsetivli AVL, unsigned, bits 19:15
  | 'simm12' // I-type immediate
  | 'shamt6' // RV64 shift amount, bits 25:20
  | 'shamt5' // *w shift amount, bits 24:20
  | 'rm' // optional trailing rounding mode (rne, rtz, rdn, rup, rmm, dyn), bits 14:12
  | 'csr' // CSR number or name, bits 31:20
  | 'pred' | 'succ' // fence sets (i, o, r, w), bits 27:24 and 23:20
  | 'uimm20' // U-type immediate field (lui/auipc)
  | 'load' // imm(rs1), I-type offset
  | 'store' // imm(rs1), S-type offset
  | 'vaddr' // (rs1), vector memory base
  | 'branch' // B-type label
  | 'jump' // J-type label
  | 'vtypei11' | 'vtypei10' // vsetvli / vsetivli vtype immediates
  | 'vm' // optional trailing v0.t (bit 25 = 0 when present)
  | 'v0' // the literal v0 of vmerge/vfmerge (vm = 0 is fixed)

/** Which Operands key an operand fills, and for registers which file. */
export interface FieldSpec {
  key: keyof Operands
  file?: RegFile
  /** Bits of the word this operand owns (the rest are fixed by the opcode). */
  bits: number
}

const rd = 0x1f << 7
const rs1 = 0x1f << 15
const rs2 = 0x1f << 20

export const FIELDS: Record<OperandKind, FieldSpec> = {
  xd: { key: 'rd', file: 'x', bits: rd },
  xs1: { key: 'rs1', file: 'x', bits: rs1 },
  xs2: { key: 'rs2', file: 'x', bits: rs2 },
  fd: { key: 'rd', file: 'f', bits: rd },
  fs1: { key: 'rs1', file: 'f', bits: rs1 },
  fs2: { key: 'rs2', file: 'f', bits: rs2 },
  fs3: { key: 'rs3', file: 'f', bits: 0x1f << 27 },
  vd: { key: 'vd', file: 'v', bits: rd },
  vs1: { key: 'vs1', file: 'v', bits: rs1 },
  vs2: { key: 'vs2', file: 'v', bits: rs2 },
  vs3: { key: 'vd', file: 'v', bits: rd },
  simm5: { key: 'imm', bits: rs1 },
  uimm5: { key: 'imm', bits: rs1 },
  avl5: { key: 'imm', bits: rs1 },
  simm12: { key: 'imm', bits: 0xfff << 20 },
  shamt6: { key: 'imm', bits: 0x3f << 20 },
  shamt5: { key: 'imm', bits: 0x1f << 20 },
  rm: { key: 'rm', bits: 7 << 12 },
  csr: { key: 'csr', bits: 0xfff << 20 },
  pred: { key: 'pred', bits: 0xf << 24 },
  succ: { key: 'succ', bits: 0xf << 20 },
  uimm20: { key: 'imm', bits: 0xfffff << 12 },
  load: { key: 'imm', bits: (0xfff << 20) | rs1 },
  store: { key: 'imm', bits: (0x7f << 25) | rd | rs1 },
  vaddr: { key: 'rs1', file: 'x', bits: rs1 },
  branch: { key: 'imm', bits: (0x7f << 25) | rd },
  jump: { key: 'imm', bits: 0xfffff << 12 },
  vtypei11: { key: 'vtypei', bits: 0x7ff << 20 },
  vtypei10: { key: 'vtypei', bits: 0x3ff << 20 },
  vm: { key: 'vm', bits: 1 << 25 },
  v0: { key: 'vm', bits: 0 },
}

/** Inclusive value range of each immediate kind (branch/jump: byte offsets). */
export const IMM_RANGE: Partial<Record<OperandKind, [number, number]>> = {
  simm5: [-16, 15],
  uimm5: [0, 31],
  avl5: [0, 31],
  simm12: [-2048, 2047],
  shamt6: [0, 63],
  shamt5: [0, 31],
  uimm20: [0, 0xfffff],
  load: [-2048, 2047],
  store: [-2048, 2047],
  branch: [-4096, 4094],
  jump: [-(1 << 20), (1 << 20) - 2],
  vtypei11: [0, 0x7ff],
  vtypei10: [0, 0x3ff],
}

const sext = (v: number, bits: number): number => (v << (32 - bits)) >> (32 - bits)
const bit = (w: number, hi: number, lo: number): number => (w >>> lo) & ((1 << (hi - lo + 1)) - 1)

/** Places an operand's value into its bits (value already range-checked). */
export function insertField(kind: OperandKind, ops: Operands): number {
  const spec = FIELDS[kind]
  const v = ops[spec.key]
  switch (kind) {
    case 'xd': case 'fd': case 'vd': case 'vs3': return ((v as number) & 0x1f) << 7
    case 'xs1': case 'fs1': case 'vs1': case 'vaddr': case 'simm5': case 'uimm5': case 'avl5':
      return ((v as number) & 0x1f) << 15
    case 'xs2': case 'fs2': case 'vs2': return ((v as number) & 0x1f) << 20
    case 'fs3': return ((v as number) & 0x1f) << 27
    case 'shamt5': return ((v as number) & 0x1f) << 20
    case 'rm': return ((v as number) & 7) << 12
    case 'csr': return ((v as number) & 0xfff) << 20
    case 'pred': return ((v as number) & 0xf) << 24
    case 'succ': return ((v as number) & 0xf) << 20
    case 'simm12': return ((v as number) & 0xfff) << 20
    case 'shamt6': return ((v as number) & 0x3f) << 20
    case 'uimm20': return ((v as number) & 0xfffff) << 12
    case 'vtypei11': return ((v as number) & 0x7ff) << 20
    case 'vtypei10': return ((v as number) & 0x3ff) << 20
    case 'load': return (((v as number) & 0xfff) << 20) | (((ops.rs1 ?? 0) & 0x1f) << 15)
    case 'store': {
      const i = v as number
      return (bit(i, 11, 5) << 25) | (bit(i, 4, 0) << 7) | (((ops.rs1 ?? 0) & 0x1f) << 15)
    }
    case 'branch': {
      const i = v as number
      return (bit(i, 12, 12) << 31) | (bit(i, 10, 5) << 25) | (bit(i, 4, 1) << 8) | (bit(i, 11, 11) << 7)
    }
    case 'jump': {
      const i = v as number
      return (bit(i, 20, 20) << 31) | (bit(i, 10, 1) << 21) | (bit(i, 11, 11) << 20) | (bit(i, 19, 12) << 12)
    }
    case 'vm': return v === false ? 0 : 1 << 25
    case 'v0': return 0
  }
}

/** Reads an operand's value back from a word into `ops`. */
export function extractField(kind: OperandKind, w: number, ops: Operands): void {
  switch (kind) {
    case 'xd': case 'fd': ops.rd = bit(w, 11, 7); return
    case 'vd': case 'vs3': ops.vd = bit(w, 11, 7); return
    case 'xs1': case 'fs1': case 'vaddr': ops.rs1 = bit(w, 19, 15); return
    case 'vs1': ops.vs1 = bit(w, 19, 15); return
    case 'xs2': case 'fs2': ops.rs2 = bit(w, 24, 20); return
    case 'fs3': ops.rs3 = bit(w, 31, 27); return
    case 'shamt5': ops.imm = bit(w, 24, 20); return
    case 'rm': ops.rm = bit(w, 14, 12); return
    case 'csr': ops.csr = bit(w, 31, 20); return
    case 'pred': ops.pred = bit(w, 27, 24); return
    case 'succ': ops.succ = bit(w, 23, 20); return
    case 'vs2': ops.vs2 = bit(w, 24, 20); return
    case 'simm5': ops.imm = sext(bit(w, 19, 15), 5); return
    case 'uimm5': case 'avl5': ops.imm = bit(w, 19, 15); return
    case 'simm12': ops.imm = sext(bit(w, 31, 20), 12); return
    case 'shamt6': ops.imm = bit(w, 25, 20); return
    case 'uimm20': ops.imm = bit(w, 31, 12); return
    case 'vtypei11': ops.vtypei = bit(w, 30, 20); return
    case 'vtypei10': ops.vtypei = bit(w, 29, 20); return
    case 'load': ops.imm = sext(bit(w, 31, 20), 12); ops.rs1 = bit(w, 19, 15); return
    case 'store': ops.imm = sext((bit(w, 31, 25) << 5) | bit(w, 11, 7), 12); ops.rs1 = bit(w, 19, 15); return
    case 'branch':
      ops.imm = sext((bit(w, 31, 31) << 12) | (bit(w, 7, 7) << 11) | (bit(w, 30, 25) << 5) | (bit(w, 11, 8) << 1), 13)
      return
    case 'jump':
      ops.imm = sext((bit(w, 31, 31) << 20) | (bit(w, 19, 12) << 12) | (bit(w, 20, 20) << 11) | (bit(w, 30, 21) << 1), 21)
      return
    case 'vm': ops.vm = bit(w, 25, 25) === 1; return
    case 'v0': ops.vm = false; return
  }
}
