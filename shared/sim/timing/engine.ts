/**
 * The tick-based engine: `step` advances the whole machine by one cycle.
 * Order inside a cycle: the memory unit starts instructions and moves bus
 * data, the ring moves words, then every lane grants writes, takes beats and
 * grants reads (oldest instruction first), then the front end dispatches
 * (what it dispatches in cycle c reads from c + 1), and finally each lane's
 * cycle is classified as busy, stalled (one reason) or idle.
 */
import type { Machine } from '../../schemas/machine'
import type { DynamicStream, VectorOp } from '../exec/stream'
import type { SimulateOptions, TimingError } from '../trace/types'
import { DEFAULT_CYCLE_LIMIT, DEFAULT_TRACE_LIMIT, LANE_FIELD_COUNT, NO_CYCLE, REASON, STALL_REASONS } from '../trace/types'
import { derive } from './config'
import { Ctx } from './context'
import type { Inst } from './inst'
import { F_READ_END } from './inst'
import { LoadInst, MemInst, StoreInst } from './memory'
import { PermutationInst } from './permutation'
import { Recorder } from './recorder'
import { OrderedReductionInst, ReductionInst } from './reduction'
import { RegFile } from './regfile'
import { Renamer } from './rename'
import { lanePlan } from './symmetry'
import { UnitInst } from './units'
import { Window } from './window'

const NONE = 0x7fffffff
/** Stall reasons: the stride of TimingState.opStalls. */
export const STALL_COUNT = STALL_REASONS.length
// Imported bindings copied once: a module binding may cost a getter call per use in the per-cycle paths.
const FIELDS: number = LANE_FIELD_COUNT
const READ_END: number = F_READ_END
const NULL_CYCLE: number = NO_CYCLE
const R_FRONTEND = REASON.frontend
const R_QUEUE = REASON.queue
const R_RENAME = REASON.rename
const R_SLOT = REASON.slot
const R_BARRIER = REASON.barrier
const R_MEMORY = REASON.memory

export interface TimingState {
  /** The stream and machine the engine runs: the caller's, or their one-lane plan (symmetry.ts). */
  readonly stream: DynamicStream
  readonly machine: Machine
  /** The caller's stream and machine, which the trace describes. */
  readonly source: DynamicStream
  readonly sourceMachine: Machine
  /** Lanes each timed lane stands for (1: every lane is timed). */
  readonly laneFactor: number
  readonly ctx: Ctx
  readonly options: Required<SimulateOptions>
  cycle: number
  lastBusy: number
  done: boolean
  error: TimingError | null
  /** Per op: dispatch and completion cycles (-1 when not reached). */
  readonly dispatchAt: Int32Array
  readonly completeAt: Int32Array
  /** [op][reason] stall cycles attributed to the op. */
  readonly opStalls: Int32Array
  readonly laneBusy: Float64Array
  // Front end
  opIdx: number
  scalarLeft: number
  scalarAfterLeft: number
  hold: number
  holdReleasedAt: number
  feReason: number
  /** The first op the front end dispatched (or executed, a vset) this cycle; -1: none. */
  feDispatched: number
  // Instructions in flight, in program order
  inflight: Inst[]
  /** Program-order lists of the arithmetic and memory instructions, by absolute position. */
  readonly arith: Window<Inst>
  readonly mem: Window<MemInst>
  /** No memory instruction before this position is still incomplete. */
  memLive: number
  readonly laneArithNext: Int32Array
  memNext: number
  arithQueued: number
  memQueued: number
  readonly slotsUsed: Int32Array
  readonly slotRelease: Int32Array
  readonly memPorts: (MemInst | null)[]
  /** Scratch list of the instructions active in one lane this cycle. */
  readonly active: Inst[]
  /** Whether an instruction in flight finished since the last sweep of `inflight`. */
  finished: boolean
  /** Per lane, this cycle: the oldest instruction started there before the cycle (null: none). */
  readonly oldest: (Inst | null)[]
}

