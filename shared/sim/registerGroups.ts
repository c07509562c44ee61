/**
 * Which architectural vector registers each dynamic vector instruction writes,
 * and which register groups it reads, straight from the dynamic stream
 * (VectorOp.dstRegs, srcRegs and masked), in a compact form: bit sets over
 * v0..v31 in typed arrays, so that the Worker can transfer them with the trace
 * and the Bench can link producers and consumers of the run exactly.
 * Position i is the stream's op i (VectorOp.seq = InstructionTrace.index).
 *
 * @example
 *   const g = registerGroupsOf(stream)
 *   registersIn(g.writes[3]!) // [8, 9]: op 3 writes the group v8..v9
 */
import type { DynamicStream } from './exec/stream'

export interface RegisterGroups {
  count: number
  /** Registers op i writes: bit r set for vr. */
  writes: Uint32Array
  /** Op i's source groups are sources[sourceStart[i] .. sourceStart[i + 1]); count + 1 entries. */
  sourceStart: Uint32Array
  /** One register bit set per source group; a mask (or merge selector) read is the group {v0}. */
  sources: Uint32Array
}

/** The bit set of a list of register numbers (0..31). */
export function bitsOf(regs: readonly number[]): number {
  let bits = 0
  for (const r of regs) bits |= 1 << r
  return bits >>> 0
}

/** The register numbers in a bit set, ascending. */
export function registersIn(bits: number): number[] {
  const out: number[] = []
  for (let r = 0; r < 32; r++) if ((bits >>> r) & 1) out.push(r)
  return out
}

export function registerGroupsOf(stream: DynamicStream): RegisterGroups {
  const { ops } = stream
  const count = ops.length
  const writes = new Uint32Array(count)
  const sourceStart = new Uint32Array(count + 1)
  let total = 0
  for (const op of ops) total += op.srcRegs.length + (op.masked ? 1 : 0)
  const sources = new Uint32Array(total)
  let at = 0
  ops.forEach((op, i) => {
    writes[i] = bitsOf(op.dstRegs)
    sourceStart[i] = at
    for (const group of op.srcRegs) sources[at++] = bitsOf(group)
    if (op.masked) sources[at++] = 1
  })
  sourceStart[count] = at
  return { count, writes, sourceStart, sources }
}

/** The buffers to transfer across a Worker boundary. */
export function registerGroupTransferables(g: RegisterGroups): ArrayBuffer[] {
  return [g.writes.buffer, g.sourceStart.buffer, g.sources.buffer].filter((b): b is ArrayBuffer => b instanceof ArrayBuffer)
}
