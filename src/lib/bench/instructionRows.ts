/**
 * Rows of the Bench's instruction table: one per traced instruction, with its
 * first read and last write over all lanes and its stall cycles by reason,
 * and beside the measured latency the ideal one: the closed form b + D + 2 of
 * an elementwise arithmetic instruction alone on a machine with ports to spare
 * (b beats on its busiest lane, D the unit's pipeline latency; docs/model.md
 * "The cycle"), with where the difference went: the stall cycles of its last
 * lane to finish, by reason.
 *
 * @example
 *   instructionRows(trace)[0] // { index: 0, text: 'vsetvli ...', vl: 19, shape: 'e32/m1', firstRead: null, ... }
 */
import { LANE_FIELD_COUNT, NO_CYCLE, STALL_REASONS, type StallCounts, type StallReason, type TimingTrace } from '@shared/sim/trace/types'

export interface InstructionRow {
  index: number
  text: string
  vl: number
  /** 'e32/m1', 'e64/mf2' */
  vtype: string
  firstRead: number | null
  lastWrite: number | null
  latency: number | null
  stalls: StallCounts
  stallTotal: number
  /** The closed-form latency, or null where the model has no single closed form (memory, reductions, permutations, vset). */
  ideal: number | null
  /** The lane that finished last, and its stall cycles on this instruction by reason (non-zero ones, most first). */
  lostTo: { lane: number; reasons: { reason: StallReason; cycles: number }[] } | null
}

// The divider is iterative (cycles per beat, no pipeline latency): no closed form here.
const ARITHMETIC_UNITS = new Set(['alu', 'mul', 'fpu'])

/** The closed form b + D + 2 of one elementwise arithmetic instruction, from its beats in the trace and its unit's latency. */
export function idealLatency(trace: TimingTrace, pos: number): number | null {
  const ins = trace.instructions[pos]
  if (!ins || ins.isConfig || ins.shape !== 'elementwise' || !ARITHMETIC_UNITS.has(ins.unit)) return null
  let b = 0
  for (let lane = 0; lane < trace.laneCount; lane++) b = Math.max(b, trace.laneTimes[(pos * trace.laneCount + lane) * LANE_FIELD_COUNT + 1] ?? 0)
  if (b === 0) return null
  const D = trace.machine.units[ins.unit as 'alu' | 'mul' | 'fpu'].latency
  return b + D + 2
}

/** LMUL as RISC-V V assembly writes it: m1, m2, ..., mf2, mf4, mf8. */
export function lmulText(lmul: number): string {
  return lmul >= 1 ? `m${lmul}` : `mf${Math.round(1 / lmul)}`
}

export function instructionRows(trace: TimingTrace): InstructionRow[] {
  const L = trace.laneCount
  const byInstruction = stallsByInstruction(trace)
  return trace.instructions.map((ins, pos) => {
    let firstRead: number | null = null
    let lastWrite: number | null = null
    for (let lane = 0; lane < L; lane++) {
      const base = (pos * L + lane) * LANE_FIELD_COUNT
      const rs = trace.laneTimes[base + 2] ?? NO_CYCLE
      const we = trace.laneTimes[base + 7] ?? NO_CYCLE
      if (rs !== NO_CYCLE && (firstRead === null || rs < firstRead)) firstRead = rs
      if (we !== NO_CYCLE && (lastWrite === null || we > lastWrite)) lastWrite = we
    }
    const stallTotal = STALL_REASONS.reduce((a, r) => a + ins.stalls[r], 0)
    return {
      index: ins.index, text: ins.text, vl: ins.vl, vtype: `e${ins.sew}/${lmulText(ins.lmul)}`, firstRead, lastWrite, latency: ins.latency, stalls: ins.stalls, stallTotal,
      ideal: idealLatency(trace, pos), lostTo: lastLaneStalls(trace, pos, byInstruction.get(ins.index) ?? []),
    }
  })
}

/** The stall spans of each instruction (by InstructionTrace.index). */
function stallsByInstruction(trace: TimingTrace): Map<number, number[]> {
  const out = new Map<number, number[]>()
  for (let s = 0; s < trace.stalls.count; s++) {
    const i = trace.stalls.instruction[s]!
    const list = out.get(i)
    if (list) list.push(s)
    else out.set(i, [s])
  }
  return out
}

function lastLaneStalls(trace: TimingTrace, pos: number, spans: number[]): InstructionRow['lostTo'] {
  const L = trace.laneCount
  let lane = -1
  let end = -1
  for (let l = 0; l < L; l++) {
    const base = (pos * L + l) * LANE_FIELD_COUNT
    const last = Math.max(trace.laneTimes[base + 7] ?? NO_CYCLE, trace.laneTimes[base + 5] ?? NO_CYCLE)
    if (last !== NO_CYCLE && last > end) {
      end = last
      lane = l
    }
  }
  if (lane < 0) return null
  // Only waits after the dispatch cycle count: a wait before dispatch is not in the latency, and the
  // dispatch cycle itself (a `frontend` stall of the lanes waiting for it) is part of the ideal b + D + 2.
  const from = (trace.instructions[pos]?.dispatch ?? -1) + 1
  const cycles = new Map<StallReason, number>()
  for (const s of spans) {
    const start = Math.max(trace.stalls.start[s]!, from)
    const length = trace.stalls.start[s]! + trace.stalls.length[s]! - start
    if (trace.stalls.lane[s] !== lane || length <= 0) continue
    const reason = STALL_REASONS[trace.stalls.reason[s]!]!
    cycles.set(reason, (cycles.get(reason) ?? 0) + length)
  }
  return { lane, reasons: [...cycles].map(([reason, c]) => ({ reason, cycles: c })).sort((a, b) => b.cycles - a.cycles) }
}

/** Reasons that occur anywhere in the run: the table shows a column for each, not for all nine. */
export function reasonsPresent(trace: TimingTrace): StallReason[] {
  return STALL_REASONS.filter((r) => trace.metrics.stallCycles[r] > 0)
}
