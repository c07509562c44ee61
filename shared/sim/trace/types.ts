/**
 * The trace a timing run returns. It is compact by construction: per-lane
 * phase times and all spans live in typed arrays (transferable to and from a
 * Worker as they are), per-instruction metadata in plain objects. Nothing is
 * stored per cycle and lane; any cycle's state is derived from the phase times,
 * the stall spans and the resource-use spans (see `laneTiming`, `laneStallAt`).
 */
import type { Machine } from '../../schemas/machine'
import type { Lmul, Sew, UnitClass, VectorShape } from '../isa/types'

export const STALL_REASONS = ['raw', 'bank', 'queue', 'slot', 'barrier', 'rename', 'memory', 'ring', 'frontend'] as const
export type StallReason = (typeof STALL_REASONS)[number]
/** A stall reason's index in STALL_REASONS (the engine keeps reasons as these small integers). */
export const REASON: Record<StallReason, number> = Object.fromEntries(STALL_REASONS.map((r, i) => [r, i])) as Record<StallReason, number>

/**
 * Which reason an instruction refused several things in one lane-cycle is
 * given, by reason index (lower wins): a denied port first (the cycle went to
 * another access), then a missing word, a busy link, the memory unit, the
 * lane's issue, and a full operand queue last (it only says the unit is
 * behind).
 */
export const STALL_RANK = new Int8Array(STALL_REASONS.length)
;(['bank', 'raw', 'ring', 'memory', 'slot', 'barrier', 'queue', 'rename', 'frontend'] as const).forEach((r, k) => (STALL_RANK[REASON[r]] = k))
/** Stall cycles by reason. */
export type StallCounts = Record<StallReason, number>

/** Fields of one (instruction, lane) record in `TimingTrace.laneTimes`, in this order. */
export const LANE_FIELDS = ['elements', 'beats', 'readStart', 'readEnd', 'execStart', 'execEnd', 'writeStart', 'writeEnd'] as const
export type LaneField = (typeof LANE_FIELDS)[number]
export const LANE_FIELD_COUNT = LANE_FIELDS.length
/** Stored in `laneTimes` where the JSON form has null (a lane with no active element). */
export const NO_CYCLE = -1

/** One instruction in one lane, as the JSON/summary forms show it. */
export interface LaneTiming {
  lane: number
  elements: number
  beats: number
  readStart: number | null
  readEnd: number | null
  execStart: number | null
  execEnd: number | null
  writeStart: number | null
  writeEnd: number | null
}

export interface InstructionTrace {
  /** Index in the dynamic stream of vector ops (VectorOp.seq). */
  index: number
  staticIndex: number
  op: string
  text: string
  vl: number
  sew: Sew
  lmul: Lmul
  unit: UnitClass
  shape: VectorShape
  masked: boolean
  isConfig: boolean
  /** Cycle the instruction was dispatched (for vset*: executed in the front end); null if never reached. */
  dispatch: number | null
  /** Last cycle of the instruction's activity in any lane (last write, last element sent); null if unfinished. */
  complete: number | null
  /** complete - dispatch + 1, or null if unfinished. */
  latency: number | null
  /** Flops of the active elements. */
  flops: number
  /** Lane-cycles this instruction was refused something (port, word, queue entry, start, link), plus the lane stalls given to it by a wait or the front end, summed over lanes (docs/model.md "Stalls"). */
  stalls: StallCounts
}

/** Run-length-encoded stall spans, one per (lane, consecutive cycles, one reason, one instruction); a lane-cycle is in at most one span, and a lane may be busy in it too. */
export interface StallSpans {
  count: number
  lane: Uint16Array
  start: Int32Array
  length: Int32Array
  /** Index into STALL_REASONS. */
  reason: Uint8Array
  /** The instruction the lane waits to advance (InstructionTrace.index). */
  instruction: Int32Array
}

export type ResourceKind = 'unit' | 'bank' | 'bus' | 'ring'

export interface ResourceInfo {
  id: number
  kind: ResourceKind
  /** e.g. 'lane 3 fpu', 'lane 3 bank 2', 'load bus 0', 'ring 3->4'. */
  name: string
  lane: number | null
  /** Uses per cycle the resource allows (ports of a bank, elements of a bus, words of a link, beats of a unit). */
  capacity: number
}

/**
 * Run-length-encoded resource use: over `length` cycles from `start`, the
 * instruction used `amount` of the resource each cycle. Several spans of
 * different instructions may overlap on one resource; their amounts add up.
 */
