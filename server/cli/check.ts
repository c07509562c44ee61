/**
 * `chimeline check BUNDLE.json [--junit FILE.xml] [--preset NAME] [--set PATH=VALUE]...`
 *
 * Runs every scenario of an exported bundle (its newest version) offline,
 * with the shared pipeline and no server or database, and checks its
 * expectations with shared/expectations, the code the Bench uses. Prints one
 * line per expectation, writes JUnit XML for a CI server, and exits 0 when
 * all pass, 1 when any fails, 2 on bad input (options, an unreadable or
 * invalid bundle, an unknown preset or machine field), with one line on
 * stderr naming the file, the line and column, and the field.
 *
 * The machine is each scenario's own; `--preset` replaces it with a preset
 * (to check a suite on another machine), and each `--set` changes one field.
 */
import { readFileSync, writeFileSync } from 'node:fs'
import { pathToFileURL } from 'node:url'
import { parseArgs } from 'node:util'
import { bundleSchema, type Bundle } from '../../shared/schemas/bundle'
import type { ExpectationResult } from '../../shared/schemas/expectation'
import { checkMachine, defaultMachine, type Machine } from '../../shared/schemas/machine'
import type { ScenarioContent } from '../../shared/schemas/scenario'
import { PRESETS } from '../../shared/sim/presets'
import { checkScenario } from '../services/suite-check'
import { parseErrorPlace, placeOfPath } from './jsonPlace'
import { toJunit, type CheckedScenario } from './junit'
import { applySets, mergeMachine, oneFile, parseSets, UsageError, type SimArgs } from './simArgs'

export const USAGE = 'usage: chimeline check BUNDLE.json [--junit FILE.xml] [--preset NAME] [--set PATH=VALUE]...'

export interface CheckArgs {
  file: string
  junit?: string | undefined
  preset?: string | undefined
  sets: SimArgs['sets']
}

export function parseCheckArgs(argv: string[]): CheckArgs {
  let parsed
  try {
    parsed = parseArgs({
      args: argv,
      allowPositionals: true,
      strict: true,
      options: { junit: { type: 'string' }, preset: { type: 'string' }, set: { type: 'string', multiple: true }, help: { type: 'boolean', short: 'h' } },
    })
  } catch (e) {
    throw new UsageError(`${(e as Error).message.split('\n')[0]}; ${USAGE}`)
  }
  const { values, positionals } = parsed
  if (values.help) throw new UsageError(USAGE)
  const file = oneFile(positionals, 'bundle', USAGE)
  const sets = parseSets(values.set, 'PATH=VALUE')
  return { file, junit: values.junit, preset: values.preset, sets }
}

