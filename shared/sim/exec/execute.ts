/**
 * Functional execution of an assembled Program: runs it instruction by
 * instruction on an ArchState (the hart's architectural state) and returns the final architectural state, what it
 * printed and the dynamic instruction stream for the timing model. It never
 * throws: problems come back as a diagnostic at the instruction's line and
 * column.
 *
 * @example
 *   const asm = assemble(text)
 *   if (asm.ok) {
 *     const run = execute(asm.program, { vlen: 512 })
 *     if (run.ok) console.log(run.vlHistory, run.exitCode)
 *   }
 */
import { opInfo, type OpInfo } from '../isa/table'
import { instructionSize, type Instruction, type Program, type SimDiagnostic, type SourceLoc } from '../isa/types'
import type { Handler, StreamSink, VectorEvent } from './handler'
import { handlerTable } from './handlers'
import { OUTSIDE_TEXT, RETURNED_TO_CALLER } from './scalar'
import { ExecFault, ArchState, type UnorderedSum } from './machine'
import type { DynamicStream, VectorOp } from './stream'
import type { Vtype } from './vtype'
import { isValidVlen } from './vtype'

export interface ExecuteOptions {
  /** VLEN in bits: a power of two from 64 to 65536. */
  vlen: number
  /** Most dynamic instructions before the run is stopped (default 10,000,000). */
  stepLimit?: number
  /**
   * Most bytes the run may hold (default 128 MiB): the data memory, what the
   * program prints and the recorded dynamic stream together.
   */
  memoryLimit?: number
  /** Record the dynamic stream for the timing model (default true). */
  recordStream?: boolean
  /** Summation order of vfredusum; default: element order, as QEMU sums. */
  fpReductionOrder?: UnorderedSum
  /** Bytes of stack, below STACK_TOP (machine.ts); sp starts at its top (default 256 KiB). */
  stackBytes?: number
}

export const EXECUTE_DEFAULTS = {
  stepLimit: 10_000_000,
  memoryLimit: 128 * 1024 * 1024,
  stackBytes: 256 * 1024,
} as const

export interface ExecuteSuccess {
  ok: true
  /** x0..x31 as signed 64-bit values. */
  x: bigint[]
  /** f0..f31 as raw 64-bit patterns (binary32 values are NaN-boxed). */
  f: bigint[]
  /** v0..v31, VLEN / 8 bytes each, element 0 first (little-endian). */
  v: Uint8Array[]
  vl: number
  vtype: Vtype
  /** vl after each executed vset* instruction, in order. */
  vlHistory: number[]
  /** vtype after each executed vset* instruction, in order. */
  vtypeHistory: Vtype[]
  /** The data segment after the run, starting at dataBase (the stack is not included). */
  memory: Uint8Array
  dataBase: number
  /** Bytes written to standard output (write, fd 1). */
  output: Uint8Array
  /** The exit system call's status (low 8 bits), or 0 when the program ran off its last instruction. */
  exitCode: number
  /** How the run ended. */
  ended: 'exit' | 'end-of-text' | 'return'
  /** Dynamic instructions executed. */
  steps: number
  stream: DynamicStream
}

export interface ExecError extends SimDiagnostic {
  /** Index of the static instruction that failed, when there is one. */
  instruction?: number
}

export type ExecuteResult = ExecuteSuccess | { ok: false; error: ExecError }

const NO_LOC: SourceLoc = { line: 0, column: 0 }
/** Rough heap cost of one stream record beyond its typed arrays (object, small arrays). */
const RECORD_BYTES = 200

function failure(code: string, message: string, loc: SourceLoc = NO_LOC, instruction?: number): ExecuteResult {
  return { ok: false, error: { line: loc.line, column: loc.column, code, message, ...(instruction === undefined ? {} : { instruction }) } }
}

