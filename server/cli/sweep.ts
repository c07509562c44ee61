/**
 * `npm run -s sweep -- FILE.s [--preset NAME] [--config FILE.json] [--set PATH=VALUE]...
 *   --vary PATH=SPEC [--vary PATH=SPEC]... [--format csv|json] [--out FILE] [--workers N]`
 *
 * Runs a program over a grid of swept machine fields and program symbols
 * (shared/sweep) and prints one row per point, the first --vary varying
 * slowest. The base machine is built as for `sim` (preset, --config, --set).
 * Points run on N worker threads (default: one per core) in chunks.
 *
 * Exit codes: 2 for a usage error (options, files, unknown parameters, values
 * out of range: each named with its value and range); 1 when the sweep was
 * stopped by a limit (the points done are written) or when every point failed
 * (a program that does not assemble, say); 0 otherwise, failed points included
 * as rows with their stage and message.
 */
import { createRequire } from 'node:module'
import { readFileSync, writeFileSync } from 'node:fs'
import { pathToFileURL } from 'node:url'
import { Piscina } from 'piscina'
import { defaultMachine } from '../../shared/schemas/machine'
import { sweepDefinitionSchema, SWEEP_HARD_MAX_POINTS, type SweepDefinition, type SweepPointResult } from '../../shared/schemas/sweep'
import { PRESETS } from '../../shared/sim/presets'
import { resolveSweep, type ResolvedSweep } from '../../shared/sweep/resolve'
import { plannedPoints, pointsLimitMessage, timeLimitMessage } from '../../shared/sweep/runSweep'
import { toSweepCsv } from '../../shared/sweep/csv'
import { ESTIMATE_NOTE } from '../../shared/sim/trace/summary'
import { applySets, mergeMachine, UsageError } from './simArgs'
import { parseSweepArgs, type SweepArgs } from './sweepArgs'
import type { SweepChunkTask } from './sweepWorker'

/** A program or model error: exit code 1. */
class SweepFailure extends Error {}

function readText(path: string, what: string): string {
  try {
    return readFileSync(path, 'utf8')
  } catch (e) {
    throw new UsageError(`cannot read ${what} ${path}: ${(e as NodeJS.ErrnoException).code ?? (e as Error).message}`)
  }
}

/** The base machine: preset, then --config, then each --set (validated with the swept fields by resolveSweep). */
function baseMachine(args: SweepArgs): Record<string, unknown> {
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

export function definitionFromArgs(args: SweepArgs): { definition: SweepDefinition; sweep: ResolvedSweep } {
  const parsed = sweepDefinitionSchema.safeParse({
    program: readText(args.file, 'program'),
    machine: baseMachine(args),
    parameters: args.vary,
    limits: {
      maxPoints: args.maxPoints ?? SWEEP_HARD_MAX_POINTS,
      ...(args.cycleLimit ? { cycleLimit: args.cycleLimit } : {}),
      ...(args.timeLimitMs ? { timeLimitMs: args.timeLimitMs } : {}),
    },
  })
  if (!parsed.success) throw new UsageError(parsed.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('; '))
  const resolved = resolveSweep(parsed.data)
  if (!resolved.ok) throw new UsageError(resolved.issues.map((i) => i.message).join('; '))
  return { definition: parsed.data, sweep: resolved.sweep }
}

/** Point indexes in chunks dealt round-robin, so that the threads get similar mixes of a grid. */
function chunks(count: number, workers: number): number[][] {
  const size = Math.max(1, Math.min(32, Math.ceil(count / (workers * 8))))
  const out: number[][] = []
  for (let start = 0; start < count; start += size) out.push(Array.from({ length: Math.min(size, count - start) }, (_, k) => start + k))
  return out
}

const tsxLoader = pathToFileURL(createRequire(import.meta.url).resolve('tsx')).href

export async function runOnThreads(definition: SweepDefinition, sweep: ResolvedSweep, workers: number): Promise<{ points: SweepPointResult[]; stopped: string | null }> {
  const planned = plannedPoints(sweep)
  const pool = new Piscina<SweepChunkTask, SweepPointResult[]>({
    filename: new URL('./sweepWorker.ts', import.meta.url).href,
    minThreads: Math.min(workers, planned),
    maxThreads: Math.min(workers, planned),
    execArgv: ['--import', tsxLoader],
  })
  const deadline = Date.now() + sweep.limits.timeLimitMs
  try {
    const parts = await Promise.all(chunks(planned, workers).map((indexes) => pool.run({ definition, indexes, deadline })))
    const points = parts.flat().sort((a, b) => a.index - b.index)
    const stopped = points.length < planned ? timeLimitMessage(sweep, points.length) : pointsLimitMessage(sweep)
    return { points, stopped }
  } finally {
    await pool.destroy()
  }
}

export async function main(argv: string[]): Promise<number> {
  try {
    const args = parseSweepArgs(argv)
    const { definition, sweep } = definitionFromArgs(args)
    const { points, stopped } = await runOnThreads(definition, sweep, args.workers)
    const names = sweep.parameters.map((p) => p.path)
    const text =
      args.format === 'csv'
        ? toSweepCsv(names, points)
        : JSON.stringify({ parameters: sweep.parameters, count: sweep.count, points, stopped, note: ESTIMATE_NOTE }) + '\n'
    if (args.out) writeFileSync(args.out, text)
    else process.stdout.write(text)
    const failed = points.filter((p) => p.status === 'failed')
    if (stopped) throw new SweepFailure(stopped)
    if (points.length > 0 && failed.length === points.length) {
      const e = failed[0]?.error
      throw new SweepFailure(`every point failed; the first at ${e?.stage}: ${e?.message}`)
    }
    if (failed.length > 0) process.stderr.write(`sweep: ${failed.length} of ${points.length} points failed (status and error columns)\n`)
    return 0
  } catch (e) {
    process.stderr.write(`sweep: ${(e as Error).message.split('\n')[0]}\n`)
    return e instanceof UsageError ? 2 : 1
  }
}

process.exitCode = await main(process.argv.slice(2))
