/**
 * Runs one point of a sweep through the shared pipeline and keeps its
 * figures. A point whose run fails (machine, assembly, execution, a cycle
 * limit) is a result with the stage and message, never an abort of the sweep.
 *
 * A PointRunner keeps the programs it assembled, keyed by text: a swept
 * machine field leaves the text as it is, so the program is assembled once.
 */
import type { SweepPointResult, SweepValue } from '../schemas/sweep'
import { assemble } from '../sim/isa/assembler'
import type { Program } from '../sim/isa/types'
import { runPipeline, type RunError } from '../sim/run'
import { figuresOf } from './figures'
import { inlineSymbols } from './inlineSymbols'
import { pointInput, pointValues, type ResolvedSweep } from './resolve'
import { withSymbols } from './symbols'

type Assembled = { ok: true; program: Program } | { ok: false; error: RunError }

const errorOf = (e: RunError): SweepPointResult['error'] => {
  const d = e.diagnostics?.[0]
  return { stage: e.stage, code: e.code, message: d ? `line ${d.line}, column ${d.column}: ${d.message}` : e.message }
}

/** The text a point runs (and the Bench opens): the sweep's program with the swept symbols' definitions rewritten. */
export function pointProgram(sweep: ResolvedSweep, values: readonly SweepValue[]): string {
  const { program, symbols } = pointInput(sweep, values)
  return withSymbols(program, symbols)
}

export function createPointRunner(sweep: ResolvedSweep) {
  const programs = new Map<string, Assembled>()
  const assembled = (text: string): Assembled => {
    let a = programs.get(text)
    if (!a) {
      const r = assemble(inlineSymbols(text))
      const first = r.ok ? undefined : r.errors[0]
      a = r.ok
        ? { ok: true, program: r.program }
        : { ok: false, error: { stage: 'assemble', code: first?.code ?? 'assemble', message: first?.message ?? 'the program does not assemble', diagnostics: r.errors } }
      programs.set(text, a)
    }
    return a
  }

  return {
    run(index: number): SweepPointResult {
      const values = pointValues(sweep, index)
      const { machine } = pointInput(sweep, values)
      const text = pointProgram(sweep, values)
      const program = assembled(text)
      const failed = (e: RunError): SweepPointResult => ({ index, values, status: 'failed', figures: null, error: errorOf(e) })
      if (!program.ok) return failed(program.error)
      const r = runPipeline({ program: program.program, machine }, { timing: { cycleLimit: sweep.limits.cycleLimit, recordUsage: false } })
      if (!r.ok) return failed(r.error)
      return { index, values, status: 'ok', figures: figuresOf(r.trace.metrics), error: null }
    },
  }
}
