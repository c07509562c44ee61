/**
 * A suite run's work, without I/O: each scenario's newest content checked
 * (suite-check.ts) on the run's machine, the suite's preset or the
 * scenario's own, and the counts that decide the run's colour. Red means an
 * expectation failed or a scenario is gone; the model version is recorded
 * beside the results but never decides anything, so a new model that gives
 * the same results gives the same verdicts.
 */
import { checkMachine, parseMachine, type Machine } from '../../shared/schemas/machine'
import type { ScenarioContent } from '../../shared/schemas/scenario'
import type { SuiteRunEntry } from '../../shared/schemas/suite'
import { findPreset } from '../../shared/sim/presets'
import { checkScenario } from './suite-check'

export interface SuiteScenario {
  id: string
  /** null: the scenario was deleted since it was added to the suite. */
  found: { title: string; version: number; content: ScenarioContent } | null
}

export interface SuiteRunOptions {
  /**
   * Changes the machine each scenario runs on, after the preset: how a test
   * build changes one timing rule (e.g. the FPU latency) without touching the
   * engine. The app never sets it.
   */
  adjustMachine?: (machine: Machine) => Machine
}

export interface SuiteOutcome {
  entries: SuiteRunEntry[]
  passed: number
  failed: number
  red: boolean
}

export function machineOf(content: ScenarioContent, presetId: string | null): Machine {
  const preset = presetId ? findPreset(presetId) : undefined
  return preset ? parseMachine(preset.machine) : content.machine
}

export function runSuiteScenarios(scenarios: SuiteScenario[], presetId: string | null, options: SuiteRunOptions = {}): SuiteOutcome {
  const entries: SuiteRunEntry[] = scenarios.map(({ id, found }) => {
    if (!found) return { scenarioId: id, title: '(deleted scenario)', version: null, status: 'missing', error: { stage: 'suite', code: 'missing', message: 'the scenario was deleted' }, results: [], figures: null }
    const base = machineOf(found.content, presetId)
    const adjusted = options.adjustMachine ? checkMachine(options.adjustMachine(base)) : { ok: true as const, machine: base }
    const head = { scenarioId: id, title: found.title, version: found.version }
    if (!adjusted.ok) return { ...head, status: 'failed', error: { stage: 'machine', code: 'invalid-machine', message: adjusted.issues.map((i) => `${i.field}: ${i.message}`).join('; ') }, results: [], figures: null }
    const checked = checkScenario(found.content, adjusted.machine)
    if (!checked.ok) {
      const p = checked.problems[0]
      return { ...head, status: 'failed', error: { stage: 'data', code: 'initial-data', message: `initial data ${(p?.index ?? 0) + 1}: ${p?.message ?? 'does not fit'}` }, results: [], figures: null }
    }
    const c = checked.check
    return { ...head, status: c.error ? 'failed' : 'ok', error: c.error, results: c.results, figures: c.figures }
  })
  const all = entries.flatMap((e) => e.results)
  const failed = all.filter((r) => !r.pass).length
  return { entries, passed: all.length - failed, failed, red: failed > 0 || entries.some((e) => e.status === 'missing') }
}

/** Claims whose verdict differs between two runs' entries, in the newer run's order (`title › claim: pass -> FAIL`). */
export function changedVerdicts(before: SuiteRunEntry[], after: SuiteRunEntry[]): string[] {
  const old = new Map(before.flatMap((e) => e.results.map((r) => [`${e.scenarioId}\n${r.text}`, r.pass] as const)))
  const word = (pass: boolean) => (pass ? 'pass' : 'FAIL')
  return after.flatMap((e) =>
    e.results.flatMap((r) => {
      const was = old.get(`${e.scenarioId}\n${r.text}`)
      return was === undefined || was === r.pass ? [] : [`${e.title} › ${r.text}: ${word(was)} -> ${word(r.pass)}`]
    }),
  )
}