export function createTimingState(source: DynamicStream, sourceMachine: Machine, options: SimulateOptions = {}): TimingState {
  const plan = options.identicalLanes === false ? null : lanePlan(source, sourceMachine)
  const stream = plan?.stream ?? source
  const machine = plan?.machine ?? sourceMachine
  const d = derive(machine)
  const L = d.lanes
  const ops = stream.ops
  const laneTimes = new Int32Array(ops.length * L * LANE_FIELD_COUNT).fill(NO_CYCLE)
  const rec = new Recorder(L, options.recordUsage ?? true)
  const ctx = new Ctx(d, new RegFile(d, machine.physRegs), new Renamer(machine.physRegs), rec, laneTimes)
  if (plan) rec.setLaneFactor(plan.factor)
  const s: TimingState = {
    stream,
    machine,
    source,
    sourceMachine,
    laneFactor: plan?.factor ?? 1,
    ctx,
    options: {
      cycleLimit: options.cycleLimit ?? DEFAULT_CYCLE_LIMIT,
      traceLimit: options.traceLimit ?? DEFAULT_TRACE_LIMIT,
      recordUsage: options.recordUsage ?? true,
      identicalLanes: plan !== null,
    },
    cycle: 0,
    lastBusy: -1,
    done: false,
    error: null,
    dispatchAt: new Int32Array(ops.length).fill(-1),
    completeAt: new Int32Array(ops.length).fill(-1),
    opStalls: new Int32Array(ops.length * STALL_COUNT),
    laneBusy: new Float64Array(L),
    opIdx: 0,
    scalarLeft: ops[0]?.scalarBefore ?? 0,
    scalarAfterLeft: stream.scalarAfter,
    hold: -1,
    holdReleasedAt: -1,
    feReason: REASON.frontend,
    feDispatched: -1,
    inflight: [],
    arith: new Window<Inst>(),
    mem: new Window<MemInst>(),
    memLive: 0,
    laneArithNext: new Int32Array(L),
    memNext: 0,
    arithQueued: 0,
    memQueued: 0,
    slotsUsed: new Int32Array(L),
    slotRelease: new Int32Array(L),
    memPorts: Array.from({ length: machine.memoryPorts }, () => null),
    active: [],
    oldest: new Array<Inst | null>(L).fill(null),
    finished: false,
  }
  for (let i = 0; i < ops.length; i++) {
    if ((ops[i] as VectorOp).seq !== i) {
      s.done = true
      s.error = { code: 'invalid-stream', message: `op ${i} has seq ${(ops[i] as VectorOp).seq}; expected ${i}` }
    }
  }
  ctx.sink = {
    completed(seq, c) {
      s.completeAt[seq] = c
      s.finished = true
      if (s.hold === seq) {
        s.hold = -1
        s.holdReleasedAt = c
      }
    },
    laneFinished(lane, _seq, tookSlot) {
      if (tookSlot) s.slotRelease[lane] = (s.slotRelease[lane] ?? 0) + 1
    },
  }
  return s
}

function makeInst(ctx: Ctx, op: VectorOp, src: Int32Array[], mask: Int32Array | null): Inst {
  if (op.memory || op.unit === 'load' || op.unit === 'store') {
    return op.memory?.isStore || op.unit === 'store' ? new StoreInst(ctx, op, src, mask) : new LoadInst(ctx, op, src, mask)
  }
  if (op.shape === 'ordered-reduction') return new OrderedReductionInst(ctx, op, src, mask)
  if (op.shape === 'reduction' || (op.shape === 'scalar-result' && /^(vcpop|vfirst)/.test(op.op))) {
    return new ReductionInst(ctx, op, src, mask)
  }
  if (op.shape === 'permutation') return new PermutationInst(ctx, op, src, mask)
  return new UnitInst(ctx, op, src, mask)
}

function isMem(op: VectorOp): boolean {
  return !!op.memory || op.unit === 'load' || op.unit === 'store'
}

/** Tries to dispatch op in cycle c; returns false (and sets the front-end reason) when it must wait. */
function dispatch(s: TimingState, op: VectorOp, c: number): boolean {
  const m = s.machine
  const ctx = s.ctx
  const mem = isMem(op)
  if (mem ? s.memQueued >= m.memQueueDepth : s.arithQueued >= m.arithQueueDepth) {
    s.feReason = R_QUEUE
    return false
  }
  if (ctx.ren.freeCount < op.dstRegs.length) {
    s.feReason = R_RENAME
    return false
  }
  const src = op.srcRegs.map((g) => Int32Array.from(g, (r) => ctx.ren.lookup(r)))
  const mask = op.masked ? Int32Array.of(ctx.ren.lookup(0)) : null
  for (const g of src) for (const p of g) ctx.ren.addReader(p)
  if (mask) ctx.ren.addReader(mask[0] ?? 0)
  const inst = makeInst(ctx, op, src, mask)
  const dst = new Int32Array(op.dstRegs.length)
  const old = new Int32Array(op.dstRegs.length)
  op.dstRegs.forEach((r, k) => {
    const [p, o] = ctx.ren.rename(r)
    ctx.rf.invalidate(p)
    dst[k] = p
    old[k] = o
  })
  inst.dst = dst
  inst.oldDst = old
  inst.dispatch = c
  s.dispatchAt[op.seq] = c
  s.inflight.push(inst)
  if (inst instanceof MemInst) {
    s.mem.push(inst)
    s.memQueued++
  } else {
    s.arith.push(inst)
    s.arithQueued++
  }
  return true
}

