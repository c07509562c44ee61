/**
 * Architectural state of one hart for functional execution: x and f registers,
 * the vector register file as bytes, vl/vtype and a flat little-endian data
 * memory with bounds. Handlers (scalar.ts, v*.ts) act on it.
 */
import type { Instruction, Sew } from '../isa/types'
import { CANONICAL_NAN32, CANONICAL_NAN64 } from './fp'
import type { Vtype } from './vtype'
import { vlmax } from '../isa/vtype'
import { VTYPE_ILLEGAL } from './vtype'

/** A problem caused by the program; execute() turns it into a diagnostic at the instruction. */
export class ExecFault extends Error {
  constructor(
    readonly code: string,
    message: string,
  ) {
    super(message)
  }
}

/**
 * A summation order for the unordered FP sum reduction (vfredusum), e.g. the one
 * a machine's lanes, accumulators and ring imply. It receives the start value
 * vs1[0], the active elements with their element indices, the correctly
 * rounded addition of the current SEW, and vl and SEW (where masked-off
 * elements sit decides how a machine groups the active ones); it returns the sum.
 */
export type UnorderedSum = (input: {
  start: number
  values: Float64Array
  indices: Int32Array
  add: (a: number, b: number) => number
  vl: number
  sew: 32 | 64
}) => number

export type IntView = Int8Array | Int16Array | Int32Array | Uint8Array | Uint16Array | Uint32Array

// Typed arrays use the platform's byte order; the register file and memory are
// defined little-endian, which every platform this runs on is.
if (new Uint8Array(new Uint16Array([1]).buffer)[0] !== 1) throw new Error('Chimeline needs a little-endian platform')

/** The hart's architectural state (not the machine configuration of shared/schemas/machine.ts, which the timing model reads). */
export class ArchState {
  readonly vlenb: number
  readonly x = new BigInt64Array(32)
  readonly xu = new BigUint64Array(this.x.buffer)
  readonly f = new Float64Array(32)
  readonly fBits = new BigUint64Array(this.f.buffer)
  readonly fWords = new Uint32Array(this.f.buffer)

  readonly vrf: ArrayBuffer
  readonly u8: Uint8Array
  readonly i8: Int8Array
  readonly u16: Uint16Array
  readonly i16: Int16Array
  readonly u32: Uint32Array
  readonly i32: Int32Array
  readonly u64: BigUint64Array
  readonly i64: BigInt64Array
  readonly f32: Float32Array
  readonly f64: Float64Array

  vl = 0
  vtype: Vtype = VTYPE_ILLEGAL

  readonly memory: Uint8Array
  readonly mem: DataView
  readonly dataBase: number

  /** Index of the next static instruction; handlers of jumps and branches set it. */
  next = 0
  /** The address of the last jump or taken branch (named when it leaves the text). */
  jumpTarget = 0
  /** Set by the exit system call. */
  exitCode: number | null = null
  /** Summation order of vfredusum; undefined means element order (as QEMU). */
  unorderedSum: UnorderedSum | undefined

  /**
   * Whether the program can read fflags (a Zicsr instruction names fflags or
   * fcsr): vector FP instructions work out their exception flags only then,
   * as that takes an exact computation per element.
   */
  readsFpFlags = false
  /** Floating-point CSR fields: frm (dynamic rounding mode) and fflags (accrued exceptions). */
  frm = 0
  fflags = 0
  /** Fixed-point CSR fields (V 1.0 section 3.8, 3.9): rounding mode and saturation flag. */
  vxrm = 0
  vxsat = 0
  vstart = 0
  /** Dynamic instructions retired so far (instret, cycle and time read it). */
  retired = 0

  /** Bytes of the program's data segment. */
  readonly dataSize: number
  /** The stack [stackBase, stackTop), apart from the data so that running off the data still faults; sp starts at stackTop. */
  readonly stackBase: number
  readonly stackTop: number
  /** Offset of the stack's first byte in `memory` (after the data, 16-byte aligned). */
  private readonly stackOffset: number

  constructor(
    readonly vlen: number,
    data: Uint8Array,
    dataBase: number,
    stackBytes = 0,
  ) {
    this.vlenb = vlen / 8
    this.vrf = new ArrayBuffer(32 * this.vlenb)
    this.u8 = new Uint8Array(this.vrf)
    this.i8 = new Int8Array(this.vrf)
    this.u16 = new Uint16Array(this.vrf)
    this.i16 = new Int16Array(this.vrf)
    this.u32 = new Uint32Array(this.vrf)
    this.i32 = new Int32Array(this.vrf)
    this.u64 = new BigUint64Array(this.vrf)
    this.i64 = new BigInt64Array(this.vrf)
    this.f32 = new Float32Array(this.vrf)
    this.f64 = new Float64Array(this.vrf)
    // One buffer: the data, then (16-byte aligned, the psABI's stack alignment) the stack.
    this.stackOffset = Math.ceil(data.length / 16) * 16
    this.memory = new Uint8Array(this.stackOffset + stackBytes)
    this.memory.set(data)
    this.mem = new DataView(this.memory.buffer)
    this.dataBase = dataBase
    this.dataSize = data.length
    this.stackTop = STACK_TOP
    this.stackBase = STACK_TOP - stackBytes
    if (stackBytes > 0) this.x[2] = BigInt(this.stackTop)
  }

  /** Offset in `memory` of `size` bytes at `address` in the data or the stack, or -1 when they are outside both. */
  locate(address: number, size: number): number {
    const d = address - this.dataBase
    if (d >= 0 && d + size <= this.dataSize) return d
    const st = address - this.stackBase
    if (this.stackTop > this.stackBase && st >= 0 && address + size <= this.stackTop) return this.stackOffset + st
    return -1
  }

