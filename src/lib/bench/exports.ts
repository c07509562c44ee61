/**
 * The Bench's file exports other than the chart picture: the trace as CSV
 * (one row per instruction and lane), as JSON (the CLI's summary form plus the
 * machine it ran on), as an IEEE 1364-2005 value change dump, and the program
 * as a .s file. The formats are the shared exporters of shared/sim/trace.
 *
 * @example
 *   const f = exportFile('csv', { trace, source, name: 'saxpy' })
 *   f.name // 'saxpy.csv'
 */
import { toCsv } from '@shared/sim/trace/csv'
import { summarize } from '@shared/sim/trace/summary'
import type { TimingError, TimingTrace } from '@shared/sim/trace/types'
import { toVcd } from '@shared/sim/trace/vcd'

export const EXPORT_FORMATS = ['csv', 'json', 'vcd', 's'] as const
export type ExportFormat = (typeof EXPORT_FORMATS)[number]

export interface ExportInput {
  trace: TimingTrace | null
  source: string
  /** Base of the file name, e.g. the example's id. */
  name: string
  /** The error of a run that was cut short: the JSON says the trace is partial. */
  error?: TimingError
  date?: Date
}

export interface ExportFile {
  name: string
  type: string
  text: string
}

/** A safe file-name base: letters, digits, dash and underscore. */
export function fileBase(name: string): string {
  return name.replace(/[^A-Za-z0-9_-]+/g, '-').replace(/^-+|-+$/g, '') || 'chimeline'
}

/**
 * What an export is called: files after the scenario's title (lower case,
 * words joined by dashes); without a scenario, after the example the program
 * is to the character (`example`: pass null once the text was edited, see
 * exampleOf); else "untitled". The picture's heading keeps the title as
 * written.
 *
 * @example
 *   exportNames('Ragged vl=20') // { file: 'ragged-vl-20', heading: 'Chimeline: Ragged vl=20' }
 *   exportNames(null, { id: 'dot', title: 'Dot product' }) // { file: 'dot', heading: 'Chimeline: Dot product' }
 */
export function exportNames(title: string | null, example: { id: string; title: string } | null = null): { file: string; heading: string } {
  const t = title?.trim() ?? ''
  const file = t
    .toLowerCase()
    .replace(/[^\p{L}\p{N}_-]+/gu, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 80)
  if (file) return { file, heading: `Chimeline: ${t}` }
  if (example) return { file: fileBase(example.id), heading: `Chimeline: ${example.title}` }
  return { file: 'untitled', heading: 'Chimeline: untitled' }
}

export function exportFile(format: ExportFormat, input: ExportInput): ExportFile {
  const base = fileBase(input.name)
  if (format === 's') return { name: `${base}.s`, type: 'text/plain', text: input.source.endsWith('\n') ? input.source : `${input.source}\n` }
  const trace = input.trace
  if (!trace) throw new Error(`nothing to export as ${format}: run the program first`)
  if (format === 'csv') return { name: `${base}.csv`, type: 'text/csv', text: toCsv(trace) }
  if (format === 'vcd') return { name: `${base}.vcd`, type: 'text/plain', text: toVcd(trace, input.date ? { date: input.date } : {}) }
  const summary = summarize(trace, input.error ? { error: input.error } : {})
  return { name: `${base}.json`, type: 'application/json', text: `${JSON.stringify({ machine: trace.machine, ...summary }, null, 2)}\n` }
}
