/**
 * The figures a sweep keeps of one run: the trace's metrics reduced to
 * numbers a plot or a CSV row can hold.
 */
import type { PointFigures } from '../schemas/sweep'
import type { Metrics } from '../sim/trace/types'
import { SWEEP_FIGURE_COLUMNS } from '../schemas/sweep'

export function figuresOf(m: Metrics): PointFigures {
  const busy = m.laneBusy
  return {
    cycles: m.cycles,
    flops: m.flops,
    flopsPerCycle: m.flopsPerCycle,
    peakFlopsPerCycle: m.peakFlopsPerCycle,
    fractionOfPeak: m.peakFlopsPerCycle > 0 ? m.flopsPerCycle / m.peakFlopsPerCycle : 0,
    laneBusyMean: busy.length > 0 ? busy.reduce((a, b) => a + b, 0) / busy.length : 0,
    laneBusyMin: busy.length > 0 ? Math.min(...busy) : 0,
    unitUtilization: { ...m.unitUtilization },
    bankUtilization: [...m.bankUtilization],
    busUtilization: { ...m.busUtilization },
    ringUtilization: m.ringUtilization,
    stalls: { ...m.stallCycles },
  }
}

export type FigureColumn = (typeof SWEEP_FIGURE_COLUMNS)[number]

/** One CSV figure column of a point's figures. */
export function figureColumn(f: PointFigures, column: FigureColumn): number {
  if (column.startsWith('stall.')) return f.stalls[column.slice('stall.'.length) as keyof PointFigures['stalls']]
  return f[column as Exclude<FigureColumn, `stall.${string}`>]
}
