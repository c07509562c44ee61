/**
 * The RV64I, M and A integer instructions, the Zicsr CSR accesses and ecall
 * for write and exit. x registers are a BigInt64Array: every store wraps to 64
 * bits, as RV64 arithmetic does; the *w forms compute on 32 bits and
 * sign-extend (unprivileged ISA, "RV64I Base Integer Instruction Set").
 * F and D are in scalarfp.ts.
 */
import { instructionSize, type Instruction } from '../isa/types'
import type { Handler } from './handler'
import { operand } from './handler'
import { ExecFault, ArchState } from './machine'
import { scalarFpHandlers } from './scalarfp'

const rs1 = (m: ArchState, ins: Instruction): bigint => m.x[operand(ins, 'rs1')]!
const rs2 = (m: ArchState, ins: Instruction): bigint => m.x[operand(ins, 'rs2')]!
const imm = (ins: Instruction): bigint => BigInt(operand(ins, 'imm'))
const shamt = (b: bigint): bigint => BigInt.asUintN(64, b) & 63n
const u64 = (v: bigint): bigint => BigInt.asUintN(64, v)

type Binary = (a: bigint, b: bigint) => bigint

function regReg(fn: Binary): Handler {
  return (m, ins) => m.setX(ins.operands.rd, fn(rs1(m, ins), rs2(m, ins)))
}
function regImm(fn: Binary): Handler {
  return (m, ins) => m.setX(ins.operands.rd, fn(rs1(m, ins), imm(ins)))
}

/** Branch and jump targets: imm is the byte offset from the instruction. */
/**
 * A program starts with ra = 0, where no code is: a jump there is a return to
 * whoever called the program (a function imported from an ELF file ends with
 * `ret`). The executor ends the run normally when `next` is this value.
 */
export const RETURNED_TO_CALLER = -1

/**
 * Index of the instruction at an address: -1 inside the text but not at an
 * instruction's first byte, OUTSIDE_TEXT beyond it. Instructions are 4 or 2
 * (compressed) bytes long, so targets are looked up, not divided.
 */
export type IndexOf = (address: number) => number
export const OUTSIDE_TEXT = -2

function jumpTo(m: ArchState, indexOf: IndexOf, target: number): void {
  const i = indexOf(target)
  if (i === -1) throw new ExecFault('misaligned', `jump target 0x${target.toString(16)} is not the first byte of an instruction`)
  m.next = i
  m.jumpTarget = target
}

type Cond = (a: bigint, b: bigint) => boolean
function branch(cond: Cond, indexOf: IndexOf): Handler {
  return (m, ins) => {
    if (cond(rs1(m, ins), rs2(m, ins))) jumpTo(m, indexOf, ins.address + operand(ins, 'imm'))
  }
}

/** Loads of 1, 2, 4 or 8 bytes, sign- or zero-extended. */
function load(width: 1 | 2 | 4 | 8, signed: boolean): Handler {
  return (m, ins) => {
    const off = m.offset(ArchState.address(rs1(m, ins), imm(ins)), width)
    const v = m.mem
    const value = width === 8 ? v.getBigInt64(off, true)
      : width === 4 ? BigInt(signed ? v.getInt32(off, true) : v.getUint32(off, true))
        : width === 2 ? BigInt(signed ? v.getInt16(off, true) : v.getUint16(off, true))
          : BigInt(signed ? v.getInt8(off) : v.getUint8(off))
    m.setX(ins.operands.rd, value)
  }
}

function store(width: 1 | 2 | 4 | 8): Handler {
  return (m, ins) => {
    const off = m.offset(ArchState.address(rs1(m, ins), imm(ins)), width)
    const value = rs2(m, ins)
    if (width === 8) m.mem.setBigInt64(off, value, true)
    else if (width === 4) m.mem.setInt32(off, Number(BigInt.asIntN(32, value)), true)
    else if (width === 2) m.mem.setInt16(off, Number(BigInt.asIntN(16, value)), true)
    else m.mem.setInt8(off, Number(BigInt.asIntN(8, value)))
  }
}

