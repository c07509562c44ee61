/**
 * `npm run -s sim:exec -- FILE.s [--vlen 512] [--dump LABEL:COUNT:TYPE]... [--step-limit N]`
 *
 * Assembles and executes a program functionally (no timing) and prints one
 * JSON object: how it ended, the vl history, what it printed and the dumped
 * data. Errors: one line on stderr; exit code 2 for a mistake in the command
 * line, 1 for an assembly or execution error (as FILE:LINE:COLUMN: message).
 */
import { readFileSync } from 'node:fs'
import { pathToFileURL } from 'node:url'
import { parseArgs } from 'node:util'
import { assemble } from '../../shared/sim/isa/assembler'
import { type DumpRequest, type DumpValue, parseDumpRequest, readDump } from '../../shared/sim/exec/dump'
import { execute } from '../../shared/sim/exec/execute'
import { isValidVlen } from '../../shared/sim/exec/vtype'

export interface CliResult {
  code: 0 | 1 | 2
  stdout: string
  stderr: string
}

const USAGE = 'usage: sim:exec FILE.s [--vlen 512] [--dump LABEL:COUNT:TYPE]... [--step-limit N]'
const usage = (message: string): CliResult => ({ code: 2, stdout: '', stderr: `sim:exec: ${message}\n` })

/** Printed bytes as text when they are printable UTF-8, otherwise as hex. */
function describeOutput(bytes: Uint8Array): { output: string } | { outputHex: string } {
  try {
    const text = new TextDecoder('utf-8', { fatal: true }).decode(bytes)
    const control = Array.from(text).some((ch) => {
      const c = ch.charCodeAt(0)
      return (c < 0x20 && ch !== '\n' && ch !== '\t') || c === 0x7f
    })
    if (!control) return { output: text }
  } catch {
    // not UTF-8: fall through to hex
  }
  return { outputHex: Array.from(bytes, (b) => b.toString(16).padStart(2, '0')).join('') }
}

export function runExecCli(argv: string[]): CliResult {
  let parsed
  try {
    parsed = parseArgs({
      args: argv,
      allowPositionals: true,
      options: { vlen: { type: 'string' }, dump: { type: 'string', multiple: true }, 'step-limit': { type: 'string' } },
    })
  } catch (e) {
    return usage((e as Error).message.split('\n')[0]!)
  }
  const { values, positionals } = parsed
  if (positionals.length !== 1) return usage(positionals.length === 0 ? `missing FILE.s (${USAGE})` : `one FILE.s expected, got ${positionals.length}`)
  const file = positionals[0]!
  const vlen = values.vlen === undefined ? 512 : Number(values.vlen)
  if (!isValidVlen(vlen)) return usage(`--vlen ${values.vlen}: must be a power of two from 64 to 65536`)
  const stepLimit = values['step-limit'] === undefined ? undefined : Number(values['step-limit'])
  if (stepLimit !== undefined && !(Number.isInteger(stepLimit) && stepLimit > 0)) return usage(`--step-limit ${values['step-limit']}: must be a positive integer`)
  const dumps: DumpRequest[] = []
  for (const d of values.dump ?? []) {
    const r = parseDumpRequest(d)
    if (!r.ok) return usage(r.message)
    dumps.push(r.request)
  }
  let text: string
  try {
    text = readFileSync(file, 'utf8')
  } catch (e) {
    return usage(`cannot read ${file}: ${(e as NodeJS.ErrnoException).code ?? (e as Error).message}`)
  }

  const asm = assemble(text)
  if (!asm.ok) {
    const e = asm.errors[0]!
    return { code: 1, stdout: '', stderr: `${file}:${e.line}:${e.column}: ${e.message}\n` }
  }
  const run = execute(asm.program, { vlen, recordStream: false, ...(stepLimit ? { stepLimit } : {}) })
  if (!run.ok) return { code: 1, stdout: '', stderr: `${file}:${run.error.line}:${run.error.column}: ${run.error.message}\n` }
  const dumped: Record<string, DumpValue[]> = {}
  for (const d of dumps) {
    const r = readDump(asm.program, run.memory, d)
    if (!r.ok) return usage(r.message)
    dumped[`${d.label}:${d.type}`] = r.values
  }
  const summary = {
    vlen,
    ended: run.ended,
    exitCode: run.exitCode,
    steps: run.steps,
    vlHistory: run.vlHistory,
    ...describeOutput(run.output),
    dumps: dumped,
  }
  return { code: 0, stdout: `${JSON.stringify(summary)}\n`, stderr: '' }
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  const r = runExecCli(process.argv.slice(2))
  process.stdout.write(r.stdout)
  process.stderr.write(r.stderr)
  process.exitCode = r.code
}
