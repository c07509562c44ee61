/**
 * When an arithmetic instruction may start in a lane (timing model section 4):
 * the `staggered`, `lockstep` and `serial` issue policies and the lane slots.
 */
import { LANE_FIELD_COUNT, NO_CYCLE, REASON } from '../trace/types'
import type { Ctx } from './context'
import type { Inst } from './inst'
import { F_READ_END } from './inst'
import type { TimingState } from './state'

// Imported bindings copied once: a module binding may cost a getter call per use in the per-cycle paths.
const FIELDS: number = LANE_FIELD_COUNT
const READ_END: number = F_READ_END
const NULL_CYCLE: number = NO_CYCLE
const R_SLOT = REASON.slot
const R_BARRIER = REASON.barrier

function readEnd(inst: Inst, lane: number, ctx: Ctx): number {
  return ctx.laneTimes[(inst.st.seq * ctx.L + lane) * FIELDS + READ_END] ?? NULL_CYCLE
}

function noteStarted(s: TimingState, inst: Inst): void {
  if (inst.st.startedCount === s.ctx.L) s.arithQueued--
}

function startInLane(s: TimingState, inst: Inst, lane: number, c: number): void {
  const work = inst.hasWork(lane)
  inst.st.tookSlot[lane] = work ? 1 : 0
  if (work) s.slotsUsed[lane] = (s.slotsUsed[lane] ?? 0) + 1
  s.laneArithNext[lane] = (s.laneArithNext[lane] ?? 0) + 1
  inst.startLane(lane, c)
  noteStarted(s, inst)
}

/** Issue policy `staggered`: each lane starts its next instruction the cycle after it finished reading the previous one. */
export function issueStaggered(s: TimingState, lane: number, c: number): void {
  const ctx = s.ctx
  for (;;) {
    const k = s.laneArithNext[lane] ?? 0
    const inst = s.arith.at(k)
    if (!inst || inst.st.dispatch >= c) return
    const prev = k > 0 ? s.arith.at(k - 1) : undefined
    if (prev && (prev.st.readDone[lane] !== 1 || readEnd(prev, lane, ctx) >= c)) return
    if (inst.hasWork(lane) && (s.slotsUsed[lane] ?? 0) >= s.machine.laneSlots) {
      ctx.deny(lane, inst.st, R_SLOT)
      ctx.refused[lane] = inst.st
      return
    }
    startInLane(s, inst, lane, c)
    if (inst.hasWork(lane)) return
  }
}

/** The lane's next arithmetic instruction may not start this cycle. */
function refuse(ctx: Ctx, lane: number, inst: Inst, reason: number): void {
  ctx.deny(lane, inst.st, reason)
  ctx.refused[lane] = inst.st
}

/** Policies `lockstep` and `serial`: the next instruction starts in every lane at once. */
export function issueTogether(s: TimingState, c: number): void {
  const ctx = s.ctx
  const L = ctx.L
  for (;;) {
    const k = s.laneArithNext[0] ?? 0
    const inst = s.arith.at(k)
    if (!inst || inst.st.dispatch >= c) return
    const prev = k > 0 ? s.arith.at(k - 1) : undefined
    let ok = true
    if (prev) {
      if (s.machine.issue === 'serial') ok = prev.st.complete >= 0 && prev.st.complete < c
      else {
        ok = prev.st.readDoneCount === L
        for (let l = 0; l < L && ok; l++) if (readEnd(prev, l, ctx) >= c) ok = false
      }
    }
    if (!ok) {
      for (let l = 0; l < L; l++) refuse(ctx, l, inst, R_BARRIER)
      return
    }
    // A lane without a free slot waits for one (`slot`); the others wait for it (`barrier`).
    let full = false
    for (let l = 0; l < L && !full; l++) full = inst.hasWork(l) && (s.slotsUsed[l] ?? 0) >= s.machine.laneSlots
    if (full) {
      for (let q = 0; q < L; q++) refuse(ctx, q, inst, inst.hasWork(q) && (s.slotsUsed[q] ?? 0) >= s.machine.laneSlots ? R_SLOT : R_BARRIER)
      return
    }
    for (let l = 0; l < L; l++) startInLane(s, inst, l, c)
  }
}
