/**
 * The run summary a saved version keeps (cycles, flops per cycle, stalls by
 * reason), computed on the server with the shared pipeline, so the history's
 * numbers all come from one engine. Initial data entries are written over the
 * program's `.data` before it runs.
 *
 * Limits are tighter than the Bench's, since a save waits for the run:
 * SAVE_RUN_LIMITS below. A program over them is saved all the same, with a
 * 'failed' summary that says which limit it hit.
 *
 * This module is pure work with no I/O: the server runs it in a worker thread
 * (run-worker.ts through run-pool.ts), never on the thread that answers requests.
 */
import type { InitialDataEntry, RunSummary, ScenarioContent } from '../../shared/schemas/scenario'
import { assemble } from '../../shared/sim/isa/assembler'
import type { Program } from '../../shared/sim/isa/types'
import { runPipeline } from '../../shared/sim/run'

export const SAVE_RUN_LIMITS = { steps: 1_000_000, cycles: 1_000_000 } as const

export type DataProblem = { index: number; message: string }

/** What one run gives back across the thread boundary: a summary, or the initial data's problems (a 400). */
export type RunOutcome = { ok: true; run: RunSummary } | { ok: false; problems: DataProblem[] }

const INT_RANGE: Record<string, [bigint, bigint, number]> = {
  i8: [-(1n << 7n), (1n << 7n) - 1n, 1], i16: [-(1n << 15n), (1n << 15n) - 1n, 2], i32: [-(1n << 31n), (1n << 31n) - 1n, 4], i64: [-(1n << 63n), (1n << 63n) - 1n, 8],
  u8: [0n, (1n << 8n) - 1n, 1], u16: [0n, (1n << 16n) - 1n, 2], u32: [0n, (1n << 32n) - 1n, 4], u64: [0n, (1n << 64n) - 1n, 8],
}

/** Little-endian bytes of one value, or a message saying why it does not fit. */
function encodeValue(type: InitialDataEntry['type'], text: string): Uint8Array | string {
  if (type === 'f32' || type === 'f64') {
    const v = Number(text)
    if (Number.isNaN(v) && !/^[+-]?nan$/i.test(text)) return `"${text}" is not a number`
    const bytes = new Uint8Array(type === 'f32' ? 4 : 8)
    const view = new DataView(bytes.buffer)
    if (type === 'f32') view.setFloat32(0, v, true)
    else view.setFloat64(0, v, true)
    return bytes
  }
  const [min, max, width] = INT_RANGE[type] as [bigint, bigint, number]
  if (!/^[+-]?(\d+|0x[0-9a-f]+)$/i.test(text)) return `"${text}" is not an integer`
  const negative = text.startsWith('-')
  const magnitude = BigInt(text.replace(/^[+-]/, ''))
  const v = negative ? -magnitude : magnitude
  if (v < min || v > max) return `${text} is outside the range of ${type} (${min}..${max})`
  const bytes = new Uint8Array(width)
  let u = BigInt.asUintN(width * 8, v)
  for (let i = 0; i < width; i++) {
    bytes[i] = Number(u & 0xffn)
    u >>= 8n
  }
  return bytes
}

/** Writes the entries over a copy of the program's data; returns the problems instead when any. */
export function applyInitialData(program: Program, entries: InitialDataEntry[]): { ok: true; program: Program } | { ok: false; problems: DataProblem[] } {
  const data = new Uint8Array(program.data)
  const problems: DataProblem[] = []
  entries.forEach((entry, index) => {
    const label = program.dataLabels.find((l) => l.name === entry.label)
    if (!label) {
      problems.push({ index, message: `no data label "${entry.label}" in the program's .data` })
      return
    }
    const chunks = entry.values.map((v) => encodeValue(entry.type, v))
    const bad = chunks.findIndex((c) => typeof c === 'string')
    if (bad >= 0) {
      problems.push({ index, message: `value ${bad + 1}: ${chunks[bad] as string}` })
      return
    }
    const total = (chunks as Uint8Array[]).reduce((n, c) => n + c.length, 0)
    if (total > label.size) {
      problems.push({ index, message: `${entry.values.length} ${entry.type} values take ${total} bytes; "${entry.label}" has ${label.size}` })
      return
    }
    let at = label.address - program.dataBase
    for (const c of chunks as Uint8Array[]) {
      data.set(c, at)
      at += c.length
    }
  })
  return problems.length ? { ok: false, problems } : { ok: true, program: { ...program, data } }
}

/**
 * Runs a scenario's content once and keeps the summary. A program that does
 * not assemble or run still gets a summary (it may be saved half-written);
 * initial data that names a missing label or does not fit comes back as
 * problems, since that is a mistake in the request itself (run-pool.ts makes
 * it a 400).
 */
export function computeRunSummary(content: Pick<ScenarioContent, 'program' | 'machine' | 'initialData'>): RunOutcome {
  const asm = assemble(content.program)
  if (!asm.ok) {
    const first = asm.errors[0]
    const where = first ? `line ${first.line}, column ${first.column}: ` : ''
    return { ok: true, run: { status: 'failed', stage: 'assemble', code: first?.code ?? 'assemble', message: `${where}${first?.message ?? 'the program does not assemble'}` } }
  }
  const applied = applyInitialData(asm.program, content.initialData)
  if (!applied.ok) return { ok: false, problems: applied.problems }
  const r = runPipeline(
    { program: applied.program, machine: content.machine },
    { execute: { stepLimit: SAVE_RUN_LIMITS.steps }, timing: { cycleLimit: SAVE_RUN_LIMITS.cycles, recordUsage: false } },
  )
  if (!r.ok) return { ok: true, run: { status: 'failed', stage: r.error.stage, code: r.error.code, message: r.error.message } }
  const m = r.trace.metrics
  return { ok: true, run: { status: 'ok', cycles: m.cycles, flopsPerCycle: m.flopsPerCycle, stallCycles: { ...m.stallCycles } } }
}
