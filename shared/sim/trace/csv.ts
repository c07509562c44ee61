/**
 * CSV export: one row per (dynamic instruction, lane), with a header row.
 * Fields follow RFC 4180: comma-separated, CRLF line ends, a field with a
 * comma, quote or line break in double quotes, quotes doubled. A null cycle
 * (a lane with no active element) is an empty field.
 *
 * @example
 *   toCsv(trace).split('\r\n')[0] // 'index,text,vl,sew,lmul,lane,elements,beats,readStart,...'
 */
import { LANE_FIELDS, LANE_FIELD_COUNT, NO_CYCLE, type TimingTrace } from './types'

export const CSV_COLUMNS = ['index', 'text', 'vl', 'sew', 'lmul', 'lane', ...LANE_FIELDS] as const

function field(v: string | number): string {
  const s = String(v)
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s
}

export function toCsv(trace: TimingTrace): string {
  const rows: string[] = [CSV_COLUMNS.join(',')]
  const t = trace.laneTimes
  trace.instructions.forEach((ins, i) => {
    const head = `${ins.index},${field(ins.text)},${ins.vl},${ins.sew},${ins.lmul}`
    for (let lane = 0; lane < trace.laneCount; lane++) {
      const base = (i * trace.laneCount + lane) * LANE_FIELD_COUNT
      const cells: string[] = []
      for (let k = 0; k < LANE_FIELD_COUNT; k++) {
        const v = t[base + k] ?? NO_CYCLE
        // elements and beats are counts (never null); the six cycle fields may be.
        cells.push(k >= 2 && v === NO_CYCLE ? '' : String(v))
      }
      rows.push(`${head},${lane},${cells.join(',')}`)
    }
  })
  return rows.join('\r\n') + '\r\n'
}
