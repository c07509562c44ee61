/**
 * The tick-based engine: `step` advances the whole machine by one cycle.
 * Order inside a cycle: the memory unit starts instructions and moves bus
 * data, the ring moves words, then every lane grants writes, takes beats and
 * grants reads (oldest instruction first), then the front end dispatches
 * (what it dispatches in cycle c reads from c + 1), and finally each lane's
 * cycle is classified as busy, stalled (one reason) or idle. The parts live in
 * state.ts, dispatch.ts, issue.ts, memory-start.ts and stalls.ts.
 */
import { frontEnd as frontEndOf } from './dispatch'
import type { InstState } from './inst'
import { issueStaggered as issueStaggeredOf, issueTogether as issueTogetherOf } from './issue'
import { memoryStart as memoryStartOf } from './memory-start'
import { execStep as execStepOf, globalStep as globalStepOf, readStep as readStepOf, writeStep as writeStepOf } from './phases'
import type { TimingState } from './state'
import { classify as classifyOf } from './stalls'

export type { TimingState } from './state'
export { STALL_COUNT, createTimingState } from './state'

// Imported functions copied once: under tsx's module transform (Node: the CLIs, the server, the bench) each use of an imported binding is a getter call.
const frontEnd = frontEndOf
const issueStaggered = issueStaggeredOf
const issueTogether = issueTogetherOf
const memoryStart = memoryStartOf
const classify = classifyOf
const writeStep = writeStepOf
const execStep = execStepOf
const readStep = readStepOf
const globalStep = globalStepOf

/** Marks "no instruction waits" in Ctx.waitSeq. */
const NONE = 0x7fffffff

/** Advances the machine by one cycle. Returns false once the run is over (finished or stopped by a limit). */
export function step(s: TimingState): boolean {
  if (s.done) return false
  const c = s.cycle
  if (c >= s.options.cycleLimit) {
    s.done = true
    s.error = { code: 'cycle-limit', message: `the run exceeded the cycle limit of ${s.options.cycleLimit} cycles` }
    return false
  }
  const ctx = s.ctx
  const L = ctx.L
  ctx.cycle = c
  // A loop, not fill(): with few lanes the per-call cost of fill dominates.
  for (let l = 0; l < L; l++) {
    ctx.progress[l] = 0
    ctx.deniedCount[l] = 0
    ctx.waitSeq[l] = NONE
    ctx.reader[l] = null
    ctx.refused[l] = null
  }
  memoryStart(s, c)
  const fl = s.inflight
  // Only memory instructions, reductions and permutations have a phase outside the lanes.
  const gl = s.globalInsts
  for (let i = 0; i < gl.length; i++) globalStep(gl[i] as InstState, c)
  const together = s.together
  if (together) issueTogether(s, c)
  // Per lane, only instructions started and not finished there take part (most of the queue waits).
  const act = s.active
  for (let l = 0; l < L; l++) {
    // A snapshot: instructions that finish in this lane during the cycle still take their turns.
    const list = ctx.laneActive[l] as InstState[]
    let na = 0
    for (let i = 0; i < list.length; i++) act[na++] = list[i] as InstState
    s.oldest[l] = na > 0 ? (act[0] as InstState) : null
    for (let i = 0; i < na; i++) writeStep(act[i] as InstState, l, c)
    for (let i = 0; i < na; i++) execStep(act[i] as InstState, l, c)
    if (!together) {
      const before = s.laneArithNext[l] ?? 0
      issueStaggered(s, l, c)
      // Instructions that just started in this lane may read in this very cycle.
      for (let k = before; k < (s.laneArithNext[l] ?? 0); k++) {
        const inst = s.arith.at(k) as InstState
        if (inst.laneDone[l] !== 1) act[na++] = inst
      }
    }
    for (let i = 0; i < na; i++) readStep(act[i] as InstState, l, c)
  }
  // Instructions dispatched by a lane's issue above were not yet in `fl` for earlier lanes: nothing to do for them now.
  const feActive = frontEnd(s, c)
  let busy = feActive
  const ops = s.ops
  const feWaiting = s.opIdx < ops.length || s.hold >= 0
  // An op's seq is its index in the stream (createTimingState checks).
  const nextSeq = s.hold >= 0 ? s.hold : s.opIdx < ops.length ? s.opIdx : -1
  for (let l = 0; l < L; l++) {
    if (ctx.progress[l] === 1) busy = true
    classify(s, l, c, feWaiting, nextSeq)
    s.slotsUsed[l] = (s.slotsUsed[l] ?? 0) - (s.slotRelease[l] ?? 0)
    s.slotRelease[l] = 0
  }
  if (busy) s.lastBusy = c
  if (s.finished) {
    s.finished = false
    s.inflight = fl.filter((i) => i.complete < 0)
    s.globalInsts = s.globalInsts.filter((i) => i.complete < 0)
    // Forget finished instructions no lane's issue looks back at any more (it reads the previous one).
    let oldest = s.laneArithNext[0] ?? 0
    for (let l = 1; l < L; l++) oldest = Math.min(oldest, s.laneArithNext[l] ?? 0)
    s.arith.dropBefore(oldest - 1)
  }
  s.cycle = c + 1
  if (s.opIdx >= ops.length && s.scalarAfterLeft === 0 && s.hold < 0 && s.inflight.length === 0) {
    s.done = true
    return false
  }
  if (ctx.rec.spanCount > s.options.traceLimit) {
    s.done = true
    s.error = { code: 'trace-limit', message: `the trace exceeded its limit of ${s.options.traceLimit} spans at cycle ${c}` }
    return false
  }
  return true
}