const s32 = (v: bigint): bigint => BigInt.asIntN(32, v)
const u32 = (v: bigint): bigint => BigInt.asUintN(32, v)
/** M extension division: by zero gives all ones (quotient) or the dividend (remainder); overflow wraps. */
const div = (a: bigint, b: bigint): bigint => (b === 0n ? -1n : a / b)
const rem = (a: bigint, b: bigint): bigint => (b === 0n ? a : a % b)

/** A word operation: 32-bit operands, result sign-extended from bit 31. */
function word(fn: Binary, signed = true): Binary {
  return (a, b) => s32(fn(signed ? s32(a) : u32(a), signed ? s32(b) : u32(b)))
}

/** AMOs and lr/sc (A extension) on one hart: a plain read-modify-write; sc always succeeds. */
function amo(width: 4 | 8, fn: ((old: bigint, v: bigint) => bigint) | 'lr' | 'sc'): Handler {
  return (m, ins) => {
    const off = m.offset(Number(m.xu[operand(ins, 'rs1')]!), width)
    const old = width === 8 ? m.mem.getBigInt64(off, true) : BigInt(m.mem.getInt32(off, true))
    const write = (v: bigint): void => {
      if (width === 8) m.mem.setBigInt64(off, BigInt.asIntN(64, v), true)
      else m.mem.setInt32(off, Number(BigInt.asIntN(32, v)), true)
    }
    if (fn === 'lr') return m.setX(ins.operands.rd, old)
    if (fn === 'sc') {
      write(rs2(m, ins))
      return m.setX(ins.operands.rd, 0n)
    }
    write(fn(old, width === 8 ? rs2(m, ins) : s32(rs2(m, ins))))
    m.setX(ins.operands.rd, old)
  }
}

const AMOS: Record<string, (o: bigint, v: bigint, w: 4 | 8) => bigint> = {
  amoswap: (_o, v) => v,
  amoadd: (o, v) => o + v,
  amoxor: (o, v) => o ^ v,
  amoand: (o, v) => o & v,
  amoor: (o, v) => o | v,
  amomin: (o, v) => (o < v ? o : v),
  amomax: (o, v) => (o > v ? o : v),
  amominu: (o, v, w) => (BigInt.asUintN(w * 8, o) < BigInt.asUintN(w * 8, v) ? o : v),
  amomaxu: (o, v, w) => (BigInt.asUintN(w * 8, o) > BigInt.asUintN(w * 8, v) ? o : v),
}

/** Reads a CSR (privileged spec CSR listing; V 1.0 section 3 for vcsr = vxrm << 1 | vxsat). */
function readCsr(m: ArchState, csr: number): bigint {
  switch (csr) {
    case 0x001: return BigInt(m.fflags)
    case 0x002: return BigInt(m.frm)
    case 0x003: return BigInt((m.frm << 5) | m.fflags)
    case 0x008: return BigInt(m.vstart)
    case 0x009: return BigInt(m.vxsat)
    case 0x00a: return BigInt(m.vxrm)
    case 0x00f: return BigInt((m.vxrm << 1) | m.vxsat)
    case 0xc00: case 0xc01: case 0xc02: return BigInt(m.retired)
    case 0xc20: return BigInt(m.vl)
    case 0xc21: return BigInt.asIntN(64, m.vtype.raw)
    case 0xc22: return BigInt(m.vlenb)
    default: throw new ExecFault('csr', `CSR 0x${csr.toString(16)} is not available to a user program here (fflags, frm, fcsr, vstart, vxsat, vxrm, vcsr, vl, vtype, vlenb, cycle, time, instret)`)
  }
}