  // ---- scalar registers ------------------------------------------------------

  setX(rd: number | undefined, value: bigint): void {
    if (rd) this.x[rd] = value // x0 stays zero; the typed array wraps to 64 bits
  }

  /** An f register as a binary32 operand: a value not NaN-boxed reads as the canonical NaN (F extension, "NaN boxing"). */
  f32Operand(r: number): number {
    return this.fWords[2 * r + 1] === 0xffffffff ? this.f32Bits(this.fWords[2 * r]!) : NaN
  }

  f32OperandBits(r: number): number {
    return this.fWords[2 * r + 1] === 0xffffffff ? this.fWords[2 * r]! : CANONICAL_NAN32
  }

  private readonly word = new Float32Array(1)
  private readonly wordBits = new Uint32Array(this.word.buffer)
  private f32Bits(bits: number): number {
    this.wordBits[0] = bits
    return this.word[0]!
  }

  setF32Bits(rd: number, bits: number): void {
    this.fWords[2 * rd] = bits
    this.fWords[2 * rd + 1] = 0xffffffff
  }

  // ---- memory ----------------------------------------------------------------

  /** Offset into the data memory of an access of `size` bytes, checked for bounds and alignment. */
  offset(address: number, size: number): number {
    const off = this.locate(address, size)
    if (off < 0) {
      const stack = this.stackTop > this.stackBase ? ` and the stack [0x${this.stackBase.toString(16)}, 0x${this.stackTop.toString(16)})` : ''
      throw new ExecFault(
        'memory-bounds',
        `access of ${size} byte${size > 1 ? 's' : ''} at 0x${address.toString(16)} is outside the data memory ` +
          `[0x${this.dataBase.toString(16)}, 0x${(this.dataBase + this.dataSize).toString(16)})${stack}`,
      )
    }
    if (address % size !== 0) {
      throw new ExecFault('misaligned', `misaligned access: ${size}-byte access at 0x${address.toString(16)} is not ${size}-byte aligned`)
    }
    return off
  }

  /** A 64-bit register value plus an offset, as a byte address (addresses above 2^53 lose precision but are out of bounds anyway). */
  static address(base: bigint, offset: number | bigint): number {
    return Number(BigInt.asUintN(64, base + BigInt(offset)))
  }

  // ---- vector state ------------------------------------------------------------

  get vlmax(): number {
    return vlmax(this.vlen, this.vtype.sew, this.vtype.lmul)
  }

  /** First element index of register `reg` in a view of `sew`-bit elements. */
  base(reg: number, sew: Sew): number {
    return reg * (this.vlenb / (sew >> 3))
  }

  ints(sew: Sew, signed: boolean): IntView {
    switch (sew) {
      case 8:
        return signed ? this.i8 : this.u8
      case 16:
        return signed ? this.i16 : this.u16
      default:
        return signed ? this.i32 : this.u32
    }
  }

  maskBit(reg: number, i: number): boolean {
    return ((this.u8[reg * this.vlenb + (i >> 3)]! >> (i & 7)) & 1) === 1
  }

  setMaskBit(reg: number, i: number, on: boolean): void {
    const at = reg * this.vlenb + (i >> 3)
    const bit = 1 << (i & 7)
    this.u8[at] = on ? this.u8[at]! | bit : this.u8[at]! & ~bit
  }

  /** Whether element i takes part: unmasked instructions (vm = 1) process every element. */
  active(vm: boolean | undefined, i: number): boolean {
    return vm !== false || this.maskBit(0, i)
  }

  /** Writes a binary64 result, replacing any NaN with the canonical NaN. */
  storeF64(index: number, value: number): void {
    if (value !== value) this.u64[index] = CANONICAL_NAN64
    else this.f64[index] = value
  }

  storeF32(index: number, value: number): void {
    if (value !== value) this.u32[index] = CANONICAL_NAN32
    else this.f32[index] = value
  }
}

/**
 * The stack's top address: 1 GiB, far above any text and data the assembler
 * lays out (data at most 16 MiB above 0x10000) and below 2^31, so that a
 * stack overflow or a run off the data faults instead of landing in the other.
 */
export const STACK_TOP = 0x4000_0000

/** Number of registers in a group of EMUL (fractional EMUL occupies one register). */
export function groupSize(emul: number): number {
  return emul < 1 ? 1 : emul
}

/** Checks that a register group starts at a multiple of its size (V 1.0 section 3.4.2). */
export function checkGroup(reg: number | undefined, emul: number, role: string, ins: Instruction): number {
  if (reg === undefined) throw new ExecFault('internal', `${ins.op}: missing operand ${role}`)
  const n = groupSize(emul)
  if (reg % n !== 0) {
    throw new ExecFault('register-group', `${role} v${reg} is not a multiple of ${n}: with ${emulName(emul)} a register group must start at a multiple of ${n}`)
  }
  if (reg + n > 32) throw new ExecFault('register-group', `${role} group v${reg}..v${reg + n - 1} runs past v31`)
  return reg
}

function emulName(emul: number): string {
  return emul < 1 ? `EMUL=1/${1 / emul}` : `EMUL=${emul}`
}

/** Register groups [reg, reg+n) shared by all stream records; never mutated. */
const GROUPS: readonly (readonly number[])[][] = [1, 2, 4, 8].map((n) =>
  Array.from({ length: 32 }, (_, reg) => Object.freeze(Array.from({ length: Math.min(n, 32 - reg) }, (_, k) => reg + k))),
)

export function regGroup(reg: number, emul: number): number[] {
  const n = groupSize(emul)
  return GROUPS[Math.log2(n)]![reg]! as number[]
}
