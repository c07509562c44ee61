/**
 * The CSV form of a sweep: the swept names in the order given, the figure
 * columns (SWEEP_FIGURE_COLUMNS), then status and error; one row per point
 * (RFC 4180 quoting, CRLF line ends as the trace CSV).
 */
import { SWEEP_FIGURE_COLUMNS, type SweepPointResult } from '../schemas/sweep'
import { figureColumn } from './figures'

const quote = (s: string) => (/[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s)

export function sweepCsvHeader(names: readonly string[]): string {
  return [...names, ...SWEEP_FIGURE_COLUMNS, 'status', 'error'].map(quote).join(',')
}

export function sweepCsvRow(p: SweepPointResult): string {
  const figures = SWEEP_FIGURE_COLUMNS.map((c) => (p.figures ? String(figureColumn(p.figures, c)) : ''))
  const error = p.error ? `${p.error.stage}: ${p.error.message}` : ''
  return [...p.values.map(String), ...figures, p.status, error].map(quote).join(',')
}

export function toSweepCsv(names: readonly string[], points: readonly SweepPointResult[]): string {
  return [sweepCsvHeader(names), ...points.map(sweepCsvRow)].map((l) => l + '\r\n').join('')
}
