/**
 * Chimeline's cycle-level lane timing model. `simulate` runs a dynamic
 * instruction stream to the end; `createTimingState` + `step` + `finish` let a
 * driver (the Worker) advance it in slices, report progress and cancel.
 *
 * @example
 *   const { trace, error } = simulate(execute(program).stream, parseMachine({ lanes: 4 }))
 */
import type { Machine } from '../../schemas/machine'
import type { DynamicStream, VectorOp } from '../exec/stream'
import type { FpWidth, InstructionTrace, Metrics, SimulateOptions, TimingError, TimingResult } from '../trace/types'
import { stallCountsAt } from '../trace/types'
import type { TimingState } from './engine'
import { STALL_COUNT, createTimingState, step } from './engine'
import { opFlops } from './inst'
import { derive } from './config'
import { Ctx } from './context'
import { computeMetrics } from './metrics'
import { SpanRecorder } from './recorder'
import { RegFile } from './regfile'
import { Renamer } from './rename'
import { replicate, spreadTotals } from './symmetry'

export type { TimingState } from './engine'
export { createTimingState, step } from './engine'

export interface TimingProgress {
  cycle: number
  dispatched: number
  total: number
  done: boolean
}

export function progress(s: TimingState): TimingProgress {
  return { cycle: s.cycle, dispatched: s.opIdx, total: s.stream.ops.length, done: s.done }
}

/** Runs up to `cycles` more cycles; returns false once the run is over. */
export function advance(s: TimingState, cycles: number): boolean {
  // A local copy of the imported binding: some module loaders turn each use into a getter call.
  const next = step
  for (let i = 0; i < cycles; i++) if (!next(s)) return false
  return true
}

/** The run's error: its own, or why a driver stopped it before the end (`stopped`, e.g. cancelled). */
function errorOf(s: TimingState, stopped?: TimingError): TimingError | undefined {
  return s.error ?? (s.done ? undefined : (stopped ?? { code: 'cancelled', message: 'the run was stopped before it finished' }))
}

/** Flops of an op that completed (config ops have none); 0 for one that did not. */
function doneFlops(s: TimingState, op: VectorOp, i: number): number {
  return (s.completeAt[i] ?? -1) >= 0 && !op.isConfig ? opFlops(op) : 0
}

/** Adds an op's flops to its width's sum: only FP work has flops, and its SEW is 16, 32 or 64. */
function addFlops(bySew: Record<FpWidth, number>, op: VectorOp, f: number): void {
  const width = String(op.sew)
  if (f > 0 && (width === '16' || width === '32' || width === '64')) bySew[width] += f
}

/**
 * The context the results describe, with the recorder's totals final: the
 * timed one, or for a planned run (one lane timed per class of alike lanes,
 * symmetry.ts) a context of the caller's machine with the totals spread over
 * each class, and the busy cycles of every lane.
 */
function resultContext(s: TimingState, cycles: number): { full: Ctx; laneBusy: Float64Array } {
  s.ctx.rec.closeTotals(cycles)
  const plan = s.plan
  if (!plan) return { full: s.ctx, laneBusy: s.laneBusy }
  const d = derive(s.sourceMachine)
  const full = new Ctx(d, new RegFile(d, s.sourceMachine.physRegs), new Renamer(s.sourceMachine.physRegs), new SpanRecorder(d.lanes, false), new Int32Array(0))
  spreadTotals(s.ctx, full, plan)
  const laneBusy = new Float64Array(d.lanes)
  for (let j = 0; j < plan.first.length; j++) {
    const f = plan.first[j] ?? 0
    laneBusy.fill(s.laneBusy[j] ?? 0, f, f + (plan.size[j] ?? 0))
  }
  return { full, laneBusy }
}

/**
 * The run's metrics alone, without its trace (per-instruction records, spans,
 * phase times) of a run stepped to its end: what a sweep point keeps. They
 * equal `finish(s).trace.metrics`.
 */
export function finishMetrics(s: TimingState): { metrics: Metrics; error?: TimingError } {
  const cycles = s.lastBusy + 1
  const flopsBySew = { '16': 0, '32': 0, '64': 0 }
  const ops = s.source.ops
  for (let i = 0; i < ops.length; i++) addFlops(flopsBySew, ops[i] as VectorOp, doneFlops(s, ops[i] as VectorOp, i))
  const { full, laneBusy } = resultContext(s, cycles)
  const error = errorOf(s)
  return { metrics: computeMetrics(full, cycles, flopsBySew, laneBusy), ...(error ? { error } : {}) }
}

/** Builds the (possibly partial) trace. `stopped` records why a driver ended the run early (e.g. cancelled). */
export function finish(s: TimingState, stopped?: TimingError): TimingResult {
  const cycles = s.lastBusy + 1
  const ops = s.source.ops
  const flopsBySew = { '16': 0, '32': 0, '64': 0 }
  const instructions: InstructionTrace[] = ops.map((op, i) => {
    const f = doneFlops(s, op, i)
    addFlops(flopsBySew, op, f)
    const stalls = stallCountsAt(s.opStalls, i * STALL_COUNT)
    const dispatch = (s.dispatchAt[i] ?? -1) >= 0 ? (s.dispatchAt[i] ?? 0) : null
    const complete = (s.completeAt[i] ?? -1) >= 0 ? (s.completeAt[i] ?? 0) : null
    return {
      index: op.seq,
      staticIndex: op.staticIndex,
      op: op.op,
      text: op.text,
      vl: op.vl,
      sew: op.sew,
      lmul: op.lmul,
      unit: op.unit,
      shape: op.shape,
      masked: op.masked,
      isConfig: op.isConfig,
      dispatch,
      complete,
      latency: dispatch !== null && complete !== null ? complete - dispatch + 1 : null,
      flops: f,
      stalls,
    }
  })
  const error = errorOf(s, stopped)
  const { full, laneBusy } = resultContext(s, cycles)
  let spans = s.ctx.rec.finish(cycles)
  let laneTimes = s.ctx.laneTimes
  if (s.plan) {
    // One lane was timed for each class of alike lanes: spread its results over the class (symmetry.ts).
    const r = replicate(s.ctx, full, spans, s.plan)
    spans = r
    laneTimes = r.laneTimes
  }
  return {
    trace: {
      formatVersion: 1,
      machine: s.sourceMachine,
      laneCount: full.L,
      cycles,
      instructions,
      laneTimes,
      stalls: spans.stalls,
      resources: full.rec.resources,
      usage: spans.usage,
      metrics: computeMetrics(full, cycles, flopsBySew, laneBusy),
    },
    ...(error ? { error } : {}),
  }
}

/** Times a whole stream on a machine. Never throws for a long or huge run: limits end it with `error` set. */
export function simulate(stream: DynamicStream, machine: Machine, options: SimulateOptions = {}): TimingResult {
  const s = createTimingState(stream, machine, options)
  const next = step // see `advance`
  while (next(s));
  return finish(s)
}