export interface UsageSpans {
  count: number
  resource: Uint32Array
  start: Int32Array
  length: Int32Array
  amount: Uint16Array
  instruction: Int32Array
  /**
   * Which uses were writes (bank ports: the rest read a word; 0 for units,
   * buses and links). Read it with `usageWritesAt`. Encoded per span: when
   * `amount` is 1, bit k (k < 32) is set when the use in cycle start + k was a
   * write (cycles past the 32nd are reads); when `amount` is more than 1, it is
   * the number of writes in every cycle of the span. Every trace the engine
   * produces has it; traces built elsewhere (older files, fixtures) may not.
   */
  writes?: Uint32Array
  /**
   * Spans a row stands for, when lanes that did the same work were timed once
   * (docs/model.md, "Speed"): row i is `copies[i]` spans alike in every column
   * but the resource, which is `resource[i] + k x copyStride` for k from 0 to
   * copies[i] - 1 (the same unit or bank in consecutive lanes). Absent: one
   * span a row. Most readers want `expandUsage`; those that go through every
   * row (a heat map, a lookup by cycle) can take a row's copies at once.
   */
  copies?: Uint16Array
  /** Resource ids between a row's copies (one lane's resources); set with `copies`. */
  copyStride?: number
}

/** FP element widths, as keys of per-width figures. */
export const FP_WIDTHS = ['16', '32', '64'] as const
export type FpWidth = (typeof FP_WIDTHS)[number]

export interface Metrics {
  cycles: number
  flops: number
  flopsPerCycle: number
  /**
   * The run's peak: the flops a cycle the machine could do on this run's mix of
   * element widths, flops / sum over widths of (flops at that width / that
   * width's peak), so that flopsPerCycle / peakFlopsPerCycle is the ideal cycles
   * over the real ones. FP64's peak when the run has no FP work.
   */
  peakFlopsPerCycle: number
  /** Flops at each FP element width (SEW of the instruction). Absent from traces of model version 1. */
  flopsBySew?: Record<FpWidth, number>
  /** Peak flops a cycle at each width: lanes x 2 (an FMA) x fpuElementsPerCycle[SEW]. Absent from traces of model version 1. */
  peakFlopsPerCycleBySew?: Record<FpWidth, number>
  /** Per lane: fraction of cycles in which the lane read, executed (a unit busy) or wrote. */
  laneBusy: number[]
  /** Per unit: beats issued / (cycles x lanes); the divider counts each cycle it is occupied. */
  unitUtilization: Record<'alu' | 'mul' | 'fpu' | 'div', number>
  /** Per bank index: port uses / (cycles x lanes x ports per bank). */
  bankUtilization: number[]
  /** Bits moved / (cycles x bus width): one load bus and one store bus for all memory ports. */
  busUtilization: { load: number; store: number }
  /** Words moved / (cycles x links x 2 directions). */
  ringUtilization: number
  stallCycles: StallCounts
}

export type TimingErrorCode = 'cycle-limit' | 'trace-limit' | 'cancelled' | 'invalid-stream'

export interface TimingError {
  code: TimingErrorCode
  message: string
}

export interface TimingTrace {
  formatVersion: 1
  machine: Machine
  laneCount: number
  /** Cycles counted from 0 to the last busy cycle, inclusive. */
  cycles: number
  instructions: InstructionTrace[]
  /** instructions.length x laneCount x LANE_FIELD_COUNT, NO_CYCLE for null. */
  laneTimes: Int32Array
  stalls: StallSpans
  resources: ResourceInfo[]
  usage: UsageSpans
  metrics: Metrics
}

/** A run always returns its trace; when it was cut short, `error` says why and the trace is partial. */
export interface TimingResult {
  trace: TimingTrace
  error?: TimingError
}

export interface SimulateOptions {
  /** Stop with a 'cycle-limit' error after this many cycles (default 5,000,000). */
  cycleLimit?: number
  /** Stop with a 'trace-limit' error once stall + usage spans exceed this (default 16,000,000). */
  traceLimit?: number
  /** Record resource-use spans (default true); totals in the metrics are kept either way. */
  recordUsage?: boolean
  /**
   * Time alike lanes once per class and replicate them (every lane alike, or
   * the classes of a ragged tail; default true; docs/model.md "Speed"). false
   * times every lane: the same trace, more slowly.
   */
  identicalLanes?: boolean
}

export const DEFAULT_CYCLE_LIMIT = 5_000_000
/**
 * 16 million spans, about 350 MB of typed arrays (22 bytes a usage span,
 * 15 a stall span). A 100,000-instruction strip-mined run on the default
 * machine needs 14.7 million (13.9 million uses, 0.9 million stalls), nearly
 * all of them bank-port uses: with single-port banks
 * consecutive words sit in consecutive banks, so each word read or written is
 * a span of its own.
 */
export const DEFAULT_TRACE_LIMIT = 16_000_000

