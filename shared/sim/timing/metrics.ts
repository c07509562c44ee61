/** The run's figures (handbook section 10), computed from the recorder's totals. */
import type { Metrics } from '../trace/types'
import { STALL_REASONS, emptyStallCounts } from '../trace/types'
import type { Ctx } from './context'

export function computeMetrics(ctx: Ctx, cycles: number, flops: number, laneBusy: Float64Array): Metrics {
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
    for (let l = 0; l < L; l++) s += tot[ctx.unitRes[l * 4 + u] ?? 0] ?? 0
    return s / (cyc * L)
  }
  const bankUtilization: number[] = []
  for (let b = 0; b < ctx.d.banks; b++) {
    let s = 0
    for (let l = 0; l < L; l++) s += tot[ctx.bankRes[l * ctx.d.banks + b] ?? 0] ?? 0
    bankUtilization.push(s / (cyc * L * ctx.d.ports))
  }
  const stallCycles = emptyStallCounts()
  STALL_REASONS.forEach((r, i) => (stallCycles[r] = ctx.rec.stallTotals[i] ?? 0))
  const links = ctx.linkUpRes.length
  return {
    cycles,
    flops,
    flopsPerCycle: cycles > 0 ? flops / cycles : 0,
    peakFlopsPerCycle: L * 2 * m.fpuElementsPerCycle['64'],
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
