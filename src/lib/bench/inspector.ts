/**
 * The Cycle inspector's derivations: what every lane is doing in one cycle,
 * computed from the trace alone (phase times, stall spans, resource-use spans).
 *
 * What the trace gives exactly and what is bounded:
 * - the instructions in each phase, the stall reason, and which resources are
 *   busy (and by whom) are exact;
 * - execute progress (beats issued so far) is exact when the run recorded
 *   resource use: the lane's unit spans count the beats per cycle (for a
 *   reduction they include the operations that combine the partials, so the
 *   total can exceed the element beats);
 * - read and write progress are bounded: the trace keeps a phase's first and
 *   last cycle, and a lane moves at most one word per operand a cycle, so by
 *   cycle c at least `b - (end - c)` and at most `c - start + 1` of `b` words
 *   are done; the bounds meet at the ends of the phase and whenever the phase
 *   ran without gaps;
 * - operand-queue fill is bounded the same way, narrowed by the execute beats:
 *   a beat in cycle e needs its words read by e - 1, and a queue never holds
 *   more than `operandQueueDepth` words.
 *
 * @example
 *   const idx = indexTrace(trace)
 *   inspectCycle(idx, 42).lanes[0].phases.exec // [{ index: 3, done: { lo: 5, hi: 5 }, total: 8, ... }]
 */
import { LANE_FIELD_COUNT, NO_CYCLE, STALL_REASONS, laneStallAt, usageCopies, type StallReason, type TimingTrace } from '@shared/sim/trace/types'
import { spanIndex, spansAt, type SpanIndex } from './spanIndex'

export const PHASE_NAMES = ['read', 'exec', 'write'] as const
export type PhaseName = (typeof PHASE_NAMES)[number]

/** A count known between two bounds (lo === hi when exact). */
export interface Bounded {
  lo: number
  hi: number
}

export interface PhaseEntry {
  /** InstructionTrace.index */
  index: number
  text: string
  /** Words (read, write) or beats (exec) done by the end of the cycle. */
  done: Bounded
  total: number
  /** The phase's first and last cycle in this lane. */
  start: number
  end: number
}

export interface OperandQueueFill {
  index: number
  /** Words waiting in each source operand queue after this cycle. */
  fill: Bounded
  depth: number
}

export interface LaneState {
  lane: number
  phases: Record<PhaseName, PhaseEntry[]>
  stall: { reason: StallReason; index: number; text: string } | null
  queues: OperandQueueFill[]
}

export interface ResourceUse {
  resource: number
  name: string
  kind: string
  lane: number | null
  capacity: number
  /** Sum of the amounts in this cycle. */
  used: number
  users: { index: number; text: string; amount: number }[]
}

export interface CycleState {
  cycle: number
  lanes: LaneState[]
  /** Resources in use in this cycle, by resource id. */
  busy: ResourceUse[]
}

/** Lookup structures built once per trace. */
export interface TraceIndex {
  trace: TimingTrace
  usage: SpanIndex
  /** key `index * laneCount + lane` -> positions of that instruction's spans on the lane's unit. */
  unitSpans: Map<number, number[]>
  /** Position in trace.instructions by InstructionTrace.index. */
  position: Map<number, number>
}

export function indexTrace(trace: TimingTrace): TraceIndex {
  const unitSpans = new Map<number, number[]>()
  const u = trace.usage
  for (let i = 0; i < u.count; i++) {
    const r = trace.resources[u.resource[i] ?? 0]
    if (!r || r.kind !== 'unit' || r.lane === null) continue
    // A row standing for alike lanes (UsageSpans.copies) is the same unit in consecutive lanes.
    for (let k = 0; k < usageCopies(u, i); k++) {
      const key = (u.instruction[i] ?? 0) * trace.laneCount + r.lane + k
      const list = unitSpans.get(key)
      if (list) list.push(i)
      else unitSpans.set(key, [i])
    }
  }
  const position = new Map<number, number>()
  trace.instructions.forEach((ins, p) => position.set(ins.index, p))
  return { trace, usage: spanIndex(u), unitSpans, position }
}

const field = (trace: TimingTrace, pos: number, lane: number, k: number): number =>
  trace.laneTimes[(pos * trace.laneCount + lane) * LANE_FIELD_COUNT + k] ?? NO_CYCLE

/**
 * Words or beats of a phase done by the end of `cycle`, from its first and
 * last cycle alone, when at most `perCycle` move a cycle.
 */
export function phaseBounds(total: number, start: number, end: number, cycle: number, perCycle = 1): Bounded {
  if (cycle < start) return { lo: 0, hi: 0 }
  if (cycle >= end) return { lo: total, hi: total }
  return { lo: Math.max(0, total - perCycle * (end - cycle)), hi: Math.min(total, perCycle * (cycle - start + 1)) }
}

/**
 * Words a lane can move a cycle for an instruction of this unit: one per
 * operand for the arithmetic units (a 64-bit datapath, timing model section 1),
 * a bus's share per lane for unit-stride memory (section 7).
 */
export function wordsPerCycle(trace: TimingTrace, unit: string): number {
  const m = trace.machine
  if (unit === 'load') return Math.max(1, Math.ceil(m.loadBusBits / (64 * trace.laneCount)))
  if (unit === 'store') return Math.max(1, Math.ceil(m.storeBusBits / (64 * trace.laneCount)))
  return 1
}

