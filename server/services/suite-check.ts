/**
 * One scenario checked: run its content on a machine the way the server's run
 * summary does (assemble, write the initial data over `.data`, run the shared
 * pipeline) and evaluate its expectations with shared/expectations. The
 * suite workers and `chimeline check` both call this, so the app and the CLI
 * give one verdict for one bundle by construction (and a test runs both).
 *
 * Pure work, no I/O: it runs in a worker process or the CLI, never on the
 * thread that answers requests.
 */
import { kernelFigures } from '../../shared/characterise/figures'
import { evaluateExpectations, type ExpectationRun } from '../../shared/expectations/evaluate'
import type { ExpectationResult } from '../../shared/schemas/expectation'
import type { Machine } from '../../shared/schemas/machine'
import type { ScenarioContent } from '../../shared/schemas/scenario'
import { SUITE_SCENARIO_LIMITS, type KernelFigures } from '../../shared/schemas/suite'
import { assemble } from '../../shared/sim/isa/assembler'
import { runPipeline } from '../../shared/sim/run'
import { applyInitialData, type DataProblem } from './scenario-run'

export interface ScenarioCheck {
  /** The run's error when it failed (an expectation `fails at stage ...` may still pass). */
  error: { stage: string; code: string; message: string } | null
  results: ExpectationResult[]
  /** The characterisation figures of a run that finished; null when it failed. */
  figures: KernelFigures | null
}

export type CheckOutcome = { ok: true; check: ScenarioCheck } | { ok: false; problems: DataProblem[] }

export interface CheckOptions {
  /** Limits of one run (default SUITE_SCENARIO_LIMITS: what a suite run allows a scenario). */
  limits?: { steps: number; cycles: number }
}

function runContent(content: Pick<ScenarioContent, 'program' | 'initialData'>, machine: Machine, limits: { steps: number; cycles: number }): { ok: true; run: ExpectationRun } | { ok: false; problems: DataProblem[] } {
  const asm = assemble(content.program)
  if (!asm.ok) {
    const first = asm.errors[0]
    return { ok: true, run: { ok: false, error: { stage: 'assemble', code: first?.code ?? 'assemble', message: first ? `line ${first.line}, column ${first.column}: ${first.message}` : 'the program does not assemble' } } }
  }
  const applied = applyInitialData(asm.program, content.initialData)
  if (!applied.ok) return applied
  return { ok: true, run: runPipeline({ program: applied.program, machine }, { execute: { stepLimit: limits.steps }, timing: { cycleLimit: limits.cycles, recordUsage: false } }) }
}

/**
 * Runs and evaluates one scenario's content on `machine`. Initial data that
 * does not fit its program is the caller's bad input (problems), as on save.
 */
export function checkScenario(content: Pick<ScenarioContent, 'program' | 'initialData' | 'expectations'>, machine: Machine, options: CheckOptions = {}): CheckOutcome {
  const ran = runContent(content, machine, options.limits ?? SUITE_SCENARIO_LIMITS)
  if (!ran.ok) return ran
  const run = ran.run
  const results = content.expectations.length ? evaluateExpectations(content.expectations, run) : []
  if (!run.ok) return { ok: true, check: { error: { stage: run.error.stage, code: run.error.code, message: run.error.message }, results, figures: null } }
  return { ok: true, check: { error: null, results, figures: kernelFigures(run.trace.metrics, machine) } }
}
