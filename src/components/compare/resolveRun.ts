/**
 * A Side-by-side run named in the URL, made concrete: the program text and
 * the machine to run, and a label. Versions and sweep points are read from
 * the workspace through the typed API.
 */
import type { CompareRun } from '@shared/schemas/compare'
import { checkMachine, type Machine } from '@shared/schemas/machine'
import { PRESETS } from '@shared/sim/presets'
import { pointInput, pointValues, resolveSweep } from '@shared/sweep/resolve'
import { pointProgram } from '@shared/sweep/runPoint'
import { ApiError, type Api } from '@/api'
import { machineSummary } from '@/lib/bench/machineFields'

export interface ResolvedRun {
  label: string
  program: string
  machine: Machine
  /** One line of the machine's main fields. */
  summary: string
}

export type ResolveResult = { ok: true; run: ResolvedRun } | { ok: false; message: string }

function finish(label: string, program: string, input: unknown): ResolveResult {
  const m = checkMachine(input)
  if (!m.ok) return { ok: false, message: `${label}: the machine is not valid (${m.issues.map((i) => `${i.field}: ${i.message}`).join('; ')})` }
  return { ok: true, run: { label, program, machine: m.machine, summary: machineSummary(m.machine) } }
}

/** The preset whose fields the machine has, for a label (null: a machine of its own). */
function presetName(machine: Record<string, unknown>): string | null {
  const m = checkMachine(machine)
  if (!m.ok) return null
  const json = JSON.stringify(m.machine)
  for (const p of PRESETS) {
    const pm = checkMachine(p.machine)
    if (pm.ok && JSON.stringify(pm.machine) === json) return p.name
  }
  return null
}

export async function resolveRun(api: Api, workspaceId: string | null, run: CompareRun, programOfA: string | null): Promise<ResolveResult> {
  try {
    if (run.kind === 'program') {
      const program = run.program ?? programOfA
      if (!program) return { ok: false, message: 'The link names a machine but no program to run on it' }
      return finish(run.label ?? presetName(run.machine) ?? 'Machine of its own', program, run.machine)
    }
    if (!workspaceId) return { ok: false, message: 'Choose a workspace first' }
    if (run.kind === 'version') {
      const { scenario } = await api.scenarios.get(workspaceId, run.scenarioId)
      const { version } = await api.scenarios.version(workspaceId, run.scenarioId, run.version)
      return finish(`“${scenario.content.title}” v${run.version}`, version.content.program, version.content.machine)
    }
    const { sweep } = await api.sweeps.get(workspaceId, run.sweepId)
    const r = resolveSweep(sweep.definition)
    if (!r.ok) return { ok: false, message: `The sweep “${sweep.title}” no longer resolves: ${r.issues[0]?.message ?? ''}` }
    if (run.index >= sweep.planned) return { ok: false, message: `The sweep “${sweep.title}” has ${sweep.planned} points; there is no point ${run.index}` }
    const values = pointValues(r.sweep, run.index)
    const label = `“${sweep.title}”: ${r.sweep.parameters.map((p, k) => `${p.path}=${String(values[k])}`).join(', ')}`
    return finish(label, pointProgram(r.sweep, values), pointInput(r.sweep, values).machine)
  } catch (e) {
    return { ok: false, message: e instanceof ApiError ? e.message : String(e) }
  }
}
