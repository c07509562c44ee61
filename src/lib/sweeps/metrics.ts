/**
 * What a sweep plot or table can show of a point: each metric with its label
 * and unit, read from a point's figures; and the rows a plot draws.
 */
import type { PointFigures, SweepPointResult, SweepValue } from '@shared/schemas/sweep'
import { STALL_REASONS } from '@shared/sim/trace/types'
import type { ResolvedSweep } from '@shared/sweep/resolve'

export interface SweepMetric {
  id: string
  label: string
  /** The axis title's unit. */
  unit: string
  read(f: PointFigures): number
}

export const SWEEP_METRICS: readonly SweepMetric[] = [
  { id: 'flopsPerCycle', label: 'Flops per cycle', unit: 'flops/cycle', read: (f) => f.flopsPerCycle },
  { id: 'cycles', label: 'Cycles', unit: 'cycles', read: (f) => f.cycles },
  { id: 'fractionOfPeak', label: 'Fraction of peak', unit: 'fraction of peak flops', read: (f) => f.fractionOfPeak },
  { id: 'laneBusyMean', label: 'Lane busy (mean)', unit: 'fraction of cycles', read: (f) => f.laneBusyMean },
  { id: 'laneBusyMin', label: 'Lane busy (least busy lane)', unit: 'fraction of cycles', read: (f) => f.laneBusyMin },
  { id: 'unit.fpu', label: 'FPU utilisation', unit: 'fraction of lane-cycles', read: (f) => f.unitUtilization.fpu },
  { id: 'unit.alu', label: 'ALU utilisation', unit: 'fraction of lane-cycles', read: (f) => f.unitUtilization.alu },
  { id: 'bus.load', label: 'Load bus utilisation', unit: 'fraction of capacity', read: (f) => f.busUtilization.load },
  { id: 'bus.store', label: 'Store bus utilisation', unit: 'fraction of capacity', read: (f) => f.busUtilization.store },
  { id: 'bank.mean', label: 'Bank port use (mean of banks)', unit: 'fraction of port-cycles', read: (f) => (f.bankUtilization.length ? f.bankUtilization.reduce((a, b) => a + b, 0) / f.bankUtilization.length : 0) },
  ...STALL_REASONS.map((r): SweepMetric => ({ id: `stall.${r}`, label: `Stalls: ${r}`, unit: 'lane-cycles', read: (f) => f.stalls[r] })),
]

export const metricById = (id: string) => SWEEP_METRICS.find((m) => m.id === id) ?? (SWEEP_METRICS[0] as SweepMetric)

/** The unit of a swept parameter's axis, where it has one. */
export function parameterUnit(path: string): string {
  if (path === 'AVL' || path === 'vl') return 'elements'
  if (path === 'vlen' || path.endsWith('BusBits')) return 'bits'
  if (path === 'lanes') return 'lanes'
  if (path.endsWith('latency') || path === 'memLatency' || path === 'ringHopLatency' || path.endsWith('cyclesPerBeat')) return 'cycles'
  return ''
}

export const axisTitle = (path: string) => (parameterUnit(path) ? `${path} (${parameterUnit(path)})` : path)

export interface PlotRow {
  index: number
  x: SweepValue
  /** The series (second parameter's value as text), or '' for one series. */
  series: string
  /** A third parameter's value as text (one small plot each), or ''. */
  facet: string
  y: number
  peak: number
}

/** Which parameter goes where: the x axis, the series (colour) and the small plots, by parameter index. */
export interface PlotLayout {
  x: number
  series: number | null
  facet: number | null
}

/** The default layout: x is the numeric parameter with the most values (a curve), the others series then small plots. */
export function defaultLayout(sweep: Pick<ResolvedSweep, 'parameters'>): PlotLayout {
  const ks = sweep.parameters.map((_, k) => k)
  const numeric = ks.filter((k) => isNumericParameter(sweep, k))
  const x = (numeric.length ? numeric : ks).reduce((best, k) => ((sweep.parameters[k]?.values.length ?? 0) > (sweep.parameters[best]?.values.length ?? 0) ? k : best))
  const rest = ks.filter((k) => k !== x)
  return { x, series: rest[0] ?? null, facet: rest[1] ?? null }
}

/** One row per point that ran to the end; failed points have no figures to plot. */
export function plotRows(points: readonly SweepPointResult[], metric: SweepMetric, layout: PlotLayout): PlotRow[] {
  const rows: PlotRow[] = []
  for (const p of points) {
    if (!p.figures) continue
    rows.push({
      index: p.index,
      x: p.values[layout.x] as SweepValue,
      series: layout.series === null ? '' : String(p.values[layout.series]),
      facet: layout.facet === null ? '' : String(p.values[layout.facet]),
      y: metric.read(p.figures),
      peak: p.figures.peakFlopsPerCycle,
    })
  }
  return rows.sort((a, b) => a.index - b.index)
}

export const isNumericParameter = (sweep: Pick<ResolvedSweep, 'parameters'>, k: number) => sweep.parameters[k]?.values.every((v) => typeof v === 'number') ?? false
