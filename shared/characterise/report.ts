/**
 * The characterisation report: one row per kernel, one group of columns per
 * machine (a suite run), the geometric mean of the fraction of peak per
 * machine, and for two machines the ratio per kernel. The app's table, its
 * CSV and the `chimeline report` command all come from here.
 */
import type { KernelFigures, SuiteRunEntry } from '../schemas/suite'

export interface ReportMachine {
  /** What the column group is called: the preset's name, or "own machines". */
  label: string
  entries: SuiteRunEntry[]
}

export interface ReportRow {
  scenarioId: string
  title: string
  /** Per machine, the figures (null: the run failed or the kernel is not in that run). */
  cells: (KernelFigures | null)[]
  /** With two machines: cycles on the first over cycles on the second (> 1: the second is faster). */
  ratio: number | null
}

export interface Report {
  machines: string[]
  rows: ReportRow[]
  /** Per machine: geometric mean of fractionOfPeak over the kernels with floating-point work (null when none). */
  geomeanFractionOfPeak: (number | null)[]
  /** Kernels counted in each geometric mean. */
  geomeanKernels: number[]
}

/** The geometric mean of positive numbers, by logarithms (no overflow on long lists); null for none. */
export function geometricMean(values: number[]): number | null {
  const positive = values.filter((v) => v > 0 && Number.isFinite(v))
  if (!positive.length) return null
  return Math.exp(positive.reduce((s, v) => s + Math.log(v), 0) / positive.length)
}

export function buildReport(machines: ReportMachine[]): Report {
  const order: { id: string; title: string }[] = []
  const seen = new Set<string>()
  for (const m of machines) {
    for (const e of m.entries) {
      if (seen.has(e.scenarioId)) continue
      seen.add(e.scenarioId)
      order.push({ id: e.scenarioId, title: e.title })
    }
  }
  const rows: ReportRow[] = order.map(({ id, title }) => {
    const cells = machines.map((m) => m.entries.find((e) => e.scenarioId === id)?.figures ?? null)
    const [a, b] = cells
    const ratio = machines.length === 2 && a && b && b.cycles > 0 ? a.cycles / b.cycles : null
    return { scenarioId: id, title, cells, ratio }
  })
  // Kernels without FP work have a fraction of peak of 0: a geometric mean over them would be 0, so they are left out (and counted).
  const fractions = machines.map((_, i) => rows.map((r) => r.cells[i]).filter((c): c is KernelFigures => !!c && c.flops > 0).map((c) => c.fractionOfPeak))
  return {
    machines: machines.map((m) => m.label),
    rows,
    geomeanFractionOfPeak: fractions.map(geometricMean),
    geomeanKernels: fractions.map((f) => f.length),
  }
}

const stallText = (c: KernelFigures, k: number) => {
  const s = c.topStalls[k]
  return s ? `${s.reason} ${(s.share * 100).toFixed(0)}%` : ''
}

/** The figure columns per machine, as the table and the CSV show them. */
export const REPORT_COLUMNS: { key: string; label: string; value: (c: KernelFigures) => string }[] = [
  { key: 'cycles', label: 'cycles', value: (c) => String(c.cycles) },
  { key: 'flopsPerCycle', label: 'flops/cycle', value: (c) => c.flopsPerCycle.toFixed(2) },
  { key: 'fractionOfPeak', label: 'of peak', value: (c) => c.fractionOfPeak.toFixed(3) },
  { key: 'bytesPerCycle', label: 'bytes/cycle', value: (c) => c.bytesPerCycle.toFixed(1) },
  { key: 'laneBusyMean', label: 'lane busy', value: (c) => c.laneBusyMean.toFixed(2) },
  { key: 'stall1', label: 'top stall', value: (c) => stallText(c, 0) },
  { key: 'stall2', label: 'second stall', value: (c) => stallText(c, 1) },
  { key: 'bound', label: 'bound', value: (c) => c.bound },
]

/** RFC 4180: quote a field holding a comma, a quote or a line break. */
function csvField(s: string): string {
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s
}

/** CSV with CRLF line ends (RFC 4180): kernel, then each machine's columns and verdict, then the ratio. */
export function reportCsv(r: Report): string {
  const header = ['kernel', ...r.machines.flatMap((m) => [...REPORT_COLUMNS.map((c) => `${m} ${c.label}`), `${m} verdict`]), ...(r.machines.length === 2 ? ['ratio of cycles'] : [])]
  const lines = [header]
  for (const row of r.rows) {
    const cells = row.cells.flatMap((c) => (c ? [...REPORT_COLUMNS.map((col) => col.value(c)), c.verdict] : REPORT_COLUMNS.map(() => '').concat('')))
    lines.push([row.title, ...cells, ...(r.machines.length === 2 ? [row.ratio === null ? '' : row.ratio.toFixed(2)] : [])])
  }
  lines.push(['geometric mean of fraction of peak', ...r.geomeanFractionOfPeak.flatMap((g) => [...REPORT_COLUMNS.map((c) => (c.key === 'fractionOfPeak' && g !== null ? g.toFixed(3) : '')), '']), ...(r.machines.length === 2 ? [''] : [])])
  return lines.map((l) => l.map(csvField).join(',')).join('\r\n') + '\r\n'
}

/** A Markdown table (the README's figure and `chimeline report --format md`). */
export function reportMarkdown(r: Report): string {
  const cols = ['kernel', ...r.machines.flatMap((m) => [`${m}: cycles`, 'flops/cycle', 'of peak', 'bytes/cycle', 'lane busy', 'top two stalls', 'bound']), ...(r.machines.length === 2 ? ['ratio'] : [])]
  // Numbers right-aligned; the kernel, the stalls and the bound are words.
  const align = cols.map((c, i) => (i === 0 || c === 'top two stalls' || c === 'bound' ? '---' : '---:'))
  const out = [`| ${cols.join(' | ')} |`, `| ${align.join(' | ')} |`]
  for (const row of r.rows) {
    const cells = row.cells.flatMap((c) => (c ? [String(c.cycles), c.flopsPerCycle.toFixed(2), c.fractionOfPeak.toFixed(3), c.bytesPerCycle.toFixed(1), c.laneBusyMean.toFixed(2), [stallText(c, 0), stallText(c, 1)].filter(Boolean).join(', ') || 'none', c.bound] : ['failed', '', '', '', '', '', '']))
    out.push(`| ${[row.title, ...cells, ...(r.machines.length === 2 ? [row.ratio === null ? '' : row.ratio.toFixed(2)] : [])].join(' | ')} |`)
  }
  const g = r.geomeanFractionOfPeak.map((v, i) => `${r.machines[i]}: ${v === null ? 'n/a' : v.toFixed(3)} over ${r.geomeanKernels[i]} FP kernels`)
  return `${out.join('\n')}\n\nGeometric mean of the fraction of peak: ${g.join('; ')}.\n`
}