function writeCsr(m: ArchState, csr: number, v: bigint): void {
  const n = Number(BigInt.asUintN(32, v))
  switch (csr) {
    case 0x001: m.fflags = n & 0x1f; return
    case 0x002: m.frm = n & 7; return
    case 0x003: m.frm = (n >> 5) & 7; m.fflags = n & 0x1f; return
    case 0x008: m.vstart = n; return
    case 0x009: m.vxsat = n & 1; return
    case 0x00a: m.vxrm = n & 3; return
    case 0x00f: m.vxrm = (n >> 1) & 3; m.vxsat = n & 1; return
    default:
      readCsr(m, csr) // names an unknown CSR
      throw new ExecFault('csr', `CSR 0x${csr.toString(16)} is read-only`)
  }
}

/** csrrw/csrrs/csrrc and the immediate forms: rs1 = x0 (or imm 0) of csrrs/csrrc does not write (Zicsr). */
function csrOp(kind: 'w' | 's' | 'c', immediate: boolean): Handler {
  return (m, ins) => {
    const csr = operand(ins, 'csr')
    const src = immediate ? BigInt(operand(ins, 'imm')) : m.x[operand(ins, 'rs1')]!
    const writes = kind === 'w' || (immediate ? operand(ins, 'imm') !== 0 : operand(ins, 'rs1') !== 0)
    const old = kind === 'w' && !ins.operands.rd ? 0n : readCsr(m, csr)
    if (writes) writeCsr(m, csr, kind === 'w' ? src : kind === 's' ? old | src : old & ~src)
    m.setX(ins.operands.rd, old)
  }
}

/** Where the write system call sends its bytes (the executor enforces the output limit). */
export interface Syscalls {
  write(bytes: Uint8Array): void
}

/** ecall: a7 = 64 write(fd 1, buf, len) and a7 = 93 exit(code); anything else is an error (Linux RISC-V syscall numbers). */
function ecall(sys: Syscalls): Handler {
  return (m) => {
    const number = m.x[17]!
    if (number === 64n) {
      const fd = m.x[10]!
      if (fd !== 1n) throw new ExecFault('syscall', `write to file descriptor ${fd}: only fd 1 (standard output) is available`)
      const length = Number(m.xu[12]!)
      const address = Number(m.xu[11]!)
      if (length > 0) {
        const off = m.locate(address, length)
        if (off < 0) m.offset(m.locate(address, 1) < 0 ? address : address + length - 1, 1) // names the first byte outside
        sys.write(m.memory.subarray(off, off + length))
      }
      m.x[10] = BigInt(length)
      return
    }
    if (number === 93n) {
      m.exitCode = Number(BigInt.asUintN(8, m.x[10]!))
      return
    }
    throw new ExecFault('syscall', `ecall with a7=${number}: only write (64) and exit (93) are available`)
  }
}

