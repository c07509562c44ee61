/**
 * The version diff (versionDiffSchema, computed by the server) laid out for
 * reading: program lines with old and new line numbers and long unchanged
 * runs folded to a few lines of context, machine and other fields as
 * "before -> after" text, and the run's metrics side by side with the change.
 *
 * @example
 *   programRows([{ op: 'delete', oldStart: 2, newStart: null, lines: ['vadd.vv v1, v2, v3'] }])
 *   // [{ kind: 'delete', oldNo: 2, newNo: null, text: 'vadd.vv v1, v2, v3' }]
 */
import { STALL_REASONS } from '@shared/sim/trace/types'
import type { LineChange, RunSummary } from '@shared/schemas/scenario'
import { machineFieldLabel } from '@/lib/bench/machineFields'

export type DiffRow =
  | { kind: 'equal' | 'insert' | 'delete'; oldNo: number | null; newNo: number | null; text: string }
  | { kind: 'fold'; count: number }

export interface ProgramRowsOptions {
  /** Unchanged lines kept on each side of a change (default 3). */
  context?: number
}

/** One row per line; runs of unchanged lines longer than twice the context are folded. */
export function programRows(changes: LineChange[], options: ProgramRowsOptions = {}): DiffRow[] {
  const context = options.context ?? 3
  const rows: DiffRow[] = []
  changes.forEach((c, ci) => {
    const lineRows = c.lines.map((text, i): DiffRow => ({
      kind: c.op,
      oldNo: c.op === 'insert' || c.oldStart === null ? null : c.oldStart + i,
      newNo: c.op === 'delete' || c.newStart === null ? null : c.newStart + i,
      text,
    }))
    if (c.op !== 'equal') {
      rows.push(...lineRows)
      return
    }
    const head = ci === 0 ? 0 : context
    const tail = ci === changes.length - 1 ? 0 : context
    if (lineRows.length <= head + tail + 1) {
      rows.push(...lineRows)
      return
    }
    rows.push(...lineRows.slice(0, head), { kind: 'fold', count: lineRows.length - head - tail }, ...lineRows.slice(lineRows.length - tail))
  })
  return rows
}

/** The labels the Save as form and the Bench give a scenario's own fields. */
const CONTENT_LABELS: Record<string, string> = {
  title: 'Title',
  description: 'Description',
  tags: 'Tags',
  initialData: 'Named data',
  view: 'View (cursor, window, selection)',
  walkthroughs: 'Walkthroughs',
}

/** A changed field as the forms name it: machine fields by the machine form's label, the rest by the scenario form's. */
export function diffFieldLabel(section: 'machine' | 'fields', field: string): string {
  return section === 'machine' ? machineFieldLabel(field) : (CONTENT_LABELS[field] ?? field)
}

/** A field value as short text: numbers and strings as they are, the rest as compact JSON. */
export function valueText(v: unknown): string {
  if (v === undefined) return '(none)'
  if (v === null) return '(not set)'
  if (typeof v === 'string') return v === '' ? '(empty)' : v
  if (typeof v === 'number' || typeof v === 'boolean') return String(v)
  return JSON.stringify(v)
}

export interface MetricRow {
  label: string
  before: string
  after: string
  /** Signed change, e.g. "+12" or "−3.5%"; '' when unchanged or not comparable. */
  change: string
}

function num(v: number, digits: number): string {
  return Number.isInteger(v) ? String(v) : v.toFixed(digits)
}

function change(before: number, after: number, digits: number): string {
  const d = after - before
  if (d === 0) return ''
  const sign = d > 0 ? '+' : '−'
  return `${sign}${num(Math.abs(d), digits)}`
}

/** Cycles, flops per cycle and every stall reason that is non-zero on either side. */
export function metricRows(before: RunSummary, after: RunSummary): MetricRow[] {
  if (before.status !== 'ok' || after.status !== 'ok') {
    const text = (r: RunSummary) => (r.status === 'ok' ? `${r.cycles} cycles` : `did not run (${r.stage}): ${r.message}`)
    return [{ label: 'run', before: text(before), after: text(after), change: '' }]
  }
  const rows: MetricRow[] = [
    { label: 'cycles', before: String(before.cycles), after: String(after.cycles), change: change(before.cycles, after.cycles, 0) },
    {
      label: 'flops per cycle',
      before: num(before.flopsPerCycle, 3),
      after: num(after.flopsPerCycle, 3),
      change: change(before.flopsPerCycle, after.flopsPerCycle, 3),
    },
  ]
  for (const reason of STALL_REASONS) {
    const b = before.stallCycles[reason]
    const a = after.stallCycles[reason]
    if (a === 0 && b === 0) continue
    rows.push({ label: `stall cycles: ${reason}`, before: String(b), after: String(a), change: change(b, a, 0) })
  }
  return rows
}
