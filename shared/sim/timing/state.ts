/**
 * The timing engine's state: everything `step` advances, created once per run
 * (with the one-lane plan of a run whose lanes all do the same, symmetry.ts).
 */
import type { Machine } from '../../schemas/machine'
import type { DynamicStream, VectorOp } from '../exec/stream'
import type { SimulateOptions, TimingError } from '../trace/types'
import { DEFAULT_CYCLE_LIMIT, DEFAULT_TRACE_LIMIT, LANE_FIELD_COUNT, NO_CYCLE, REASON, STALL_REASONS } from '../trace/types'
import { derive } from './config'
import { routeOf } from './dispatch'
import { Ctx } from './context'
import type { InstState } from './inst'
import type { MemInst } from './memory'
import { ProgramOrderList } from './program-order-list'
import { RegFile } from './regfile'
import { Renamer } from './rename'
import { SpanRecorder } from './recorder'
import { lanePlan, type LanePlan } from './symmetry'

/** Stall reasons: the stride of TimingState.opStalls. */
export const STALL_COUNT = STALL_REASONS.length

export interface TimingState {
  /** The stream and machine the engine runs: the caller's, or their one-lane plan (symmetry.ts). */
  readonly stream: DynamicStream
  readonly machine: Machine
  /** The caller's stream and machine, which the trace describes. */
  readonly source: DynamicStream
  readonly sourceMachine: Machine
  /** The classes of alike lanes the timed lanes stand for (symmetry.ts); null: every lane is timed. */
  readonly plan: Pick<LanePlan, 'first' | 'size'> | null
  /**
   * What the per-cycle code reads of the stream and machine, copied once: the
   * one-lane plan's stream and machine are objects of other shapes than the
   * caller's, and a property read that has seen both shapes is slower.
   */
  readonly ops: readonly VectorOp[]
  /** Per op: its queue or a vset (dispatch.ts routeOf), and the registers it renames. */
  readonly opRoute: Uint8Array
  readonly opDstRegs: Int32Array
  readonly arithQueueDepth: number
  readonly memQueueDepth: number
  readonly laneSlots: number
  readonly dispatchWidth: number
  /** Issue policy `lockstep` or `serial` (every lane starts an instruction at once), and `serial`. */
  readonly together: boolean
  readonly serial: boolean
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
  /** Instructions in flight, in program order. */
  inflight: InstState[]
  /** The instructions in flight with a phase outside the lanes (hasGlobalStep, phases.ts), in program order. */
  globalInsts: InstState[]
  /** Program-order lists of the arithmetic and memory instructions, by absolute position. */
  readonly arith: ProgramOrderList<InstState>
  readonly mem: ProgramOrderList<MemInst>
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
  readonly active: InstState[]
  /** Whether an instruction in flight finished since the last sweep of `inflight`. */
  finished: boolean
  /** Per lane, this cycle: the oldest instruction started there before the cycle (null: none). */
  readonly oldest: (InstState | null)[]
}

export function createTimingState(source: DynamicStream, sourceMachine: Machine, options: SimulateOptions = {}): TimingState {
  const plan = options.identicalLanes === false ? null : lanePlan(source, sourceMachine)
  const stream = plan?.stream ?? source
  const machine = plan?.machine ?? sourceMachine
  const d = derive(machine)
  const L = d.lanes
  const ops = stream.ops
  const laneTimes = new Int32Array(ops.length * L * LANE_FIELD_COUNT).fill(NO_CYCLE)
  const rec = new SpanRecorder(L, options.recordUsage ?? true)
  const ctx = new Ctx(d, new RegFile(d, machine.physRegs), new Renamer(machine.physRegs), rec, laneTimes)
  if (plan) {
    rec.setLaneWeights(plan.size)
    ctx.laneWeight.set(plan.size)
  }
  const s: TimingState = {
    stream,
    machine,
    source,
    sourceMachine,
    plan,
    ops,
    opRoute: Uint8Array.from(ops, routeOf),
    opDstRegs: Int32Array.from(ops, (op) => op.dstRegs.length),
    arithQueueDepth: machine.arithQueueDepth,
    memQueueDepth: machine.memQueueDepth,
    laneSlots: machine.laneSlots,
    dispatchWidth: machine.dispatchWidth,
    together: machine.issue !== 'staggered',
    serial: machine.issue === 'serial',
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
    globalInsts: [],
    arith: new ProgramOrderList<InstState>(),
    mem: new ProgramOrderList<MemInst>(),
    memLive: 0,
    laneArithNext: new Int32Array(L),
    memNext: 0,
    arithQueued: 0,
    memQueued: 0,
    slotsUsed: new Int32Array(L),
    slotRelease: new Int32Array(L),
    memPorts: Array.from({ length: machine.memoryPorts }, () => null),
    active: [],
    oldest: new Array<InstState | null>(L).fill(null),
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
