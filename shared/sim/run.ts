/**
 * The whole pipeline in one pure function: text (or an assembled program) and
 * a machine -> assemble -> execute -> simulate. The CLI, the Worker and the
 * server all run programs through here, so they agree on every result and on
 * every error. Nothing throws on user input: a failed stage comes back as a
 * structured RunError naming the stage, with line and column where it has one.
 *
 * `runPipelineSteps` is the same pipeline as a generator that pauses between
 * batches of cycles, so that a driver (the Worker) can report progress and
 * honour a cancel between batches; `runPipeline` just drains it.
 *
 * A sweep times one program on many machines: `prepareRun` assembles and
 * executes it once at one VLEN (execution depends on VLEN, and on the machine
 * otherwise only when vfredusum follows a machine's order), and
 * `timePrepared` times that stream on each machine of the same VLEN.
 * `runPipeline` is the two in a row.
 *
 * @example
 *   const r = runPipeline({ program: 'vsetvli t0, a0, e64, m1, ta, ma', machine: { lanes: 4 } })
 *   if (r.ok) console.log(r.trace.cycles)
 */
import { checkMachine, defaultMachine, type Machine, type MachineFieldIssue } from '../schemas/machine'
import { assemble, type AssembleOptions } from './isa/assembler'
import type { Program, SimDiagnostic } from './isa/types'
import { execute, type ExecuteOptions, type ExecuteSuccess } from './exec/execute'
import type { DynamicStream } from './exec/stream'
import { isValidVlen } from './exec/vtype'
import { registerGroupsOf, type RegisterGroups } from './registerGroups'
import { machineReductionOrder } from './timing/reduction-order'
import { advance, createTimingState, finish, finishMetrics } from './timing/simulate'
import type { Metrics, SimulateOptions, TimingError, TimingTrace } from './trace/types'

export type RunStage = 'machine' | 'assemble' | 'execute' | 'simulate'

export interface RunError {
  stage: RunStage
  /** Stable code: the stage's own ('unknown-mnemonic', 'step-limit', 'cycle-limit', ...), or 'invalid-machine', 'cancelled'. */
  code: string
  message: string
  /** Assembly and execution problems, each with line and column. */
  diagnostics?: SimDiagnostic[]
  /** Machine fields that failed validation. */
  fields?: MachineFieldIssue[]
}

export interface RunInput {
  /** Assembly text, or a program already assembled (e.g. decoded from machine code). */
  program: string | Program
  /** A machine configuration; missing fields take the defaults, bad ones are a 'machine' error. */
  machine: unknown
}

/**
 * The order `vfredusum` adds in: 'element' is element order, as QEMU does
 * (the default); 'machine' is the order the machine's lanes, accumulators and
 * ring or tree imply (machineReductionOrder). Only the rounding differs.
 */
export const FP_REDUCTION_ORDERS = ['element', 'machine'] as const
export type FpReductionOrder = (typeof FP_REDUCTION_ORDERS)[number]

export interface RunOptions {
  assemble?: AssembleOptions
  /** Execution options; VLEN always comes from the machine, and `fpReductionOrder` below overrides theirs when it is 'machine'. */
  execute?: Omit<ExecuteOptions, 'vlen'>
  /** The summation order of vfredusum (default 'element'). */
  fpReductionOrder?: FpReductionOrder
  timing?: SimulateOptions
  /** Cycles simulated between two pauses of runPipelineSteps (default 20,000). */
  batchCycles?: number
}

/** The functional results of the run: registers, memory and output, without the dynamic stream. */
export type FunctionalResult = Omit<ExecuteSuccess, 'stream' | 'ok'>

export type RunResult =
  | {
      ok: true
      machine: Machine
      program: Program
      functional: FunctionalResult
      trace: TimingTrace
      /** Registers each dynamic vector instruction wrote and the groups it read, by trace position. */
      registers: RegisterGroups
    }
  | {
      ok: false
      error: RunError
      /** The partial trace of a timing run cut short (cycle limit, trace limit). */
      trace?: TimingTrace
      /** With a partial trace: the register use of the whole stream. */
      registers?: RegisterGroups
    }

