/**
 * `chimeline report BUNDLE.json [--preset NAME]... [--format md|csv] [--out FILE]`
 *
 * The characterisation report of a bundle's scenarios (the newest version of
 * each), offline: each scenario runs on each preset given (two give the ratio
 * per kernel), or on the suite's preset, or on its own machine, with the
 * suite workers' check (suite-runner.ts), and the table is the app's
 * (shared/characterise/report.ts) as Markdown or CSV. Exit 0, 1 when a
 * kernel's run failed, 2 on bad input.
 */
import { writeFileSync } from 'node:fs'
import { pathToFileURL } from 'node:url'
import { parseArgs } from 'node:util'
import { buildReport, reportCsv, reportMarkdown, type ReportMachine } from '../../shared/characterise/report'
import { PRESETS } from '../../shared/sim/presets'
import { runSuiteScenarios } from '../services/suite-runner'
import { readBundle } from './check'
import { oneFile, UsageError } from './simArgs'

export const REPORT_USAGE = 'usage: chimeline report BUNDLE.json [--preset NAME]... [--format md|csv] [--out FILE]'
/** Machines one report compares (the table grows by eight columns each). */
export const REPORT_MAX_PRESETS = 4

function presetId(name: string): string {
  const key = name.toLowerCase()
  const p = PRESETS.find((x) => x.id === key || x.name.toLowerCase() === key)
  if (!p) throw new UsageError(`unknown preset "${name}" (presets: ${PRESETS.map((x) => x.id).join(', ')})`)
  return p.id
}

export function main(argv: string[]): number {
  try {
    let parsed
    try {
      parsed = parseArgs({ args: argv, allowPositionals: true, strict: true, options: { preset: { type: 'string', multiple: true }, format: { type: 'string' }, out: { type: 'string' }, help: { type: 'boolean', short: 'h' } } })
    } catch (e) {
      throw new UsageError(`${(e as Error).message.split('\n')[0]}; ${REPORT_USAGE}`)
    }
    if (parsed.values.help) throw new UsageError(REPORT_USAGE)
    const file = oneFile(parsed.positionals, 'bundle', REPORT_USAGE)
    const format = parsed.values.format ?? 'md'
    if (format !== 'md' && format !== 'csv') throw new UsageError(`--format is md or csv, got "${format}"`)
    const presets = (parsed.values.preset ?? []).map(presetId)
    if (presets.length > REPORT_MAX_PRESETS) throw new UsageError(`at most ${REPORT_MAX_PRESETS} --preset, got ${presets.length}`)
    const bundle = readBundle(file)
    const scenarios = bundle.scenarios.map((s, i) => {
      const v = s.versions[s.versions.length - 1]
      return { id: `scenario-${i + 1}`, found: v ? { title: v.content.title, version: v.number, content: v.content } : null }
    })
    const runs: (string | null)[] = presets.length ? presets : [bundle.suite?.presetId ?? null]
    const machines: ReportMachine[] = runs.map((p) => ({ label: p ? (PRESETS.find((x) => x.id === p)?.name ?? p) : 'own machines', entries: runSuiteScenarios(scenarios, p).entries }))
    const report = buildReport(machines)
    const text = format === 'csv' ? reportCsv(report) : `${reportMarkdown(report)}\nModel estimates, not sign-off for silicon.\n`
    if (parsed.values.out) {
      try {
        writeFileSync(parsed.values.out, text)
      } catch (e) {
        throw new UsageError(`cannot write --out ${parsed.values.out}: ${(e as NodeJS.ErrnoException).code ?? (e as Error).message}`)
      }
    } else process.stdout.write(text)
    const failed = machines.flatMap((m) => m.entries).filter((e) => !e.figures)
    for (const e of failed) process.stderr.write(`chimeline report: ${e.title}: ${e.error?.stage ?? 'run'}: ${e.error?.message ?? 'failed'}\n`)
    return failed.length ? 1 : 0
  } catch (e) {
    process.stderr.write(`chimeline report: ${(e as Error).message.split('\n')[0]}\n`)
    return e instanceof UsageError ? 2 : 1
  }
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) process.exitCode = main(process.argv.slice(2))
