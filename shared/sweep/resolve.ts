/**
 * A sweep definition made concrete: each swept parameter is a machine field
 * or a program symbol with its list of values, every value checked before a
 * point runs (a bad value names the field, the value and the range), and the
 * grid's points numbered with the first parameter varying slowest.
 */
import { checkMachine, defaultMachine } from '../schemas/machine'
import { SWEEP_HARD_MAX_POINTS, type SweepDefinition, type SweepLimits, type SweepValue } from '../schemas/sweep'
import { isMachineField, MACHINE_FIELD_PATHS, mergeMachineRecord, withMachineField } from './machineFields'
import { parseSpec } from './spec'
import { sweepableSymbol } from './symbols'

export interface ResolvedParameter {
  path: string
  kind: 'machine' | 'symbol'
  values: SweepValue[]
}

export interface ResolvedSweep {
  program: string
  /** The base machine, fully defaulted, before the swept fields are set. */
  machine: Record<string, unknown>
  parameters: ResolvedParameter[]
  /** Points in the whole grid (the limits may stop a sweep before the last). */
  count: number
  limits: SweepLimits
}

export interface SweepDefinitionIssue {
  /** `parameters.0.spec`, `machine`, ... as in the definition. */
  field: string
  message: string
}

export type ResolveResult = { ok: true; sweep: ResolvedSweep } | { ok: false; issues: SweepDefinitionIssue[] }

function resolveParameter(def: SweepDefinition, index: number, base: Record<string, unknown>): ResolvedParameter | SweepDefinitionIssue {
  const { path, spec } = def.parameters[index] as SweepDefinition['parameters'][number]
  const field = `parameters.${index}`
  const parsed = parseSpec(spec, SWEEP_HARD_MAX_POINTS)
  if (!parsed.ok) return { field: `${field}.spec`, message: `${path}: ${parsed.message}` }
  if (isMachineField(path)) {
    for (const value of parsed.values) {
      const checked = checkMachine(withMachineField(base, path, value))
      const own = checked.ok ? undefined : checked.issues.find((i) => i.field === path)
      if (own) return { field: `${field}.spec`, message: `${path}=${String(value)}: ${own.message}` }
    }
    return { path, kind: 'machine', values: parsed.values }
  }
  if (path.includes('.')) {
    return { field: `${field}.path`, message: `"${path}" is not a machine field (fields: ${MACHINE_FIELD_PATHS.join(', ')})` }
  }
  const symbol = sweepableSymbol(def.program, path)
  if (!symbol.ok) return { field: `${field}.path`, message: `"${path}" is neither a machine field nor a program symbol: ${symbol.message}` }
  const bad = parsed.values.find((v) => typeof v !== 'number' || !Number.isSafeInteger(v))
  if (bad !== undefined) return { field: `${field}.spec`, message: `${path}=${String(bad)}: a program symbol takes whole numbers` }
  return { path, kind: 'symbol', values: parsed.values }
}

/** Checks a (schema-valid) definition and expands its value lists. */
export function resolveSweep(def: SweepDefinition): ResolveResult {
  const base = mergeMachineRecord(defaultMachine as unknown as Record<string, unknown>, def.machine)
  const issues: SweepDefinitionIssue[] = []
  const parameters: ResolvedParameter[] = []
  def.parameters.forEach((_, i) => {
    const r = resolveParameter(def, i, base)
    if ('kind' in r) parameters.push(r)
    else issues.push(r)
  })
  if (issues.length > 0) return { ok: false, issues }
  // The base machine must hold apart from the swept fields: check it with each at its first value.
  let first = base
  for (const p of parameters) if (p.kind === 'machine') first = withMachineField(first, p.path, p.values[0])
  const checked = checkMachine(first)
  if (!checked.ok) {
    const swept = new Set(parameters.map((p) => p.path))
    for (const i of checked.issues) if (!swept.has(i.field)) issues.push({ field: `machine.${i.field}`, message: `${i.field}: ${i.message}` })
    if (issues.length > 0) return { ok: false, issues }
  }
  const count = parameters.reduce((n, p) => n * p.values.length, 1)
  if (count > SWEEP_HARD_MAX_POINTS) return { ok: false, issues: [{ field: 'parameters', message: `the grid has ${count} points, more than any sweep may have (${SWEEP_HARD_MAX_POINTS})` }] }
  return { ok: true, sweep: { program: def.program, machine: base, parameters, count, limits: def.limits } }
}

/** The values of point `index`; the last parameter varies fastest, the first slowest. */
export function pointValues(sweep: Pick<ResolvedSweep, 'parameters'>, index: number): SweepValue[] {
  const out: SweepValue[] = new Array<SweepValue>(sweep.parameters.length)
  let rest = index
  for (let k = sweep.parameters.length - 1; k >= 0; k--) {
    const values = (sweep.parameters[k] as ResolvedParameter).values
    out[k] = values[rest % values.length] as SweepValue
    rest = Math.floor(rest / values.length)
  }
  return out
}

/** The program text and machine record of one point. */
export function pointInput(sweep: ResolvedSweep, values: readonly SweepValue[]): { program: string; machine: Record<string, unknown>; symbols: Map<string, number> } {
  let machine = sweep.machine
  const symbols = new Map<string, number>()
  sweep.parameters.forEach((p, k) => {
    const v = values[k] as SweepValue
    if (p.kind === 'machine') machine = withMachineField(machine, p.path, v)
    else symbols.set(p.path, v as number)
  })
  return { program: sweep.program, machine, symbols }
}
