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
import { writeFileSync } from 'node:fs'
import { sweepDefinitionSchema, SWEEP_HARD_MAX_POINTS, type SweepDefinition } from '../../shared/schemas/sweep'
import { resolveSweep, type ResolvedSweep } from '../../shared/sweep/resolve'
import { toSweepCsv } from '../../shared/sweep/csv'
import { ESTIMATE_NOTE } from '../../shared/sim/trace/summary'
import { machineInputFromArgs, readText, UsageError } from './simArgs'
import { parseSweepArgs, type SweepArgs } from './sweepArgs'
import { runOnThreads } from './sweepThreads'

/** A program or model error: exit code 1. */
class SweepFailure extends Error {}

/** The base machine: preset, then --config, then each --set (validated with the swept fields by resolveSweep). */
const baseMachine = (args: SweepArgs): Record<string, unknown> => machineInputFromArgs(args)

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
