/**
 * `npm run -s sim -- FILE.s [--preset NAME] [--config FILE.json] [--set path=value]...
 *   [--format summary|json|csv|vcd] [--out FILE] [--fp-order element|machine] [--dump LABEL:COUNT:TYPE]...`
 *
 * Assembles, executes and times a program with the shared pipeline
 * (shared/sim/run.ts) and prints the trace in the chosen form. The machine is
 * the preset (default: the handbook defaults), then the --config file merged
 * over it, then each --set. `--fp-order machine` sums vfredusum in the order
 * the machine's lanes and accumulators imply instead of element order (only
 * the rounding differs); `--dump` adds data values after the run to the
 * summary, as `sim:exec` does, so that the difference can be seen. Errors: one line on stderr; exit code 2 for a
 * mistake in the command line (options, files, machine fields), 1 for a
 * program or model error (assembly, execution, a cycle or trace limit).
 */
import { writeFileSync } from 'node:fs'
import { checkMachine } from '../../shared/schemas/machine'
import { readDump, type DumpRequest, type DumpValue } from '../../shared/sim/exec/dump'
import type { Program } from '../../shared/sim/isa/types'
import { runPipeline, type RunError } from '../../shared/sim/run'
import { toCsv } from '../../shared/sim/trace/csv'
import { traceToJson } from '../../shared/sim/trace/schema'
import { summarize } from '../../shared/sim/trace/summary'
import type { TimingTrace } from '../../shared/sim/trace/types'
import { toVcd } from '../../shared/sim/trace/vcd'
import { machineInputFromArgs, parseSimArgs, readText, UsageError, type Format, type SimArgs } from './simArgs'
import { appVersion as version } from '../version'

/** A program or model error: exit code 1. */
class RunFailure extends Error {}

/** The machine of the command line, validated by the shared machine schema. */
export function machineFromArgs(args: SimArgs) {
  const machine = machineInputFromArgs(args)
  const checked = checkMachine(machine)
  if (!checked.ok) throw new UsageError(`machine: ${checked.issues.map((i) => `${i.field}: ${i.message}`).join('; ')}`)
  return checked.machine
}

function describe(error: RunError): string {
  const d = error.diagnostics?.[0]
  const more = error.diagnostics && error.diagnostics.length > 1 ? ` (and ${error.diagnostics.length - 1} more)` : ''
  return d ? `line ${d.line}, column ${d.column}: ${d.message}${more}` : error.message
}

/** The `--dump` values, keyed `label:type` as sim:exec prints them. */
function dumpValues(program: Program, memory: Uint8Array, dumps: DumpRequest[]): Record<string, DumpValue[]> {
  const out: Record<string, DumpValue[]> = {}
  for (const d of dumps) {
    const r = readDump(program, memory, d)
    if (!r.ok) throw new UsageError(r.message)
    out[`${d.label}:${d.type}`] = r.values
  }
  return out
}

export function format(trace: TimingTrace, fmt: Format, cutShort?: RunError, dumps?: Record<string, DumpValue[]>): string {
  switch (fmt) {
    case 'summary': {
      const summary = summarize(trace, cutShort ? { error: { code: cutShort.code, message: cutShort.message } } : {})
      return JSON.stringify(dumps ? { ...summary, dumps } : summary) + '\n'
    }
    case 'json':
      return JSON.stringify(traceToJson(trace)) + '\n'
    case 'csv':
      return toCsv(trace)
    case 'vcd':
      return toVcd(trace, { version })
  }
}

export function main(argv: string[]): number {
  let args: SimArgs | undefined
  try {
    args = parseSimArgs(argv)
    const machine = machineFromArgs(args)
    const source = readText(args.file, 'program')
    const result = runPipeline({ program: source, machine }, { fpReductionOrder: args.fpOrder })
    // A run cut short by a limit still writes its partial trace, then fails.
    if (result.trace) {
      const dumps = result.ok && args.dumps.length > 0 ? dumpValues(result.program, result.functional.memory, args.dumps) : undefined
      const text = format(result.trace, args.format, result.ok ? undefined : result.error, dumps)
      if (args.out) writeFileSync(args.out, text)
      else process.stdout.write(text)
    }
    if (!result.ok) {
      const partial = result.trace ? ' (the trace written is partial)' : ''
      throw new RunFailure(`${args.file}: ${result.error.stage}: ${describe(result.error)}${partial}`)
    }
    return 0
  } catch (e) {
    const message = (e as Error).message.split('\n')[0]
    process.stderr.write(`sim: ${message}\n`)
    return e instanceof UsageError ? 2 : 1
  }
}

process.exitCode = main(process.argv.slice(2))
