/**
 * The compact transferable form of a timing trace, for the Worker boundary.
 *
 * A TimingTrace already keeps its per-lane times and spans in typed arrays; what
 * remains costly to post between threads is the per-instruction metadata, one
 * object per dynamic instruction. Here those become columns (typed arrays), and
 * the strings (mnemonics, texts) a table of distinct values. Every typed array
 * is transferable, so `postMessage` moves the buffers instead of copying them.
 *
 * @example
 *   const c = encodeTrace(result.trace)
 *   postMessage(c, transferablesOf(c))
 *   // other side:
 *   const trace = decodeTrace(c)
 */
import type { Lmul, Sew, UnitClass, VectorShape } from '../isa/types'
import {
  STALL_REASONS,
  stallCountsAt,
  type InstructionTrace,
  type Metrics,
  type ResourceInfo,
  type StallSpans,
  type TimingTrace,
  type UsageSpans,
} from './types'
import type { Machine } from '../../schemas/machine'

/** Code tables: the column stores the position in the list. Appending keeps old codes valid. */
export const LMUL_CODES: readonly Lmul[] = [0.125, 0.25, 0.5, 1, 2, 4, 8]
export const UNIT_CODES: readonly UnitClass[] = ['none', 'alu', 'mul', 'fpu', 'div', 'load', 'store']
export const SHAPE_CODES: readonly VectorShape[] = [
  'elementwise', 'reduction', 'ordered-reduction', 'permutation', 'mask', 'scalar-result', 'scalar-insert', 'memory',
]
/** Stored in nullable integer columns for null. */
const NULL = -1
const FLAG_MASKED = 1
const FLAG_CONFIG = 2

export interface CompactInstructions {
  count: number
  index: Int32Array
  staticIndex: Int32Array
  /** Positions in `strings`. */
  op: Uint32Array
  text: Uint32Array
  vl: Int32Array
  sew: Uint8Array
  lmul: Uint8Array
  unit: Uint8Array
  shape: Uint8Array
  /** bit 0: masked, bit 1: isConfig. */
  flags: Uint8Array
  dispatch: Int32Array
  complete: Int32Array
  latency: Int32Array
  flops: Float64Array
  /** count x STALL_REASONS.length, in the order of STALL_REASONS. */
  stalls: Float64Array
}

export interface CompactTrace {
  compactVersion: 1
  formatVersion: TimingTrace['formatVersion']
  machine: Machine
  laneCount: number
  cycles: number
  resources: ResourceInfo[]
  metrics: Metrics
  strings: string[]
  instructions: CompactInstructions
  laneTimes: Int32Array
  stalls: StallSpans
  usage: UsageSpans
}

function codeOf<T>(table: readonly T[], value: T, what: string): number {
  const i = table.indexOf(value)
  if (i < 0) throw new Error(`compact trace: no code for ${what} ${String(value)}`)
  return i
}

function valueOf<T>(table: readonly T[], code: number, what: string): T {
  const v = table[code]
  if (v === undefined) throw new Error(`compact trace: unknown ${what} code ${code}`)
  return v
}

/** Trims a typed array to `count` entries (spans may be kept in grown buffers); returns it as is when it fits. */
function fit<A extends Int32Array | Uint32Array | Uint16Array | Uint8Array>(a: A, count: number): A {
  return (a.length === count ? a : a.slice(0, count)) as A
}