export function scalarHandlers(indexOf: IndexOf, sys: Syscalls): Record<string, Handler> {
  return {
    // lui/auipc: imm is the 20-bit field; the shifted value is sign-extended from 32 bits (RV64I).
    lui: (m, ins) => m.setX(ins.operands.rd, BigInt.asIntN(32, imm(ins) << 12n)),
    auipc: (m, ins) => m.setX(ins.operands.rd, BigInt(ins.address) + BigInt.asIntN(32, imm(ins) << 12n)),
    addi: regImm((a, b) => a + b),
    slti: regImm((a, b) => (a < b ? 1n : 0n)),
    sltiu: regImm((a, b) => (u64(a) < u64(b) ? 1n : 0n)),
    xori: regImm((a, b) => a ^ b),
    ori: regImm((a, b) => a | b),
    andi: regImm((a, b) => a & b),
    slli: regImm((a, b) => a << shamt(b)),
    srli: regImm((a, b) => u64(a) >> shamt(b)),
    srai: regImm((a, b) => a >> shamt(b)),
    addiw: regImm(word((a, b) => a + b)),
    slliw: regImm((a, b) => s32(a << (b & 31n))),
    srliw: regImm((a, b) => s32(u32(a) >> (b & 31n))),
    sraiw: regImm((a, b) => s32(a) >> (b & 31n)),
    add: regReg((a, b) => a + b),
    sub: regReg((a, b) => a - b),
    sll: regReg((a, b) => a << shamt(b)),
    slt: regReg((a, b) => (a < b ? 1n : 0n)),
    sltu: regReg((a, b) => (u64(a) < u64(b) ? 1n : 0n)),
    xor: regReg((a, b) => a ^ b),
    srl: regReg((a, b) => u64(a) >> shamt(b)),
    sra: regReg((a, b) => a >> shamt(b)),
    or: regReg((a, b) => a | b),
    and: regReg((a, b) => a & b),
    mul: regReg((a, b) => a * b),
    mulh: regReg((a, b) => (a * b) >> 64n),
    mulhsu: regReg((a, b) => (a * u64(b)) >> 64n),
    mulhu: regReg((a, b) => (u64(a) * u64(b)) >> 64n),
    div: regReg(div),
    divu: regReg((a, b) => div(u64(a), u64(b))),
    rem: regReg(rem),
    remu: regReg((a, b) => rem(u64(a), u64(b))),
    addw: regReg(word((a, b) => a + b)),
    subw: regReg(word((a, b) => a - b)),
    sllw: regReg((a, b) => s32(a << (b & 31n))),
    srlw: regReg((a, b) => s32(u32(a) >> (b & 31n))),
    sraw: regReg((a, b) => s32(a) >> (b & 31n)),
    mulw: regReg(word((a, b) => a * b)),
    divw: regReg(word(div)),
    divuw: regReg(word(div, false)),
    remw: regReg(word(rem)),
    remuw: regReg(word(rem, false)),
    beq: branch((a, b) => a === b, indexOf),
    bne: branch((a, b) => a !== b, indexOf),
    blt: branch((a, b) => a < b, indexOf),
    bge: branch((a, b) => a >= b, indexOf),
    bltu: branch((a, b) => u64(a) < u64(b), indexOf),
    bgeu: branch((a, b) => u64(a) >= u64(b), indexOf),
    jal: (m, ins) => {
      m.setX(ins.operands.rd, BigInt(ins.address + instructionSize(ins)))
      jumpTo(m, indexOf, ins.address + operand(ins, 'imm'))
    },
    jalr: (m, ins) => {
      const target = Number(BigInt.asUintN(64, rs1(m, ins) + imm(ins)) & ~1n)
      m.setX(ins.operands.rd, BigInt(ins.address + instructionSize(ins)))
      if (target === 0) m.next = RETURNED_TO_CALLER
      else jumpTo(m, indexOf, target)
    },
    lb: load(1, true),
    lh: load(2, true),
    lw: load(4, true),
    ld: load(8, true),
    lbu: load(1, false),
    lhu: load(2, false),
    lwu: load(4, false),
    sb: store(1),
    sh: store(2),
    sw: store(4),
    sd: store(8),
    // One hart, in order: fences have nothing to order.
    fence: () => {},
    'fence.i': () => {},
    ecall: ecall(sys),
    ebreak: () => {
      throw new ExecFault('ebreak', 'ebreak: a breakpoint; Chimeline has no debugger to hand it to')
    },
    csrrw: csrOp('w', false),
    csrrs: csrOp('s', false),
    csrrc: csrOp('c', false),
    csrrwi: csrOp('w', true),
    csrrsi: csrOp('s', true),
    csrrci: csrOp('c', true),
    ...amoHandlers(),
    ...scalarFpHandlers,
  }
}

function amoHandlers(): Record<string, Handler> {
  const out: Record<string, Handler> = {}
  for (const [w, width] of [['w', 4], ['d', 8]] as const) {
    for (const order of ['', '.aq', '.rl', '.aqrl']) {
      out[`lr.${w}${order}`] = amo(width, 'lr')
      out[`sc.${w}${order}`] = amo(width, 'sc')
      for (const [name, fn] of Object.entries(AMOS)) out[`${name}.${w}${order}`] = amo(width, (o, v) => fn(o, v, width))
    }
  }
  return out
}
