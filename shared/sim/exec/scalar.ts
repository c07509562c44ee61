/**
 * The scalar subset (RV64I and mul, the F/D loads, stores and moves) that
 * strip-mined loops need, plus ecall for write and exit. x registers are a
 * BigInt64Array: every store wraps to 64 bits, as RV64 arithmetic does.
 */
import type { Instruction } from '../isa/types'
import type { Handler } from './handler'
import { operand } from './handler'
import { ExecFault, Machine } from './machine'

const rs1 = (m: Machine, ins: Instruction): bigint => m.x[operand(ins, 'rs1')]!
const rs2 = (m: Machine, ins: Instruction): bigint => m.x[operand(ins, 'rs2')]!
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

function jumpTo(m: Machine, textBase: number, target: number): void {
  if ((target - textBase) % 4 !== 0) throw new ExecFault('misaligned', `jump target 0x${target.toString(16)} is not 4-byte aligned`)
  m.next = (target - textBase) / 4
}

type Cond = (a: bigint, b: bigint) => boolean
function branch(cond: Cond, textBase: number): Handler {
  return (m, ins) => {
    if (cond(rs1(m, ins), rs2(m, ins))) jumpTo(m, textBase, ins.address + operand(ins, 'imm'))
  }
}

/** ld, and lw (sign-extending). */
function load(width: 4 | 8): Handler {
  return (m, ins) => {
    const off = m.offset(Machine.address(rs1(m, ins), imm(ins)), width)
    m.setX(ins.operands.rd, width === 8 ? m.mem.getBigInt64(off, true) : BigInt(m.mem.getInt32(off, true)))
  }
}

function store(width: 4 | 8): Handler {
  return (m, ins) => {
    const off = m.offset(Machine.address(rs1(m, ins), imm(ins)), width)
    const value = rs2(m, ins)
    if (width === 8) m.mem.setBigInt64(off, value, true)
    else m.mem.setInt32(off, Number(BigInt.asIntN(32, value)), true)
  }
}

const fld: Handler = (m, ins) => {
  const off = m.offset(Machine.address(rs1(m, ins), imm(ins)), 8)
  m.fBits[operand(ins, 'rd')] = m.mem.getBigUint64(off, true)
}
const flw: Handler = (m, ins) => {
  const off = m.offset(Machine.address(rs1(m, ins), imm(ins)), 4)
  m.setF32Bits(operand(ins, 'rd'), m.mem.getUint32(off, true))
}
const fsd: Handler = (m, ins) => {
  const off = m.offset(Machine.address(rs1(m, ins), imm(ins)), 8)
  m.mem.setBigUint64(off, m.fBits[operand(ins, 'rs2')]!, true)
}
const fsw: Handler = (m, ins) => {
  const off = m.offset(Machine.address(rs1(m, ins), imm(ins)), 4)
  m.mem.setUint32(off, m.fWords[2 * operand(ins, 'rs2')]!, true)
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
        const off = m.offset(address, 1)
        if (off + length > m.memory.length) m.offset(address + length - 1, 1) // reports the byte past the end
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

export function scalarHandlers(textBase: number, sys: Syscalls): Record<string, Handler> {
  return {
    // lui/auipc: imm is the 20-bit field; the shifted value is sign-extended from 32 bits (RV64I).
    lui: (m, ins) => m.setX(ins.operands.rd, BigInt.asIntN(32, imm(ins) << 12n)),
    auipc: (m, ins) => m.setX(ins.operands.rd, BigInt(ins.address) + BigInt.asIntN(32, imm(ins) << 12n)),
    addi: regImm((a, b) => a + b),
    ori: regImm((a, b) => a | b),
    andi: regImm((a, b) => a & b),
    slli: regImm((a, b) => a << shamt(b)),
    srli: regImm((a, b) => u64(a) >> shamt(b)),
    srai: regImm((a, b) => a >> shamt(b)),
    add: regReg((a, b) => a + b),
    sub: regReg((a, b) => a - b),
    xor: regReg((a, b) => a ^ b),
    or: regReg((a, b) => a | b),
    and: regReg((a, b) => a & b),
    mul: regReg((a, b) => a * b),
    beq: branch((a, b) => a === b, textBase),
    bne: branch((a, b) => a !== b, textBase),
    blt: branch((a, b) => a < b, textBase),
    bge: branch((a, b) => a >= b, textBase),
    bltu: branch((a, b) => u64(a) < u64(b), textBase),
    bgeu: branch((a, b) => u64(a) >= u64(b), textBase),
    jal: (m, ins) => {
      m.setX(ins.operands.rd, BigInt(ins.address + 4))
      jumpTo(m, textBase, ins.address + operand(ins, 'imm'))
    },
    jalr: (m, ins) => {
      const target = Number(BigInt.asUintN(64, rs1(m, ins) + imm(ins)) & ~1n)
      m.setX(ins.operands.rd, BigInt(ins.address + 4))
      if (target === 0) m.next = RETURNED_TO_CALLER
      else jumpTo(m, textBase, target)
    },
    lw: load(4),
    ld: load(8),
    sw: store(4),
    sd: store(8),
    fld,
    flw,
    fsd,
    fsw,
    'fmv.d.x': (m, ins) => {
      m.fBits[operand(ins, 'rd')] = BigInt.asUintN(64, rs1(m, ins))
    },
    'fmv.x.d': (m, ins) => m.setX(ins.operands.rd, BigInt.asIntN(64, m.fBits[operand(ins, 'rs1')]!)),
    ecall: ecall(sys),
  }
}