/** Reads and validates a bundle; a problem names the file, the line and column, and the field. */
export function readBundle(file: string): Bundle {
  let text: string
  try {
    text = readFileSync(file, 'utf8')
  } catch (e) {
    throw new UsageError(`cannot read bundle ${file}: ${(e as NodeJS.ErrnoException).code ?? (e as Error).message}`)
  }
  let json: unknown
  try {
    json = JSON.parse(text)
  } catch (e) {
    const at = parseErrorPlace(text, (e as Error).message)
    // Node 20 quotes the text around the error, newlines and all; the place says where instead.
    const reason = (e as Error).message.replace(/, (\.\.\.)?"[\s\S]*$/, '').replace(/ in JSON at position \d+.*$/s, '')
    throw new UsageError(`${file}:${at.line}:${at.column}: not JSON: ${reason}`)
  }
  const parsed = bundleSchema.safeParse(json)
  if (!parsed.success) {
    const issue = parsed.error.issues[0]
    const path = issue?.path ?? []
    const at = placeOfPath(text, path)
    const more = parsed.error.issues.length > 1 ? ` (and ${parsed.error.issues.length - 1} more problems)` : ''
    throw new UsageError(`${file}:${at.line}:${at.column}: ${path.length ? path.join('.') : 'the bundle'}: ${issue?.message ?? 'not a Chimeline scenario bundle'}${more}`)
  }
  return parsed.data
}

function presetMachine(name: string): Record<string, unknown> {
  const key = name.toLowerCase()
  const preset = PRESETS.find((p) => p.id === key || p.name.toLowerCase() === key)
  if (!preset) throw new UsageError(`unknown preset "${name}" (presets: ${PRESETS.map((p) => `"${p.name}" (${p.id})`).join(', ')})`)
  return mergeMachine({ ...defaultMachine }, preset.machine as Record<string, unknown>)
}

/** The machine a scenario is checked on: its own or the preset, then the --set fields; an invalid result is bad input. */
export function machineFor(content: ScenarioContent, args: CheckArgs): Machine {
  const base = args.preset ? presetMachine(args.preset) : (content.machine as unknown as Record<string, unknown>)
  const machine = applySets(base, args.sets)
  const checked = checkMachine(machine)
  if (!checked.ok) throw new UsageError(checked.issues.map((i) => `machine field ${i.field}: ${i.message}`).join('; '))
  return checked.machine
}

function line(title: string, r: ExpectationResult): string {
  const parts = [r.measured === null ? null : `measured ${r.measured}`, r.note, !r.pass && r.at ? decidingText(r.at) : null].filter((p) => p !== null)
  return `${r.pass ? 'PASS' : 'FAIL'}  ${title} › ${r.text}${parts.length ? ` (${parts.join('; ')})` : ''}`
}

export function decidingText(at: NonNullable<ExpectationResult['at']>): string {
  return [`cycle ${at.cycle}`, at.lane === null ? null : `lane ${at.lane}`, at.instruction === null ? null : `instruction ${at.instruction}`].filter((p) => p !== null).join(', ')
}

export function check(args: CheckArgs, out: (line: string) => void): { scenarios: CheckedScenario[]; failed: number; total: number; preset: string | undefined } {
  const bundle = readBundle(args.file)
  // An exported suite runs on its preset, as its runs in the app do, unless --preset says otherwise.
  const preset = args.preset ?? bundle.suite?.presetId ?? undefined
  if (bundle.suite) out(`SUITE ${bundle.suite.title}${preset ? ` on preset ${preset}` : ''}`)
  const scenarios: CheckedScenario[] = []
  bundle.scenarios.forEach((s, i) => {
    const last = s.versions.length - 1
    const version = s.versions[last]
    if (!version) return
    const where = `${args.file}: scenarios.${i}.versions.${last}.content`
    const content = version.content
    const machine = machineFor(content, { ...args, preset })
    let results: ExpectationResult[] = []
    if (content.expectations.length) {
      // The suite workers' own check (server/services/suite-check.ts): one verdict for one bundle.
      const checked = checkScenario(content, machine)
      if (!checked.ok) {
        const p = checked.problems[0]
        throw new UsageError(`${where}.initialData.${p?.index ?? 0}: ${p?.message ?? 'the initial data does not fit the program'}`)
      }
      results = checked.check.results
    }
    scenarios.push({ title: content.title, version: version.number, results })
    if (!results.length) out(`NONE  ${content.title} (version ${version.number} has no expectations)`)
    for (const r of results) out(line(content.title, r))
  })
  const all = scenarios.flatMap((s) => s.results)
  return { scenarios, failed: all.filter((r) => !r.pass).length, total: all.length, preset }
}

export function main(argv: string[]): number {
  try {
    const args = parseCheckArgs(argv)
    const result = check(args, (l) => process.stdout.write(`${l}\n`))
    if (args.junit) {
      try {
        writeFileSync(args.junit, toJunit(result.scenarios))
      } catch (e) {
        throw new UsageError(`cannot write --junit ${args.junit}: ${(e as NodeJS.ErrnoException).code ?? (e as Error).message}`)
      }
    }
    const machineNote = result.preset || args.sets.length ? ` on ${[result.preset ? `preset ${result.preset}` : null, ...args.sets.map((s) => s.text)].filter(Boolean).join(', ')}` : ''
    process.stdout.write(`${result.total} expectations in ${result.scenarios.length} scenarios${machineNote}: ${result.total - result.failed} passed, ${result.failed} failed (model estimates, not sign-off for silicon)\n`)
    return result.failed > 0 ? 1 : 0
  } catch (e) {
    process.stderr.write(`chimeline check: ${(e as Error).message.split('\n')[0]}\n`)
    return e instanceof UsageError ? 2 : 1
  }
}

// Run directly (`tsx server/cli/check.ts ...`); the bin launcher imports main instead.
if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) process.exitCode = main(process.argv.slice(2))