export interface RunProgress {
  stage: RunStage
  /** Cycles simulated so far (0 before the timing stage). */
  cycle: number
  /** Vector instructions dispatched so far, and in the whole stream. */
  dispatched: number
  total: number
}

const DEFAULT_BATCH_CYCLES = 20_000

/**
 * How a program is prepared once for many timings. Execution depends on VLEN
 * (vl follows it), so VLEN is part of the preparation; everything else about
 * the machine only changes the timing, except the order vfredusum adds in
 * when it follows a machine's ('machine', given `orderMachine`).
 */
export interface PrepareOptions {
  /** VLEN in bits (default: the default machine's). Every machine timed against the preparation must have this VLEN. */
  vlen?: number
  assemble?: AssembleOptions
  /** Execution options; VLEN comes from `vlen`, and fpReductionOrder 'machine' below overrides theirs. */
  execute?: Omit<ExecuteOptions, 'vlen'>
  /** The summation order of vfredusum (default 'element', which no machine field changes). */
  fpReductionOrder?: FpReductionOrder
  /** With fpReductionOrder 'machine': the machine whose order the sums follow (its VLEN must be `vlen`, or gives it). */
  orderMachine?: unknown
}

/** A program assembled and executed once, ready to be timed on any machine of the same VLEN. */
export interface PreparedRun {
  program: Program
  vlen: number
  functional: FunctionalResult
  /** The dynamic stream; timing never modifies it, so one preparation serves any number of timings. */
  stream: DynamicStream
  registers: RegisterGroups
  /** The order the vfredusum sums of `functional` follow; with 'machine', the machine they were made for. */
  fpReductionOrder: FpReductionOrder
  orderMachine?: Machine
}

export type PrepareResult = { ok: true; prepared: PreparedRun } | { ok: false; error: RunError }

export interface TimeOptions {
  timing?: SimulateOptions
  /** Cycles simulated between two pauses of timePreparedSteps (default 20,000). */
  batchCycles?: number
}

function machineError(issues: MachineFieldIssue[]): RunError {
  const message = issues.map((i) => `${i.field}: ${i.message}`).join('; ')
  return { stage: 'machine', code: 'invalid-machine', message, fields: issues }
}

/** Assembles (when given text) and executes a program once at one VLEN: the machine-independent half of a run. */
export function prepareRun(input: { program: string | Program }, options: PrepareOptions = {}): PrepareResult {
  let orderMachine: Machine | undefined
  if (options.fpReductionOrder === 'machine') {
    const checked = checkMachine(options.orderMachine ?? {})
    if (!checked.ok) return { ok: false, error: machineError(checked.issues) }
    orderMachine = checked.machine
  }
  const vlen = options.vlen ?? orderMachine?.vlen ?? defaultMachine.vlen
  if (orderMachine && orderMachine.vlen !== vlen) {
    const field = { field: 'vlen', message: `the order machine's VLEN ${orderMachine.vlen} differs from the preparation's ${vlen}` }
    return { ok: false, error: machineError([field]) }
  }
  if (!isValidVlen(vlen)) return { ok: false, error: machineError([{ field: 'vlen', message: `VLEN ${vlen} is not a power of two from 64 to 65536` }]) }

  let program: Program
  if (typeof input.program === 'string') {
    const asm = assemble(input.program, options.assemble)
    if (!asm.ok) {
      const first = asm.errors[0]
      return { ok: false, error: { stage: 'assemble', code: first?.code ?? 'assemble', message: first?.message ?? 'the program does not assemble', diagnostics: asm.errors } }
    }
    program = asm.program
  } else program = input.program

  const order = orderMachine ? { fpReductionOrder: machineReductionOrder(orderMachine) } : {}
  const run = execute(program, { ...options.execute, ...order, vlen })
  if (!run.ok) {
    return { ok: false, error: { stage: 'execute', code: run.error.code, message: run.error.message, diagnostics: [run.error] } }
  }
  const { stream, ok: _ok, ...functional } = run
  const prepared: PreparedRun = {
    program,
    vlen,
    functional,
    stream,
    registers: registerGroupsOf(stream),
    fpReductionOrder: orderMachine ? 'machine' : 'element',
    ...(orderMachine ? { orderMachine } : {}),
  }
  return { ok: true, prepared }
}

