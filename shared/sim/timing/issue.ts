/**
 * When an arithmetic instruction may start in a lane (timing model section 4):
 * the `staggered`, `lockstep` and `serial` issue policies and the lane slots.
 */
import { LANE_FIELD_COUNT, NO_CYCLE, REASON } from '../trace/types'
import type { Ctx } from './context'
import type { InstState } from './inst'
import { F_READ_END } from './inst'
import { startLaneStep as startLaneStepOf } from './phases'
import type { TimingState } from './state'

// Imported bindings copied once: a module binding may cost a getter call per use in the per-cycle paths.
const FIELDS: number = LANE_FIELD_COUNT
const READ_END: number = F_READ_END
const NULL_CYCLE: number = NO_CYCLE
const R_SLOT = REASON.slot
const R_BARRIER = REASON.barrier
const startLaneStep = startLaneStepOf

function readEnd(inst: InstState, lane: number, ctx: Ctx): number {
  return ctx.laneTimes[(inst.seq * ctx.L + lane) * FIELDS + READ_END] ?? NULL_CYCLE
}

function noteStarted(s: TimingState, inst: InstState): void {
  if (inst.startedCount === s.ctx.L) s.arithQueued--
}

function startInLane(s: TimingState, inst: InstState, lane: number, c: number): void {
  const work = inst.work[lane] === 1
  inst.tookSlot[lane] = work ? 1 : 0
  if (work) s.slotsUsed[lane] = (s.slotsUsed[lane] ?? 0) + 1
  s.laneArithNext[lane] = (s.laneArithNext[lane] ?? 0) + 1
  startLaneStep(inst, lane, c)
  noteStarted(s, inst)
}

/** Issue policy `staggered`: each lane starts its next instruction the cycle after it finished reading the previous one. */
export function issueStaggered(s: TimingState, lane: number, c: number): void {
  const ctx = s.ctx
  for (;;) {
    const k = s.laneArithNext[lane] ?? 0
    const inst = s.arith.at(k)
    if (!inst || inst.dispatch >= c) return
    const prev = k > 0 ? s.arith.at(k - 1) : undefined
    if (prev && (prev.readDone[lane] !== 1 || readEnd(prev, lane, ctx) >= c)) return
    const work = inst.work[lane] === 1
    if (work && (s.slotsUsed[lane] ?? 0) >= s.laneSlots) {
      ctx.deny(lane, inst, R_SLOT)
      ctx.refused[lane] = inst
      return
    }
    startInLane(s, inst, lane, c)
    if (work) return
  }
}

/** The lane's next arithmetic instruction may not start this cycle. */
function refuse(ctx: Ctx, lane: number, inst: InstState, reason: number): void {
  ctx.deny(lane, inst, reason)
  ctx.refused[lane] = inst
}

/** Whether the instruction has work in the lane and the lane has no free slot. */
function slotFull(s: TimingState, inst: InstState, lane: number): boolean {
  return inst.work[lane] === 1 && (s.slotsUsed[lane] ?? 0) >= s.laneSlots
}

/** Policies `lockstep` and `serial`: the next instruction starts in every lane at once. */
export function issueTogether(s: TimingState, c: number): void {
  const ctx = s.ctx
  const L = ctx.L
  for (;;) {
    const k = s.laneArithNext[0] ?? 0
    const inst = s.arith.at(k)
    if (!inst || inst.dispatch >= c) return
    const prev = k > 0 ? s.arith.at(k - 1) : undefined
    let ok = true
    if (prev) {
      if (s.serial) ok = prev.complete >= 0 && prev.complete < c
      else {
        ok = prev.readDoneCount === L
        for (let l = 0; l < L && ok; l++) if (readEnd(prev, l, ctx) >= c) ok = false
      }
    }
    if (!ok) {
      for (let l = 0; l < L; l++) refuse(ctx, l, inst, R_BARRIER)
      return
    }
    // A lane without a free slot waits for one (`slot`); the others wait for it (`barrier`).
    let full = false
    for (let l = 0; l < L && !full; l++) full = slotFull(s, inst, l)
    if (full) {
      for (let q = 0; q < L; q++) refuse(ctx, q, inst, slotFull(s, inst, q) ? R_SLOT : R_BARRIER)
      return
    }
    for (let l = 0; l < L; l++) startInLane(s, inst, l, c)
  }
}