/** One front-end cycle: a scalar instruction, a vset, or up to dispatchWidth vector dispatches. */
function frontEnd(s: TimingState, c: number): boolean {
  const ops = s.stream.ops
  s.feReason = R_FRONTEND
  s.feDispatched = -1
  if (s.hold >= 0 || s.holdReleasedAt === c) return false
  let dispatched = 0
  for (;;) {
    if (s.opIdx >= ops.length) {
      if (dispatched > 0 || s.scalarAfterLeft === 0) return dispatched > 0
      s.scalarAfterLeft--
      return true
    }
    if (s.scalarLeft > 0) {
      if (dispatched > 0) return true
      s.scalarLeft--
      return true
    }
    const op = ops[s.opIdx] as VectorOp
    if (op.isConfig) {
      if (dispatched > 0) return true
      s.dispatchAt[op.seq] = c
      s.completeAt[op.seq] = c
      s.feDispatched = op.seq
      advance(s)
      return true
    }
    if (!dispatch(s, op, c)) return dispatched > 0
    if (dispatched === 0) s.feDispatched = op.seq
    dispatched++
    advance(s)
    if (op.scalarResult) {
      s.hold = op.seq
      return true
    }
    if (dispatched >= s.machine.dispatchWidth) return true
  }
}

function advance(s: TimingState): void {
  s.opIdx++
  s.scalarLeft = s.stream.ops[s.opIdx]?.scalarBefore ?? 0
}

function readEnd(inst: Inst, lane: number, ctx: Ctx): number {
  return ctx.laneTimes[(inst.seq * ctx.L + lane) * FIELDS + READ_END] ?? NULL_CYCLE
}

function noteStarted(s: TimingState, inst: Inst): void {
  if (inst.startedCount === s.ctx.L) s.arithQueued--
}

function startInLane(s: TimingState, inst: Inst, lane: number, c: number): void {
  const work = inst.hasWorkIn(lane)
  inst.tookSlot[lane] = work ? 1 : 0
  if (work) s.slotsUsed[lane] = (s.slotsUsed[lane] ?? 0) + 1
  s.laneArithNext[lane] = (s.laneArithNext[lane] ?? 0) + 1
  inst.startLane(lane, c)
  noteStarted(s, inst)
}

/** Issue policy `staggered`: each lane starts its next instruction the cycle after it finished reading the previous one. */
function issueStaggered(s: TimingState, lane: number, c: number): void {
  const ctx = s.ctx
  for (;;) {
    const k = s.laneArithNext[lane] ?? 0
    const inst = s.arith.at(k)
    if (!inst || inst.dispatch >= c) return
    const prev = k > 0 ? s.arith.at(k - 1) : undefined
    if (prev && (prev.readDone[lane] !== 1 || readEnd(prev, lane, ctx) >= c)) return
    if (inst.hasWorkIn(lane) && (s.slotsUsed[lane] ?? 0) >= s.machine.laneSlots) {
      ctx.deny(lane, inst, R_SLOT)
      ctx.refused[lane] = inst
      return
    }
    startInLane(s, inst, lane, c)
    if (inst.hasWorkIn(lane)) return
  }
}

/** The lane's next arithmetic instruction may not start this cycle. */
function refuse(ctx: Ctx, lane: number, inst: Inst, reason: number): void {
  ctx.deny(lane, inst, reason)
  ctx.refused[lane] = inst
}

