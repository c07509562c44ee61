/**
 * Rows of the Bench's instruction table: one per traced instruction, with its
 * first read and last write over all lanes and its stall cycles by reason.
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
}

/** LMUL as RISC-V V assembly writes it: m1, m2, ..., mf2, mf4, mf8. */
export function lmulText(lmul: number): string {
  return lmul >= 1 ? `m${lmul}` : `mf${Math.round(1 / lmul)}`
}

export function instructionRows(trace: TimingTrace): InstructionRow[] {
  const L = trace.laneCount
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
    return { index: ins.index, text: ins.text, vl: ins.vl, vtype: `e${ins.sew}/${lmulText(ins.lmul)}`, firstRead, lastWrite, latency: ins.latency, stalls: ins.stalls, stallTotal }
  })
}

/** Reasons that occur anywhere in the run: the table shows a column for each, not for all nine. */
export function reasonsPresent(trace: TimingTrace): StallReason[] {
  return STALL_REASONS.filter((r) => trace.metrics.stallCycles[r] > 0)
}
