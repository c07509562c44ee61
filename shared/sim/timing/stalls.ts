/**
 * The stall classification of each lane-cycle (docs/model.md, "Stalls"): at
 * most one reason a lane-cycle, and per instruction every refusal counted.
 */
import { REASON } from '../trace/types'
import type { InstState } from './inst'
import { pendingStep as pendingStepOf } from './phases'
import { STALL_COUNT as STRIDE, type TimingState } from './state'

const NONE = 0x7fffffff
// Imported bindings copied once: under tsx's module transform (Node: the CLIs, the server, the bench) each use of an imported binding is a getter call.
const R_FRONTEND = REASON.frontend
const STALL_COUNT: number = STRIDE
const pendingStep = pendingStepOf

/**
 * The lane's instruction on the critical path this cycle: the oldest one in
 * its read phase or refused its start (every issue policy starts the next
 * instruction only after the lane finished reading this one, so each cycle it
 * loses delays all younger ones); with none, the oldest still in flight.
 */
function critical(s: TimingState, lane: number): InstState | null {
  const ctx = s.ctx
  const reader = ctx.reader[lane] ?? null
  const refused = ctx.refused[lane] ?? null
  if (reader && refused) return reader.seq < refused.seq ? reader : refused
  return reader ?? refused ?? s.oldest[lane] ?? null
}

/**
 * Whether lane l has no dispatched instruction left to start: all it can get
 * next must still come through the front end.
 */
function starved(s: TimingState, l: number, c: number): boolean {
  const next = s.arith.at(s.laneArithNext[l] ?? 0)
  if (next && next.dispatch < c) return false
  const mem = s.mem.at(s.memNext)
  return !mem || mem.st.dispatch >= c
}

/**
 * The front end's reason for a lane starved of work this cycle, or -1 when
 * the front end has nothing more to give (docs/model.md, "Stalls"): an
 * instruction dispatched this cycle reaches the lanes next cycle (`frontend`);
 * otherwise dispatch is blocked by a full queue, renaming, a scalar result or
 * scalar work (`queue`, `rename`, `frontend`).
 */
function frontEndReason(s: TimingState, feWaiting: boolean): number {
  if (s.feDispatched >= 0 && s.hold < 0) return R_FRONTEND
  return feWaiting ? s.feReason : -1
}

/**
 * Gives the lane-cycle at most one stall reason (docs/model.md, "Stalls") and
 * counts, per instruction, every lane-cycle it was refused something.
 */
export function classify(s: TimingState, l: number, c: number, feWaiting: boolean, nextSeq: number): void {
  const ctx = s.ctx
  const denied = ctx.denied[l] as InstState[]
  const nd = ctx.deniedCount[l] ?? 0
  let reason = -1
  let seq = -1
  // Whether the lane's reason is one of the refusals counted below.
  let refusal = false
  if (ctx.progress[l] === 1) {
    s.laneBusy[l] = (s.laneBusy[l] ?? 0) + 1
    const crit = critical(s, l)
    if (crit && crit.noteCycle[l] === c) {
      reason = crit.noteReason[l] ?? 0
      seq = crit.seq
      refusal = true
    } else if (!ctx.reader[l] && !ctx.refused[l] && starved(s, l, c)) {
      // No instruction at the lane's read stage and none dispatched to start: the front end starves the lane.
      reason = frontEndReason(s, feWaiting)
      seq = s.feDispatched >= 0 && s.hold < 0 ? s.feDispatched : nextSeq
    }
  } else {
    let oldest: InstState | null = null
    for (let i = 0; i < nd; i++) {
      const inst = denied[i] as InstState
      if (!oldest || inst.seq < oldest.seq) oldest = inst
    }
    const waitSeq = ctx.waitSeq[l] ?? NONE
    if (waitSeq !== NONE && (!oldest || waitSeq < oldest.seq)) {
      reason = ctx.waitReason[l] ?? 0
      seq = waitSeq
    } else if (oldest) {
      reason = oldest.noteReason[l] ?? 0
      seq = oldest.seq
      refusal = true
    } else {
      const fl = s.inflight
      for (let i = 0; i < fl.length; i++) {
        const inst = fl[i] as InstState
        if (inst.dispatch < c && pendingStep(inst, l)) {
          reason = inst.waitReason
          seq = inst.seq
          break
        }
      }
      if (reason < 0) {
        reason = frontEndReason(s, feWaiting)
        seq = s.feDispatched >= 0 && s.hold < 0 ? s.feDispatched : nextSeq
      }
    }
  }
  const st = s.opStalls
  // A timed lane may stand for several alike lanes (symmetry.ts): each of them lost the cycle.
  const w = ctx.laneWeight[l] ?? 1
  for (let i = 0; i < nd; i++) {
    const inst = denied[i] as InstState
    const k = inst.seq * STALL_COUNT + (inst.noteReason[l] ?? 0)
    st[k] = (st[k] ?? 0) + w
  }
  if (reason < 0 || seq < 0) return
  ctx.rec.stallAt(l, c, reason, seq)
  if (!refusal) st[seq * STALL_COUNT + reason] = (st[seq * STALL_COUNT + reason] ?? 0) + w
}