/** The record of instruction `index` in `lane`, with nulls where the lane has no active element. */
export function laneTiming(trace: TimingTrace, index: number, lane: number): LaneTiming {
  const base = (index * trace.laneCount + lane) * LANE_FIELD_COUNT
  const t = trace.laneTimes
  const cyc = (k: number) => {
    const v = t[base + k] ?? NO_CYCLE
    return v === NO_CYCLE ? null : v
  }
  return {
    lane,
    // vset* and instructions a limit cut off never reach a lane: their counts stay at the fill value.
    elements: Math.max(0, t[base] ?? 0),
    beats: Math.max(0, t[base + 1] ?? 0),
    readStart: cyc(2),
    readEnd: cyc(3),
    execStart: cyc(4),
    execEnd: cyc(5),
    writeStart: cyc(6),
    writeEnd: cyc(7),
  }
}

/** The stall reason of `lane` in `cycle`, or null when the lane is not stalled. Binary search over the spans. */
export function laneStallAt(trace: TimingTrace, lane: number, cycle: number): { reason: StallReason; instruction: number } | null {
  const s = trace.stalls
  // Spans are stored in order of start cycle; find the last span starting at or before `cycle`.
  let lo = 0
  let hi = s.count - 1
  let last = -1
  while (lo <= hi) {
    const mid = (lo + hi) >> 1
    if ((s.start[mid] ?? 0) <= cycle) {
      last = mid
      lo = mid + 1
    } else hi = mid - 1
  }
  // Spans of different lanes interleave; walk back over the few that start near `cycle`.
  for (let i = last; i >= 0; i--) {
    const st = s.start[i] ?? 0
    if (s.lane[i] === lane && st + (s.length[i] ?? 0) > cycle) {
      return { reason: STALL_REASONS[s.reason[i] ?? 0] as StallReason, instruction: s.instruction[i] ?? 0 }
    }
    if (s.lane[i] === lane && st + (s.length[i] ?? 0) <= cycle) return null
  }
  return null
}

/** Of the `amount` uses of usage span i in `cycle` (inside the span), how many were writes; null when the trace does not say. */
export function usageWritesAt(usage: UsageSpans, i: number, cycle: number): number | null {
  const w = usage.writes
  if (!w) return null
  const v = w[i] ?? 0
  if ((usage.amount[i] ?? 0) !== 1) return v
  const k = cycle - (usage.start[i] ?? 0)
  return k < 32 ? (v >>> k) & 1 : 0
}

/** Spans row i stands for (UsageSpans.copies). */
export function usageCopies(usage: UsageSpans, i: number): number {
  return usage.copies ? (usage.copies[i] ?? 1) : 1
}

/**
 * The spans with one span a row: each row's copies in turn, so that rows stay
 * sorted by start cycle. The spans themselves when every row is one span.
 */
export function expandUsage(usage: UsageSpans): UsageSpans {
  const copies = usage.copies
  if (!copies) return usage
  const stride = usage.copyStride ?? 0
  let n = 0
  for (let i = 0; i < usage.count; i++) n += copies[i] ?? 1
  const out: UsageSpans = {
    count: n,
    resource: new Uint32Array(n),
    start: new Int32Array(n),
    length: new Int32Array(n),
    amount: new Uint16Array(n),
    instruction: new Int32Array(n),
    ...(usage.writes ? { writes: new Uint32Array(n) } : {}),
  }
  for (let i = 0, o = 0; i < usage.count; i++) {
    const r = usage.resource[i] ?? 0
    for (let k = 0; k < (copies[i] ?? 1); k++, o++) {
      out.resource[o] = r + k * stride
      out.start[o] = usage.start[i] ?? 0
      out.length[o] = usage.length[i] ?? 0
      out.amount[o] = usage.amount[i] ?? 0
      out.instruction[o] = usage.instruction[i] ?? 0
      if (out.writes) out.writes[o] = usage.writes?.[i] ?? 0
    }
  }
  return out
}

export function emptyStallCounts(): StallCounts {
  return { raw: 0, bank: 0, queue: 0, slot: 0, barrier: 0, rename: 0, memory: 0, ring: 0, frontend: 0 }
}

// Each reason's index, for stallCountsAt.
const { raw: I_RAW, bank: I_BANK, queue: I_QUEUE, slot: I_SLOT, barrier: I_BARRIER, rename: I_RENAME, memory: I_MEMORY, ring: I_RING, frontend: I_FRONTEND } = REASON

/**
 * The counts at `counts[at + REASON[r]]` for each reason r (the engine keeps
 * them by reason index). One literal, not a store per reason by name: a run
 * builds one per instruction, and stores by a computed name are slow.
 */
export function stallCountsAt(counts: ArrayLike<number>, at: number): StallCounts {
  return {
    raw: counts[at + I_RAW] ?? 0,
    bank: counts[at + I_BANK] ?? 0,
    queue: counts[at + I_QUEUE] ?? 0,
    slot: counts[at + I_SLOT] ?? 0,
    barrier: counts[at + I_BARRIER] ?? 0,
    rename: counts[at + I_RENAME] ?? 0,
    memory: counts[at + I_MEMORY] ?? 0,
    ring: counts[at + I_RING] ?? 0,
    frontend: counts[at + I_FRONTEND] ?? 0,
  }
}