/** Policies `lockstep` and `serial`: the next instruction starts in every lane at once. */
function issueTogether(s: TimingState, c: number): void {
  const ctx = s.ctx
  const L = ctx.L
  for (;;) {
    const k = s.laneArithNext[0] ?? 0
    const inst = s.arith.at(k)
    if (!inst || inst.dispatch >= c) return
    const prev = k > 0 ? s.arith.at(k - 1) : undefined
    let ok = true
    if (prev) {
      if (s.machine.issue === 'serial') ok = prev.complete >= 0 && prev.complete < c
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
    for (let l = 0; l < L && !full; l++) full = inst.hasWorkIn(l) && (s.slotsUsed[l] ?? 0) >= s.machine.laneSlots
    if (full) {
      for (let q = 0; q < L; q++) refuse(ctx, q, inst, inst.hasWorkIn(q) && (s.slotsUsed[q] ?? 0) >= s.machine.laneSlots ? R_SLOT : R_BARRIER)
      return
    }
    for (let l = 0; l < L; l++) startInLane(s, inst, l, c)
  }
}

/** Whether an instruction has finished before cycle c. */
function isDone(inst: Inst, c: number): boolean {
  return inst.complete >= 0 && inst.complete < c
}

/** The memory unit starts the next memory instructions, in program order, on free ports. */
function memoryStart(s: TimingState, c: number): void {
  const ports = s.memPorts
  for (let p = 0; p < ports.length; p++) {
    const held = ports[p]
    if (held && held.busDone && held.portUntil < c) ports[p] = null
  }
  for (;;) {
    const inst = s.mem.at(s.memNext)
    if (!inst || inst.dispatch >= c) return
    const port = ports.indexOf(null)
    let ok = port >= 0
    if (ok) {
      // Memory dependences: wait for every older overlapping access when either side is a store.
      while (s.memLive < s.memNext && isDone(s.mem.at(s.memLive) as MemInst, c)) s.memLive++
      s.mem.dropBefore(s.memLive)
      for (let k = s.memLive; k < s.memNext && ok; k++) {
        const o = s.mem.at(k) as MemInst
        if (o.complete >= 0 && o.complete < c) continue
        if ((o.isStore || inst.isStore) && o.overlaps(inst)) ok = false
      }
    }
    if (!ok) {
      for (let l = 0; l < s.ctx.L; l++) s.ctx.deny(l, inst, R_MEMORY)
      return
    }
    ports[port] = inst
    inst.begin(c, port)
    s.memNext++
    s.memQueued--
  }
}

/**
 * The lane's instruction on the critical path this cycle: the oldest one in
 * its read phase or refused its start (every issue policy starts the next
 * instruction only after the lane finished reading this one, so each cycle it
 * loses delays all younger ones); with none, the oldest still in flight.
 */
function critical(s: TimingState, lane: number): Inst | null {
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
  return !mem || mem.dispatch >= c
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
function classify(s: TimingState, l: number, c: number, feWaiting: boolean, nextSeq: number): void {
  const ctx = s.ctx
  const denied = ctx.denied[l] as Inst[]
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
    let oldest: Inst | null = null
    for (let i = 0; i < nd; i++) {
      const inst = denied[i] as Inst
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
        const inst = fl[i] as Inst
        if (inst.dispatch < c && inst.pending(l)) {
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
  for (let i = 0; i < nd; i++) {
    const inst = denied[i] as Inst
    const k = inst.seq * STALL_COUNT + (inst.noteReason[l] ?? 0)
    st[k] = (st[k] ?? 0) + 1
  }
  if (reason < 0 || seq < 0) return
  ctx.rec.stallAt(l, c, reason, seq)
  if (!refusal) st[seq * STALL_COUNT + reason] = (st[seq * STALL_COUNT + reason] ?? 0) + 1
}

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
  for (let i = 0; i < fl.length; i++) (fl[i] as Inst).global(c)
  const together = s.machine.issue !== 'staggered'
  if (together) issueTogether(s, c)
  // Per lane, only instructions started and not finished there take part (most of the queue waits).
  const act = s.active
  for (let l = 0; l < L; l++) {
    // A snapshot: instructions that finish in this lane during the cycle still take their turns.
    const list = ctx.laneActive[l] as Inst[]
    let na = 0
    for (let i = 0; i < list.length; i++) act[na++] = list[i] as Inst
    s.oldest[l] = na > 0 ? (act[0] as Inst) : null
    for (let i = 0; i < na; i++) (act[i] as Inst).write(l, c)
    for (let i = 0; i < na; i++) (act[i] as Inst).exec(l, c)
    if (!together) {
      const before = s.laneArithNext[l] ?? 0
      issueStaggered(s, l, c)
      // Instructions that just started in this lane may read in this very cycle.
      for (let k = before; k < (s.laneArithNext[l] ?? 0); k++) {
        const inst = s.arith.at(k) as Inst
        if (inst.laneDone[l] !== 1) act[na++] = inst
      }
    }
    for (let i = 0; i < na; i++) (act[i] as Inst).read(l, c)
  }
  // Instructions dispatched by a lane's issue above were not yet in `fl` for earlier lanes: nothing to do for them now.
  const feActive = frontEnd(s, c)
  let busy = feActive
  const ops = s.stream.ops
  const feWaiting = s.opIdx < ops.length || s.hold >= 0
  const nextSeq = s.hold >= 0 ? s.hold : (ops[s.opIdx]?.seq ?? -1)
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
