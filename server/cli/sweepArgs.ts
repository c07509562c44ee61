/**
 * Command-line arguments of `npm run -s sweep`, kept apart from sweep.ts so
 * that the tests can drive them without a process.
 */
import { availableParallelism } from 'node:os'
import { parseArgs } from 'node:util'
import { oneFile, parseSets, UsageError } from './simArgs'

export const SWEEP_FORMATS = ['csv', 'json'] as const
export type SweepFormat = (typeof SWEEP_FORMATS)[number]

export const SWEEP_USAGE =
  'usage: npm run -s sweep -- FILE.s [--preset NAME] [--config FILE.json] [--set PATH=VALUE]... --vary PATH=SPEC [--vary PATH=SPEC]... [--format csv|json] [--out FILE] [--workers N] [--max-points N] [--cycle-limit N] [--time-limit SECONDS]'

export interface SweepArgs {
  file: string
  preset?: string
  config?: string
  sets: { path: string[]; raw: string; text: string }[]
  vary: { path: string; spec: string }[]
  format: SweepFormat
  out?: string
  workers: number
  maxPoints?: number
  cycleLimit?: number
  timeLimitMs?: number
}

function positiveInt(name: string, raw: string | undefined, max: number): number | undefined {
  if (raw === undefined) return undefined
  const n = Number(raw)
  if (!Number.isInteger(n) || n < 1 || n > max) throw new UsageError(`--${name} takes a whole number from 1 to ${max} (got "${raw}")`)
  return n
}

export function parseSweepArgs(argv: string[]): SweepArgs {
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
        vary: { type: 'string', multiple: true },
        format: { type: 'string' },
        out: { type: 'string' },
        workers: { type: 'string' },
        'max-points': { type: 'string' },
        'cycle-limit': { type: 'string' },
        'time-limit': { type: 'string' },
        help: { type: 'boolean', short: 'h' },
      },
    })
  } catch (e) {
    throw new UsageError(`${(e as Error).message.split('\n')[0]}; ${SWEEP_USAGE}`)
  }
  const { values, positionals } = parsed
  if (values.help) throw new UsageError(SWEEP_USAGE)
  const file = oneFile(positionals, 'program', SWEEP_USAGE)
  const format = values.format ?? 'csv'
  if (!(SWEEP_FORMATS as readonly string[]).includes(format)) throw new UsageError(`--format must be one of ${SWEEP_FORMATS.join(', ')} (got "${format}")`)
  const vary = (values.vary ?? []).map((text) => {
    const eq = text.indexOf('=')
    if (eq <= 0 || eq === text.length - 1) throw new UsageError(`--vary expects PATH=SPEC, e.g. AVL=1..256 or issue=serial,staggered (got "${text}")`)
    return { path: text.slice(0, eq), spec: text.slice(eq + 1) }
  })
  if (vary.length === 0) throw new UsageError(`give at least one --vary PATH=SPEC; ${SWEEP_USAGE}`)
  const sets = parseSets(values.set)
  const time = values['time-limit']
  const seconds = time === undefined ? undefined : Number(time)
  if (seconds !== undefined && !(Number.isFinite(seconds) && seconds > 0 && seconds <= 86_400)) throw new UsageError(`--time-limit takes seconds, more than 0 and at most 86400 (got "${time}")`)
  return {
    file,
    preset: values.preset,
    config: values.config,
    sets,
    vary,
    format: format as SweepFormat,
    out: values.out,
    workers: positiveInt('workers', values.workers, 256) ?? Math.max(1, availableParallelism()),
    maxPoints: positiveInt('max-points', values['max-points'], 1_000_000),
    cycleLimit: positiveInt('cycle-limit', values['cycle-limit'], 5_000_000),
    timeLimitMs: seconds === undefined ? undefined : Math.round(seconds * 1000),
  }
}
