/**
 * Command-line arguments of `npm run -s sim`: parsing and the `--set` overrides.
 * Kept apart from sim.ts so that the tests can drive it without a process.
 */
import { readFileSync } from 'node:fs'
import { parseArgs } from 'node:util'
import { defaultMachine } from '../../shared/schemas/machine'
import { PRESETS } from '../../shared/sim/presets'
import { parseDumpRequest, type DumpRequest } from '../../shared/sim/exec/dump'
import { FP_REDUCTION_ORDERS, type FpReductionOrder } from '../../shared/sim/run'

export const FORMATS = ['summary', 'json', 'csv', 'vcd'] as const
export type Format = (typeof FORMATS)[number]

export const USAGE =
  'usage: npm run -s sim -- FILE.s [--preset NAME] [--config FILE.json] [--set path=value]... [--format summary|json|csv|vcd] [--out FILE] [--fp-order element|machine] [--dump LABEL:COUNT:TYPE]...'

/** A mistake in the command line itself: exit code 2. */
export class UsageError extends Error {
  override name = 'UsageError'
}

export interface SimArgs {
  file: string
  preset?: string
  config?: string
  sets: { path: string[]; raw: string; text: string }[]
  format: Format
  out?: string
  /** The summation order of vfredusum: element order (as QEMU) or the machine's. */
  fpOrder: FpReductionOrder
  /** Data to print after the run (summary format only). */
  dumps: DumpRequest[]
}

export function parseSimArgs(argv: string[]): SimArgs {
  let parsed
  try {
    parsed = parseArgs({
      args: argv,
      allowPositionals: true,
      strict: true,
      options: {
        preset: { type: 'string' },
        config: { type: 'string' },
        set: { type: 'string', multiple: true },
        format: { type: 'string' },
        out: { type: 'string' },
        'fp-order': { type: 'string' },
        dump: { type: 'string', multiple: true },
        help: { type: 'boolean', short: 'h' },
      },
    })
  } catch (e) {
    // node:util's messages name the option; drop its hint about '--' which does not apply here.
    throw new UsageError(`${(e as Error).message.split('\n')[0]}; ${USAGE}`)
  }
  const { values, positionals } = parsed
  if (values.help) throw new UsageError(USAGE)
  const file = oneFile(positionals, 'program', USAGE)
  const format = values.format ?? 'summary'
  if (!(FORMATS as readonly string[]).includes(format)) {
    throw new UsageError(`--format must be one of ${FORMATS.join(', ')} (got "${format}")`)
  }
  const fpOrder = values['fp-order'] ?? 'element'
  if (!(FP_REDUCTION_ORDERS as readonly string[]).includes(fpOrder)) {
    throw new UsageError(`--fp-order must be one of ${FP_REDUCTION_ORDERS.join(', ')} (got "${fpOrder}")`)
  }
  const dumps = (values.dump ?? []).map((text) => {
    const r = parseDumpRequest(text)
    if (!r.ok) throw new UsageError(r.message)
    return r.request
  })
  if (dumps.length > 0 && format !== 'summary') throw new UsageError(`--dump adds data to the summary; it cannot be used with --format ${format}`)
  const sets = parseSets(values.set)
  return { file, preset: values.preset, config: values.config, sets, format: format as Format, out: values.out, fpOrder: fpOrder as FpReductionOrder, dumps }
}

/** "4" -> 4, "true" -> true, "serial" -> "serial": the schema then judges the value. */
export function coerceValue(raw: string): unknown {
  if (raw === 'true') return true
  if (raw === 'false') return false
  if (raw.trim() !== '' && Number.isFinite(Number(raw))) return Number(raw)
  return raw
}

const isRecord = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v)

/**
 * Returns a copy of `base` with each `--set` applied. A path must name an
 * existing leaf field of `base` (the fully defaulted machine), so that a typo
 * is reported instead of silently ignored.
 */