/** Runs `program` and returns its final state, or the first error with the line and column of the instruction. */
export function execute(program: Program, options: ExecuteOptions): ExecuteResult {
  const stepLimit = options.stepLimit ?? EXECUTE_DEFAULTS.stepLimit
  const memoryLimit = options.memoryLimit ?? EXECUTE_DEFAULTS.memoryLimit
  if (!isValidVlen(options.vlen)) return failure('bad-option', `vlen must be a power of two from 64 to 65536 bits, got ${options.vlen}`)
  if (!(Number.isInteger(stepLimit) && stepLimit > 0)) return failure('bad-option', `stepLimit must be a positive integer, got ${stepLimit}`)
  if (!(Number.isInteger(memoryLimit) && memoryLimit > 0)) return failure('bad-option', `memoryLimit must be a positive integer, got ${memoryLimit}`)
  if (program.data.length > memoryLimit) {
    const label = program.dataLabels.find((d) => d.address + d.size - program.dataBase > memoryLimit)
    return failure('memory-limit', `memory limit exceeded: the data segment needs ${program.data.length} bytes, the limit is ${memoryLimit}`, label?.loc)
  }

  const stackBytes = options.stackBytes ?? EXECUTE_DEFAULTS.stackBytes
  if (!(Number.isInteger(stackBytes) && stackBytes >= 0 && stackBytes % 16 === 0)) return failure('bad-option', `stackBytes must be a non-negative multiple of 16, got ${stackBytes}`)
  if (program.data.length + stackBytes > memoryLimit) {
    return failure('memory-limit', `memory limit exceeded: the data segment (${program.data.length} bytes) and the stack (${stackBytes} bytes) need more than the limit of ${memoryLimit}`)
  }
  const m = new ArchState(options.vlen, program.data, program.dataBase, stackBytes)
  m.unorderedSum = options.fpReductionOrder
  m.readsFpFlags = program.instructions.some((ins) => ins.op.startsWith('csrr') && (ins.operands.csr === 1 || ins.operands.csr === 3))
  const metas: OpInfo[] = []
  const handlers: Handler[] = []
  const vlHistory: number[] = []
  const vtypeHistory: Vtype[] = []
  const outputChunks: Uint8Array[] = []
  let used = program.data.length + stackBytes

  const charge = (bytes: number, what: string): void => {
    used += bytes
    if (used > memoryLimit) throw new ExecFault('memory-limit', `memory limit exceeded (${memoryLimit} bytes) by ${what}`)
  }
  const code = program.instructions
  // Instructions are 4 or 2 (compressed) bytes: an address's index comes from a table, not a division.
  const textEnd = code.length ? code[code.length - 1]!.address + instructionSize(code[code.length - 1]!) : program.textBase
  const indexAt = new Map<number, number>(code.map((ins, i) => [ins.address, i]))
  indexAt.set(textEnd, code.length)
  const indexOf = (address: number): number => indexAt.get(address) ?? (address >= program.textBase && address < textEnd ? -1 : OUTSIDE_TEXT)
  const table = handlerTable(indexOf, {
    write: (bytes) => {
      charge(bytes.length, 'the program output')
      outputChunks.push(bytes.slice())
    },
  }, (mm) => {
    vlHistory.push(mm.vl)
    vtypeHistory.push(mm.vtype)
  })

  for (let i = 0; i < code.length; i++) {
    const ins = code[i]!
    const info = opInfo(ins.op)
    const handler = table.get(ins.op)
    if (!info || !handler) return failure('not-executable', `cannot execute ${ins.op}: no semantics for it`, ins.loc, i)
    metas.push(info)
    handlers.push(handler)
  }

  const ops: VectorOp[] = []
  let scalarSince = 0
  let index = 0
  const sink: StreamSink = {
    on: options.recordStream !== false,
    vector(ins: Instruction, ev: VectorEvent) {
      const info = metas[index]!
      const vl = ev.vl ?? m.vl
      const masked = ins.operands.vm === false
      let active: Uint8Array | undefined
      if (masked && !ev.v0IsSelector) {
        active = new Uint8Array(vl)
        for (let i = 0; i < vl; i++) active[i] = m.maskBit(0, i) ? 1 : 0
      }
      charge(RECORD_BYTES + (active?.byteLength ?? 0) + (ev.memory?.addresses.byteLength ?? 0) + (ev.sourceIndex?.byteLength ?? 0), 'the dynamic instruction stream')
      const op: VectorOp = {
        seq: ops.length,
        staticIndex: index,
        op: ins.op,
        text: ins.text,
        scalarBefore: scalarSince,
        isConfig: info.config,
        vl,
        sew: m.vtype.sew,
        lmul: m.vtype.lmul,
        eew: ev.eew ?? m.vtype.sew,
        masked,
        unit: info.unit,
        shape: info.shape,
        flopsPerElement: info.flopsPerElement,
        dstRegs: ev.dstRegs,
        srcRegs: ev.srcRegs,
        scalarResult: info.shape === 'scalar-result',
      }
      if (ev.memory) op.memory = ev.memory
      if (active) op.active = active
      if (ev.sourceIndex) op.sourceIndex = ev.sourceIndex
      if (ev.widths) op.widths = ev.widths
      if (ev.nf) op.nf = ev.nf
      if (ev.wholeRegisters) op.wholeRegisters = ev.wholeRegisters
      ops.push(op)
      scalarSince = 0
    },
  }

  let steps = 0
  let ended: ExecuteSuccess['ended'] = 'end-of-text'
  // _start when the program defines it, else its first instruction.
  index = program.entry === undefined ? 0 : indexOf(program.entry)
  if (index < 0) return failure('jump-range', `the entry point 0x${(program.entry ?? 0).toString(16)} is not an instruction of the program`)
  try {
    while (index < code.length) {
      if (steps === stepLimit) {
        const ins = code[index]!
        return failure('step-limit', `step limit exceeded: ${stepLimit} dynamic instructions executed without reaching exit; a loop may not terminate`, ins.loc, index)
      }
      const ins = code[index]!
      steps++
      m.retired = steps - 1
      m.next = index + 1
      handlers[index]!(m, ins, sink)
      if (!metas[index]!.vector) scalarSince++
      if (m.exitCode !== null) {
        ended = 'exit'
        break
      }
      if (m.next === RETURNED_TO_CALLER) {
        ended = 'return'
        break
      }
      if (m.next === OUTSIDE_TEXT) {
        return failure('jump-range', `${ins.op} jumps outside the program, to address 0x${m.jumpTarget.toString(16)} (the text is 0x${program.textBase.toString(16)}..0x${(textEnd - 1).toString(16)})`, ins.loc, index)
      }
      index = m.next
    }
  } catch (e) {
    const ins = code[index]
    const where = ins ? `${ins.text}: ` : ''
    if (e instanceof ExecFault) return failure(e.code, `${where}${e.message}`, ins?.loc, index)
    return failure('internal', `${where}internal error in Chimeline's executor (${e instanceof Error ? e.message : String(e)})`, ins?.loc, index)
  }

  const output = new Uint8Array(outputChunks.reduce((n, c) => n + c.length, 0))
  let at = 0
  for (const c of outputChunks) {
    output.set(c, at)
    at += c.length
  }
  const vrf = m.u8.slice()
  return {
    ok: true,
    x: Array.from(m.x),
    f: Array.from(m.fBits),
    v: Array.from({ length: 32 }, (_, r) => vrf.subarray(r * m.vlenb, (r + 1) * m.vlenb)),
    vl: m.vl,
    vtype: m.vtype,
    vlHistory,
    vtypeHistory,
    memory: m.memory.subarray(0, m.dataSize),
    dataBase: program.dataBase,
    output,
    exitCode: m.exitCode ?? 0,
    ended,
    steps,
    stream: { ops, scalarAfter: scalarSince, dynamicCount: steps },
  }
}