/** Beats the lane's unit took for `index` in cycles up to `cycle`, or null when no unit use was recorded. */
export function execBeats(idx: TraceIndex, index: number, lane: number, cycle: number): number | null {
  const list = idx.unitSpans.get(index * idx.trace.laneCount + lane)
  if (!list) return null
  const u = idx.trace.usage
  let n = 0
  for (const i of list) {
    const s = u.start[i] ?? 0
    if (s > cycle) continue
    n += (u.amount[i] ?? 0) * Math.min(u.length[i] ?? 0, cycle - s + 1)
  }
  return n
}

/** The whole state of the machine's lanes in `cycle`. */
export function inspectCycle(idx: TraceIndex, cycle: number): CycleState {
  const { trace } = idx
  const depth = trace.machine.operandQueueDepth
  const lanes: LaneState[] = []
  for (let lane = 0; lane < trace.laneCount; lane++) {
    const phases: Record<PhaseName, PhaseEntry[]> = { read: [], exec: [], write: [] }
    const queues: OperandQueueFill[] = []
    trace.instructions.forEach((ins, pos) => {
      const beats = field(trace, pos, lane, 1)
      const readStart = field(trace, pos, lane, 2)
      if (readStart === NO_CYCLE && field(trace, pos, lane, 4) === NO_CYCLE && field(trace, pos, lane, 6) === NO_CYCLE) return
      const rate = wordsPerCycle(trace, ins.unit)
      const exactExec = (c: number) => execBeats(idx, ins.index, lane, c)
      PHASE_NAMES.forEach((phase, p) => {
        const start = field(trace, pos, lane, 2 + 2 * p)
        const end = field(trace, pos, lane, 3 + 2 * p)
        if (start === NO_CYCLE || end === NO_CYCLE || cycle < start || cycle > end) return
        const exact = phase === 'exec' ? exactExec(cycle) : null
        const done = exact === null ? phaseBounds(beats, start, end, cycle, rate) : { lo: exact, hi: exact }
        // A reduction's unit also combines partials after its element beats: count those operations too.
        const total = exact === null ? beats : Math.max(beats, exactExec(Number.MAX_SAFE_INTEGER) ?? 0)
        phases[phase].push({ index: ins.index, text: ins.text, done, total, start, end })
      })
      // Operand queues exist from the first read until the last beat has taken its words.
      const readEnd = field(trace, pos, lane, 3)
      const execStart = field(trace, pos, lane, 4)
      if (readStart === NO_CYCLE || readEnd === NO_CYCLE || cycle < readStart) return
      const exact = exactExec(cycle)
      const issueEnd = field(trace, pos, lane, 5) - (latencyTail(trace, ins.unit) ?? 0)
      const consumed = exact === null ? phaseBounds(beats, execStart, issueEnd, cycle, rate) : { lo: Math.min(exact, beats), hi: Math.min(exact, beats) }
      if (consumed.lo >= beats) return
      const read = phaseBounds(beats, readStart, readEnd, cycle, rate)
      // A beat in cycle + 1 needs its words read by now; a queue never holds more than its depth.
      const readLo = Math.max(read.lo, exactExec(cycle + 1) ?? consumed.lo)
      const readHi = Math.min(read.hi, consumed.hi + depth)
      const lo = Math.max(0, readLo - consumed.hi)
      const hi = Math.max(lo, Math.min(depth, readHi - consumed.lo))
      queues.push({ index: ins.index, fill: { lo, hi }, depth })
    })
    const stall = laneStallAt(trace, lane, cycle)
    const stalled = stall ? trace.instructions[idx.position.get(stall.instruction) ?? -1] : undefined
    lanes.push({ lane, phases, queues, stall: stall ? { reason: stall.reason, index: stall.instruction, text: stalled?.text ?? `#${stall.instruction}` } : null })
  }
  return { cycle, lanes, busy: busyResources(idx, cycle) }
}

/** Latency minus one: execEnd is the last beat's cycle plus this (timing model section 5). */
function latencyTail(trace: TimingTrace, unit: string): number | null {
  const u = trace.machine.units
  if (unit === 'alu') return u.alu.latency - 1
  if (unit === 'mul') return u.mul.latency - 1
  if (unit === 'fpu') return u.fpu.latency - 1
  return null
}

export function busyResources(idx: TraceIndex, cycle: number): ResourceUse[] {
  const { trace } = idx
  const u = trace.usage
  const byResource = new Map<number, ResourceUse>()
  for (const i of spansAt(idx.usage, cycle)) {
    const index = u.instruction[i] ?? 0
    const amount = u.amount[i] ?? 0
    const ins = trace.instructions[idx.position.get(index) ?? -1]
    for (let k = 0; k < usageCopies(u, i); k++) {
      const id = (u.resource[i] ?? 0) + k * (u.copyStride ?? 0)
      const info = trace.resources[id]
      if (!info) continue
      let entry = byResource.get(id)
      if (!entry) {
        entry = { resource: id, name: info.name, kind: info.kind, lane: info.lane, capacity: info.capacity, used: 0, users: [] }
        byResource.set(id, entry)
      }
      entry.used += amount
      entry.users.push({ index, text: ins?.text ?? `#${index}`, amount })
    }
  }
  return [...byResource.values()].sort((a, b) => a.resource - b.resource)
}

export const STALL_LABELS: Record<StallReason, string> = {
  raw: 'waits for an operand still being produced (read after write)',
  bank: 'loses a register-file bank port to another access',
  queue: 'waits for room in a full queue',
  slot: 'waits for a free lane slot',
  barrier: 'waits for the other lanes (issue policy)',
  rename: 'waits for a free physical register',
  memory: 'waits for memory data or the memory unit',
  ring: 'waits for a ring link',
  frontend: 'waits for the front end to dispatch',
}

export { STALL_REASONS }