export function applySets<T extends Record<string, unknown>>(base: T, sets: SimArgs['sets']): T {
  const out = structuredClone(base)
  for (const { path, raw, text } of sets) {
    let node: Record<string, unknown> = out
    for (const [i, key] of path.entries()) {
      const known = Object.keys(node)
      if (!Object.hasOwn(node, key)) {
        const where = path.slice(0, i).join('.')
        throw new UsageError(`--set ${text}: unknown machine field "${path.slice(0, i + 1).join('.')}"${where ? ` (fields of ${where}: ${known.join(', ')})` : ` (fields: ${known.join(', ')})`}`)
      }
      if (i === path.length - 1) {
        if (isRecord(node[key])) throw new UsageError(`--set ${text}: "${path.join('.')}" is a group of fields (${Object.keys(node[key] as object).join(', ')}); set one of them`)
        node[key] = coerceValue(raw)
      } else {
        const next = node[key]
        if (!isRecord(next)) throw new UsageError(`--set ${text}: "${path.slice(0, i + 1).join('.')}" is a single field, not a group`)
        node = next
      }
    }
  }
  return out
}

/** Deep-merges a partial machine (from --config) onto a full one; arrays and scalars replace. */
export function mergeMachine<T extends Record<string, unknown>>(base: T, partial: Record<string, unknown>): T {
  const out: Record<string, unknown> = structuredClone(base)
  for (const [key, value] of Object.entries(partial)) {
    out[key] = isRecord(value) && isRecord(out[key]) ? mergeMachine(out[key] as Record<string, unknown>, value) : value
  }
  return out as T
}

/** The one file a command line names (`what`: 'program', 'bundle'), or a usage error. */
export function oneFile(positionals: string[], what: string, usage: string): string {
  if (positionals.length !== 1) throw new UsageError(`${positionals.length === 0 ? `no ${what} file given` : `one ${what} file expected, got ${positionals.length}`}; ${usage}`)
  return positionals[0] as string
}

/** The --set options: dotted machine field names and raw values (`spelling` is how the usage line writes the form). */
export function parseSets(texts: string[] | undefined, spelling = 'path=value'): SimArgs['sets'] {
  return (texts ?? []).map((text) => {
    const eq = text.indexOf('=')
    const path = eq > 0 ? text.slice(0, eq).split('.') : []
    if (eq <= 0 || path.some((p) => p === '')) throw new UsageError(`--set expects ${spelling} with a dotted machine field name, e.g. units.fpu.latency=6 (got "${text}")`)
    return { path, raw: text.slice(eq + 1), text }
  })
}

/** A file's text, or a usage error naming what it was for. */
export function readText(path: string, what: string): string {
  try {
    return readFileSync(path, 'utf8')
  } catch (e) {
    throw new UsageError(`cannot read ${what} ${path}: ${(e as NodeJS.ErrnoException).code ?? (e as Error).message}`)
  }
}

/**
 * The machine fields of a command line, not yet validated: the defaults, then
 * the preset (by id or name), then --config's JSON object, then each --set.
 * `sim` and `sweep` build their machine the same way.
 */
export function machineInputFromArgs(args: Pick<SimArgs, 'preset' | 'config' | 'sets'>): Record<string, unknown> {
  let machine: Record<string, unknown> = { ...defaultMachine }
  if (args.preset !== undefined) {
    const key = args.preset.toLowerCase()
    const preset = PRESETS.find((p) => p.id === key || p.name.toLowerCase() === key)
    if (!preset) throw new UsageError(`unknown preset "${args.preset}" (presets: ${PRESETS.map((p) => `"${p.name}" (${p.id})`).join(', ')})`)
    machine = mergeMachine(machine, preset.machine as Record<string, unknown>)
  }
  if (args.config) {
    let partial: unknown
    try {
      partial = JSON.parse(readText(args.config, 'config file'))
    } catch (e) {
      if (e instanceof UsageError) throw e
      throw new UsageError(`config file ${args.config} is not JSON: ${(e as Error).message}`)
    }
    if (typeof partial !== 'object' || partial === null || Array.isArray(partial)) throw new UsageError(`config file ${args.config} must hold a JSON object of machine fields`)
    machine = mergeMachine(machine, partial as Record<string, unknown>)
  }
  return applySets(machine, args.sets)
}
