/** The run's figures (handbook section 10), computed from the recorder's totals. */
import type { FpWidth, Metrics } from '../trace/types'
import { FP_WIDTHS, stallCountsAt } from '../trace/types'
import { UNIT_COUNT } from './config'
import type { Ctx } from './context'

/** Flops of an FMA on one element: the peak counts every FPU element slot as an FMA (timing model section 6). */
const FMA_FLOPS = 2

/**
 * The peak of a run (timing model section 10): per width, lanes x 2 x
 * fpuElementsPerCycle[SEW]; for the run, the flops-weighted harmonic mean of
 * the widths it used, flops / sum(flops_w / peak_w), so that the fraction of
 * peak is the cycles the flops need at peak over the cycles taken.
 */
export function peakFlops(ctx: Ctx, flopsBySew: Record<FpWidth, number>): { peak: number; bySew: Record<FpWidth, number> } {
  const m = ctx.m
  const bySew = { '16': 0, '32': 0, '64': 0 }
  for (const w of FP_WIDTHS) bySew[w] = ctx.L * FMA_FLOPS * m.fpuElementsPerCycle[w]
  let flops = 0
  let idealCycles = 0
  for (const w of FP_WIDTHS) {
    flops += flopsBySew[w]
    idealCycles += flopsBySew[w] / bySew[w]
  }
  return { peak: idealCycles > 0 ? flops / idealCycles : bySew['64'], bySew }
}

export function computeMetrics(ctx: Ctx, cycles: number, flopsBySew: Record<FpWidth, number>, laneBusy: Float64Array): Metrics {
  const flops = flopsBySew['16'] + flopsBySew['32'] + flopsBySew['64']
  const { peak, bySew } = peakFlops(ctx, flopsBySew)
  const m = ctx.m
  const L = ctx.L
  const tot = ctx.rec.totals
  const cyc = Math.max(1, cycles)
  const sum = (ids: ArrayLike<number>) => {
    let s = 0
    for (let i = 0; i < ids.length; i++) s += tot[ids[i] ?? 0] ?? 0
    return s
  }
  const unitSum = (u: number) => {
    let s = 0
    for (let l = 0; l < L; l++) s += tot[ctx.unitRes[l * UNIT_COUNT + u] ?? 0] ?? 0
    return s / (cyc * L)
  }
  const bankUtilization: number[] = []
  for (let b = 0; b < ctx.d.banks; b++) {
    let s = 0
    for (let l = 0; l < L; l++) s += tot[ctx.bankRes[l * ctx.d.banks + b] ?? 0] ?? 0
    bankUtilization.push(s / (cyc * L * ctx.d.ports))
  }
  const stallCycles = stallCountsAt(ctx.rec.stallTotals, 0)
  const links = ctx.linkUpRes.length
  return {
    cycles,
    flops,
    flopsPerCycle: cycles > 0 ? flops / cycles : 0,
    peakFlopsPerCycle: peak,
    flopsBySew: { ...flopsBySew },
    peakFlopsPerCycleBySew: bySew,
    laneBusy: Array.from(laneBusy, (b) => (cycles > 0 ? b / cycles : 0)),
    unitUtilization: { alu: unitSum(0), mul: unitSum(1), fpu: unitSum(2), div: unitSum(3) },
    bankUtilization,
    busUtilization: {
      load: (ctx.rec.totals[ctx.loadBusRes] ?? 0) / (cyc * m.loadBusBits),
      store: (ctx.rec.totals[ctx.storeBusRes] ?? 0) / (cyc * m.storeBusBits),
    },
    ringUtilization: links > 0 ? (sum(ctx.linkUpRes) + sum(ctx.linkDownRes)) / (cyc * links * 2) : 0,
    stallCycles,
  }
}