/** A timing run's error as a stage error of the pipeline. */
const simulateError = (e: TimingError): RunError => ({ stage: 'simulate', code: e.code, message: e.message })

/** The machine to time a preparation on: valid, and of the preparation's VLEN. */
function checkPreparedMachine(prepared: PreparedRun, machineInput: unknown): { ok: true; machine: Machine } | { ok: false; error: RunError } {
  const checked = checkMachine(machineInput)
  if (!checked.ok) return { ok: false, error: machineError(checked.issues) }
  if (checked.machine.vlen !== prepared.vlen) {
    const issue = { field: 'vlen', message: `VLEN ${checked.machine.vlen} differs from the ${prepared.vlen} the program was executed at; prepare it again at this VLEN` }
    return { ok: false, error: machineError([issue]) }
  }
  return { ok: true, machine: checked.machine }
}

/** Times a prepared run on a machine as a generator that yields progress between batches of cycles. */
export function* timePreparedSteps(prepared: PreparedRun, machineInput: unknown, options: TimeOptions = {}): Generator<RunProgress, RunResult, void> {
  const checked = checkPreparedMachine(prepared, machineInput)
  if (!checked.ok) return checked
  const machine = checked.machine
  const { stream, registers, program, functional } = prepared
  const total = stream.ops.length
  const state = createTimingState(stream, machine, options.timing)
  const batch = options.batchCycles ?? DEFAULT_BATCH_CYCLES
  while (advance(state, batch)) yield { stage: 'simulate', cycle: state.cycle, dispatched: state.opIdx, total }
  const { trace, error } = finish(state)
  if (error) return { ok: false, error: simulateError(error), trace, registers }
  return { ok: true, machine, program, functional, trace, registers }
}

/**
 * Times a prepared run on a machine (validated here; its VLEN must be the
 * preparation's). A sweep prepares once and calls this for every point.
 */
export function timePrepared(prepared: PreparedRun, machine: unknown, options: TimeOptions = {}): RunResult {
  return drain(timePreparedSteps(prepared, machine, options))
}

/**
 * Times a prepared run on a machine and keeps only its metrics (no trace):
 * what a sweep point needs, without building the per-instruction records,
 * spans and phase times a trace holds. The metrics equal timePrepared's.
 */
export function timePreparedMetrics(prepared: PreparedRun, machineInput: unknown, options: SimulateOptions = {}): { ok: true; metrics: Metrics } | { ok: false; error: RunError } {
  const checked = checkPreparedMachine(prepared, machineInput)
  if (!checked.ok) return checked
  const state = createTimingState(prepared.stream, checked.machine, options)
  while (advance(state, DEFAULT_BATCH_CYCLES));
  const { metrics, error } = finishMetrics(state)
  if (error) return { ok: false, error: simulateError(error) }
  return { ok: true, metrics }
}

/** The pipeline as a generator: yields progress between batches of cycles, returns the result. */
export function* runPipelineSteps(input: RunInput, options: RunOptions = {}): Generator<RunProgress, RunResult, void> {
  const checked = checkMachine(input.machine)
  if (!checked.ok) return { ok: false, error: machineError(checked.issues) }
  const machine = checked.machine
  yield { stage: 'execute', cycle: 0, dispatched: 0, total: 0 }
  const prep = prepareRun(input, {
    vlen: machine.vlen,
    ...(options.assemble ? { assemble: options.assemble } : {}),
    ...(options.execute ? { execute: options.execute } : {}),
    ...(options.fpReductionOrder === 'machine' ? { fpReductionOrder: 'machine' as const, orderMachine: machine } : {}),
  })
  if (!prep.ok) return prep
  yield { stage: 'simulate', cycle: 0, dispatched: 0, total: prep.prepared.stream.ops.length }
  return yield* timePreparedSteps(prep.prepared, machine, options)
}

function drain<T>(steps: Generator<unknown, T, void>): T {
  for (;;) {
    const s = steps.next()
    if (s.done) return s.value
  }
}

/** Runs the whole pipeline at once. */
export function runPipeline(input: RunInput, options: RunOptions = {}): RunResult {
  return drain(runPipelineSteps(input, options))
}