/** Encodes a trace into its compact form. The trace is not changed; its typed arrays may be shared. */
export function encodeTrace(trace: TimingTrace): CompactTrace {
  const n = trace.instructions.length
  const strings: string[] = []
  const stringIds = new Map<string, number>()
  const intern = (s: string) => {
    let id = stringIds.get(s)
    if (id === undefined) {
      id = strings.length
      strings.push(s)
      stringIds.set(s, id)
    }
    return id
  }
  const c: CompactInstructions = {
    count: n,
    index: new Int32Array(n),
    staticIndex: new Int32Array(n),
    op: new Uint32Array(n),
    text: new Uint32Array(n),
    vl: new Int32Array(n),
    sew: new Uint8Array(n),
    lmul: new Uint8Array(n),
    unit: new Uint8Array(n),
    shape: new Uint8Array(n),
    flags: new Uint8Array(n),
    dispatch: new Int32Array(n),
    complete: new Int32Array(n),
    latency: new Int32Array(n),
    flops: new Float64Array(n),
    stalls: new Float64Array(n * STALL_REASONS.length),
  }
  trace.instructions.forEach((ins, i) => {
    c.index[i] = ins.index
    c.staticIndex[i] = ins.staticIndex
    c.op[i] = intern(ins.op)
    c.text[i] = intern(ins.text)
    c.vl[i] = ins.vl
    c.sew[i] = ins.sew
    c.lmul[i] = codeOf(LMUL_CODES, ins.lmul, 'LMUL')
    c.unit[i] = codeOf(UNIT_CODES, ins.unit, 'unit')
    c.shape[i] = codeOf(SHAPE_CODES, ins.shape, 'shape')
    c.flags[i] = (ins.masked ? FLAG_MASKED : 0) | (ins.isConfig ? FLAG_CONFIG : 0)
    c.dispatch[i] = ins.dispatch ?? NULL
    c.complete[i] = ins.complete ?? NULL
    c.latency[i] = ins.latency ?? NULL
    c.flops[i] = ins.flops
    STALL_REASONS.forEach((r, k) => {
      c.stalls[i * STALL_REASONS.length + k] = ins.stalls[r]
    })
  })
  const s = trace.stalls
  const u = trace.usage
  return {
    compactVersion: 1,
    formatVersion: trace.formatVersion,
    machine: trace.machine,
    laneCount: trace.laneCount,
    cycles: trace.cycles,
    resources: trace.resources,
    metrics: trace.metrics,
    strings,
    instructions: c,
    laneTimes: trace.laneTimes,
    stalls: {
      count: s.count,
      lane: fit(s.lane, s.count),
      start: fit(s.start, s.count),
      length: fit(s.length, s.count),
      reason: fit(s.reason, s.count),
      instruction: fit(s.instruction, s.count),
    },
    usage: {
      count: u.count,
      resource: fit(u.resource, u.count),
      start: fit(u.start, u.count),
      length: fit(u.length, u.count),
      amount: fit(u.amount, u.count),
      instruction: fit(u.instruction, u.count),
      ...(u.writes ? { writes: fit(u.writes, u.count) } : {}),
      ...(u.copies ? { copies: fit(u.copies, u.count), copyStride: u.copyStride ?? 0 } : {}),
    },
  }
}

const nullable = (v: number | undefined) => (v === undefined || v === NULL ? null : v)

/** Rebuilds the trace from its compact form. The typed arrays of `c` are used, not copied. */
export function decodeTrace(c: CompactTrace): TimingTrace {
  if (c.compactVersion !== 1) throw new Error(`compact trace: unknown version ${String(c.compactVersion)}`)
  const k = c.instructions
  const str = (id: number | undefined) => {
    const s = c.strings[id ?? -1]
    if (s === undefined) throw new Error(`compact trace: no string ${String(id)}`)
    return s
  }
  const instructions: InstructionTrace[] = new Array(k.count)
  for (let i = 0; i < k.count; i++) {
    const stalls = stallCountsAt(k.stalls, i * STALL_REASONS.length)
    const flags = k.flags[i] ?? 0
    instructions[i] = {
      index: k.index[i] ?? i,
      staticIndex: k.staticIndex[i] ?? 0,
      op: str(k.op[i]),
      text: str(k.text[i]),
      vl: k.vl[i] ?? 0,
      sew: (k.sew[i] ?? 8) as Sew,
      lmul: valueOf(LMUL_CODES, k.lmul[i] ?? -1, 'LMUL'),
      unit: valueOf(UNIT_CODES, k.unit[i] ?? -1, 'unit'),
      shape: valueOf(SHAPE_CODES, k.shape[i] ?? -1, 'shape'),
      masked: (flags & FLAG_MASKED) !== 0,
      isConfig: (flags & FLAG_CONFIG) !== 0,
      dispatch: nullable(k.dispatch[i]),
      complete: nullable(k.complete[i]),
      latency: nullable(k.latency[i]),
      flops: k.flops[i] ?? 0,
      stalls,
    }
  }
  return {
    formatVersion: c.formatVersion,
    machine: c.machine,
    laneCount: c.laneCount,
    cycles: c.cycles,
    instructions,
    laneTimes: c.laneTimes,
    stalls: c.stalls,
    resources: c.resources,
    usage: c.usage,
    metrics: c.metrics,
  }
}

/** The distinct buffers of a compact trace, for postMessage's transfer list. */
export function transferablesOf(c: CompactTrace): ArrayBuffer[] {
  const k = c.instructions
  const arrays: ArrayBufferView[] = [
    k.index, k.staticIndex, k.op, k.text, k.vl, k.sew, k.lmul, k.unit, k.shape, k.flags,
    k.dispatch, k.complete, k.latency, k.flops, k.stalls, c.laneTimes,
    c.stalls.lane, c.stalls.start, c.stalls.length, c.stalls.reason, c.stalls.instruction,
    c.usage.resource, c.usage.start, c.usage.length, c.usage.amount, c.usage.instruction,
    ...(c.usage.writes ? [c.usage.writes] : []),
    ...(c.usage.copies ? [c.usage.copies] : []),
  ]
  const buffers = new Set<ArrayBuffer>()
  for (const a of arrays) if (a.buffer instanceof ArrayBuffer) buffers.add(a.buffer)
  return [...buffers]
}
