/**
 * Runs one point of a sweep through the shared pipeline and keeps its
 * figures. A point whose run fails (machine, assembly, execution, a cycle
 * limit) is a result with the stage and message, never an abort of the sweep.
 *
 * A PointRunner assembles and executes each distinct (program text, VLEN)
 * once (prepareRun) and re-times the prepared stream for every machine
 * (timePreparedMetrics, which builds the metrics and no trace): a swept
 * machine field other than vlen never executes again.
 * It keeps the last PREPARED_CACHE preparations; points come in index order,
 * the first parameter slowest, so a small cache serves a whole grid.
 */
import { checkMachine } from '../schemas/machine'
import type { SweepPointResult, SweepValue } from '../schemas/sweep'
import { prepareRun, timePreparedMetrics, type PrepareResult, type RunError } from '../sim/run'
import { figuresOf } from './figures'
import { pointInput, pointValues, type ResolvedSweep } from './resolve'
import { withSymbols } from './symbols'

/** Preparations kept by a runner (each holds one dynamic stream). */
export const PREPARED_CACHE = 64

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
  const prepared = new Map<string, PrepareResult>()
  const prepare = (text: string, vlen: number): PrepareResult => {
    const key = `${vlen}\n${text}`
    let p = prepared.get(key)
    if (p) {
      prepared.delete(key) // re-inserted below: the Map's order is the use order
    } else {
      p = prepareRun({ program: text }, { vlen })
      if (prepared.size >= PREPARED_CACHE) prepared.delete(prepared.keys().next().value as string)
    }
    prepared.set(key, p)
    return p
  }

  return {
    run(index: number): SweepPointResult {
      const values = pointValues(sweep, index)
      const failed = (e: RunError): SweepPointResult => ({ index, values, status: 'failed', figures: null, error: errorOf(e) })
      const machine = checkMachine(pointInput(sweep, values).machine)
      if (!machine.ok) {
        return failed({ stage: 'machine', code: 'invalid-machine', message: machine.issues.map((i) => `${i.field}: ${i.message}`).join('; ') })
      }
      const p = prepare(pointProgram(sweep, values), machine.machine.vlen)
      if (!p.ok) return failed(p.error)
      const r = timePreparedMetrics(p.prepared, machine.machine, { cycleLimit: sweep.limits.cycleLimit, recordUsage: false })
      if (!r.ok) return failed(r.error)
      return { index, values, status: 'ok', figures: figuresOf(r.metrics), error: null }
    },
  }
}
