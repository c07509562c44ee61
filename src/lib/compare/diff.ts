/**
 * What differs between two runs, for Side by side: per cycle, how many lanes
 * are in different phases (read, execute, write: the difference strip); the
 * metrics of each run with their difference; and each instruction's latency
 * in both. Pure functions over two traces.
 *
 * @example
 *   const d = divergence(a, b) // d.perCycle[c]: lanes whose phases differ in cycle c; d.first: the first such cycle
 */
import { LANE_FIELD_COUNT, NO_CYCLE, STALL_REASONS, type TimingTrace } from '@shared/sim/trace/types'

/** Bits of a lane's phases in one cycle. */
export const READ = 1
export const EXECUTE = 2
export const WRITE = 4

/** Lane-cycles compared at most (both runs' masks are this many bytes each). */
export const DIVERGENCE_CELLS_MAX = 32_000_000

/** Per lane and cycle the phases active (READ | EXECUTE | WRITE), lane-major, `cycles` wide. */
export function phaseMask(trace: TimingTrace, cycles: number): Uint8Array {
  const lanes = trace.laneCount
  const out = new Uint8Array(lanes * cycles)
  const t = trace.laneTimes
  for (let i = 0; i < trace.instructions.length; i++) {
    for (let lane = 0; lane < lanes; lane++) {
      const base = (i * lanes + lane) * LANE_FIELD_COUNT
      for (let p = 0; p < 3; p++) {
        const s = t[base + 2 + 2 * p] ?? NO_CYCLE
        const e = t[base + 3 + 2 * p] ?? NO_CYCLE
        if (s === NO_CYCLE || e < s) continue
        const bit = 1 << p
        const row = lane * cycles
        // Phase ends are inclusive (the Lane chart draws [start, end + 1)).
        for (let c = s, last = Math.min(e, cycles - 1); c <= last; c++) out[row + c]! |= bit
      }
    }
  }
  return out
}

export interface Divergence {
  /** The longer run's cycles: the shared axis. */
  cycles: number
  /** The wider run's lanes (a lane one run lacks is idle there). */
  lanes: number
  /** Per cycle, lanes whose phases differ. */
  perCycle: Uint16Array
  /** First cycle where any lane differs, or null when the runs' phases are the same throughout. */
  first: number | null
  /** Cycles with any difference. */
  differing: number
}

export type DivergenceResult = { ok: true; divergence: Divergence } | { ok: false; message: string }

export function divergence(a: TimingTrace, b: TimingTrace): DivergenceResult {
  const cycles = Math.max(a.cycles, b.cycles, 1)
  const lanes = Math.max(a.laneCount, b.laneCount)
  if (lanes * cycles > DIVERGENCE_CELLS_MAX) {
    return { ok: false, message: `These runs have ${lanes} lanes x ${cycles} cycles; the difference strip compares at most ${DIVERGENCE_CELLS_MAX.toLocaleString('en')} lane-cycles` }
  }
  const ma = phaseMask(a, cycles)
  const mb = phaseMask(b, cycles)
  const perCycle = new Uint16Array(cycles)
  for (let lane = 0; lane < lanes; lane++) {
    const ra = lane < a.laneCount ? lane * cycles : -1
    const rb = lane < b.laneCount ? lane * cycles : -1
    for (let c = 0; c < cycles; c++) {
      const x = ra < 0 ? 0 : ma[ra + c]!
      const y = rb < 0 ? 0 : mb[rb + c]!
      if (x !== y) perCycle[c]!++
    }
  }
  let first: number | null = null
  let differing = 0
  for (let c = 0; c < cycles; c++) {
    if (perCycle[c]! > 0) {
      differing++
      first ??= c
    }
  }
  return { ok: true, divergence: { cycles, lanes, perCycle, first, differing } }
}

export interface MetricRow {
  metric: string
  a: number
  b: number
  /** b - a */
  delta: number
  /** b / a, or null when a is 0. */
  ratio: number | null
}

function mean(xs: number[]): number {
  return xs.length === 0 ? 0 : xs.reduce((s, x) => s + x, 0) / xs.length
}

/** The figures of one run by name, in the order the table shows them. */
export function runFigures(t: TimingTrace): [string, number][] {
  const m = t.metrics
  return [
    ['cycles', m.cycles],
    ['flops', m.flops],
    ['flops per cycle', m.flopsPerCycle],
    ['peak flops per cycle', m.peakFlopsPerCycle],
    ['fraction of peak', m.peakFlopsPerCycle > 0 ? m.flopsPerCycle / m.peakFlopsPerCycle : 0],
    ['lane busy (mean)', mean(m.laneBusy)],
    ['lane busy (least busy lane)', m.laneBusy.length ? Math.min(...m.laneBusy) : 0],
    ['FPU use', m.unitUtilization.fpu],
    ['ALU use', m.unitUtilization.alu],
    ['multiplier use', m.unitUtilization.mul],
    ['divider use', m.unitUtilization.div],
    ['load bus use', m.busUtilization.load],
    ['store bus use', m.busUtilization.store],
    ['ring use', m.ringUtilization],
    ...STALL_REASONS.map((r): [string, number] => [`${r} stall cycles`, m.stallCycles[r]]),
  ]
}

export function metricRows(a: TimingTrace, b: TimingTrace): MetricRow[] {
  const fb = new Map(runFigures(b))
  return runFigures(a).map(([metric, x]) => {
    const y = fb.get(metric) ?? 0
    return { metric, a: x, b: y, delta: y - x, ratio: x === 0 ? null : y / x }
  })
}

export interface LatencyRow {
  /** Position in the dynamic stream of vector instructions. */
  index: number
  textA: string | null
  textB: string | null
  /** Whether both runs have the same instruction here (else the rows are not comparable one to one). */
  same: boolean
  latencyA: number | null
  latencyB: number | null
  /** latencyB - latencyA when both finished. */
  delta: number | null
}

/** Instruction by instruction, in stream order: both runs' latencies (cycles from dispatch to the last activity). */
export function latencyRows(a: TimingTrace, b: TimingTrace): LatencyRow[] {
  const n = Math.max(a.instructions.length, b.instructions.length)
  const rows: LatencyRow[] = []
  for (let i = 0; i < n; i++) {
    const x = a.instructions[i]
    const y = b.instructions[i]
    const la = x?.latency ?? null
    const lb = y?.latency ?? null
    rows.push({ index: i, textA: x?.text ?? null, textB: y?.text ?? null, same: !!x && !!y && x.text === y.text, latencyA: la, latencyB: lb, delta: la !== null && lb !== null ? lb - la : null })
  }
  return rows
}
