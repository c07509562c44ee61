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
 * @example
 *   const r = runPipeline({ program: 'vsetvli t0, a0, e64, m1, ta, ma', machine: { lanes: 4 } })
 *   if (r.ok) console.log(r.trace.cycles)
 */
import { checkMachine, type Machine, type MachineFieldIssue } from '../schemas/machine'
import { assemble, type AssembleOptions } from './isa/assembler'
import type { Program, SimDiagnostic } from './isa/types'
import { execute, type ExecuteOptions, type ExecuteSuccess } from './exec/execute'
import { registerGroupsOf, type RegisterGroups } from './registerGroups'
import { machineReductionOrder } from './timing/reduction-order'
import { advance, createTimingState, finish } from './timing/simulate'
import type { SimulateOptions, TimingTrace } from './trace/types'

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

/** The pipeline as a generator: yields progress between batches of cycles, returns the result. */
export function* runPipelineSteps(input: RunInput, options: RunOptions = {}): Generator<RunProgress, RunResult, void> {
  const checked = checkMachine(input.machine)
  if (!checked.ok) {
    const message = checked.issues.map((i) => `${i.field}: ${i.message}`).join('; ')
    return { ok: false, error: { stage: 'machine', code: 'invalid-machine', message, fields: checked.issues } }
  }
  const machine = checked.machine

  let program: Program
  if (typeof input.program === 'string') {
    const asm = assemble(input.program, options.assemble)
    if (!asm.ok) {
      const first = asm.errors[0]
      return { ok: false, error: { stage: 'assemble', code: first?.code ?? 'assemble', message: first?.message ?? 'the program does not assemble', diagnostics: asm.errors } }
    }
    program = asm.program
  } else program = input.program
  yield { stage: 'execute', cycle: 0, dispatched: 0, total: 0 }

  const machineOrder = options.fpReductionOrder === 'machine' ? { fpReductionOrder: machineReductionOrder(machine) } : {}
  const run = execute(program, { ...options.execute, ...machineOrder, vlen: machine.vlen })
  if (!run.ok) {
    return { ok: false, error: { stage: 'execute', code: run.error.code, message: run.error.message, diagnostics: [run.error] } }
  }
  const { stream, ok: _ok, ...functional } = run
  const total = stream.ops.length
  yield { stage: 'simulate', cycle: 0, dispatched: 0, total }

  const state = createTimingState(stream, machine, options.timing)
  const batch = options.batchCycles ?? DEFAULT_BATCH_CYCLES
  while (advance(state, batch)) yield { stage: 'simulate', cycle: state.cycle, dispatched: state.opIdx, total }
  const { trace, error } = finish(state)
  const registers = registerGroupsOf(stream)
  if (error) return { ok: false, error: { stage: 'simulate', code: error.code, message: error.message }, trace, registers }
  return { ok: true, machine, program, functional, trace, registers }
}

/** Runs the whole pipeline at once. */
export function runPipeline(input: RunInput, options: RunOptions = {}): RunResult {
  const steps = runPipelineSteps(input, options)
  for (;;) {
    const s = steps.next()
    if (s.done) return s.value
  }
}
