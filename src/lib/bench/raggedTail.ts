/**
 * Ragged tails in numbers. With vl elements on L lanes, lane l holds
 * ceil((vl - l) / L) of them (element i in lane i mod L), so when L does not
 * divide vl the first vl mod L lanes hold one element more. Each lane takes
 * beats for its own elements and an instruction ends with its busiest lane,
 * so the run is as long as at the next multiple of L (lanes × the most
 * elements a lane has) while the flops are those of vl; the multiple below
 * (lanes × the fewest) would save a beat per instruction on every lane.
 * The counts are read from the trace (elements per lane), not recomputed.
 *
 * @example
 *   raggedTail(traceOfVl250On8Lanes)
 *   // { vl: 250, instructions: 1000, high: { lanes: [0, 1], elements: 32 }, low: { lanes: [2..7], elements: 31 }, upVl: 256, downVl: 248 }
 */
import { LANE_FIELD_COUNT, type TimingTrace } from '@shared/sim/trace/types'
import { formatInteger } from '@/utils/format'

export interface RaggedTail {
  /** The vl of the uneven instructions, the most frequent one when there are several. */
  vl: number
  /** How many traced instructions have it. */
  instructions: number
  high: { lanes: number[]; elements: number }
  low: { lanes: number[]; elements: number }
  /** The even neighbours: lanes × the most elements a lane has, and lanes × the fewest. */
  upVl: number
  downVl: number
}

/** "lanes 0–1", "lane 3", "lanes 0, 2–4". */
export function laneRanges(lanes: readonly number[]): string {
  const parts: string[] = []
  for (let i = 0; i < lanes.length; ) {
    let j = i
    while (j + 1 < lanes.length && lanes[j + 1] === lanes[j]! + 1) j++
    parts.push(i === j ? String(lanes[i]) : `${lanes[i]}–${lanes[j]}`)
    i = j + 1
  }
  return `${lanes.length === 1 ? 'lane' : 'lanes'} ${parts.join(', ')}`
}

export function raggedTail(trace: TimingTrace): RaggedTail | null {
  const L = trace.laneCount
  const byVl = new Map<number, { count: number; counts: number[] }>()
  trace.instructions.forEach((ins, pos) => {
    if (ins.isConfig || ins.vl === 0) return
    const counts = Array.from({ length: L }, (_, l) => trace.laneTimes[(pos * L + l) * LANE_FIELD_COUNT] ?? 0)
    const max = Math.max(...counts)
    const min = Math.min(...counts)
    if (max === min) return
    const entry = byVl.get(ins.vl)
    if (entry) entry.count++
    else byVl.set(ins.vl, { count: 1, counts })
  })
  let best: [number, { count: number; counts: number[] }] | null = null
  for (const e of byVl) if (!best || e[1].count > best[1].count) best = e
  if (!best) return null
  const [vl, { count, counts }] = best
  const max = Math.max(...counts)
  const min = Math.min(...counts)
  const lanesWith = (n: number) => counts.flatMap((c, l) => (c === n ? [l] : []))
  return { vl, instructions: count, high: { lanes: lanesWith(max), elements: max }, low: { lanes: lanesWith(min), elements: min }, upVl: max * L, downVl: min * L }
}

export interface NeighbourCycles {
  vl: number
  cycles: number
}

/** The explanation in words; `measured` holds the runs at the even neighbours once the Worker has them. */
export function raggedTailSentence(t: RaggedTail, cycles: number, measured: NeighbourCycles[] | null): string {
  const plural = (n: number, w: string) => `${formatInteger(n)} ${w}${n === 1 ? '' : 's'}`
  const head =
    `${formatInteger(t.instructions)} instruction${t.instructions === 1 ? '' : 's'} at vl ${t.vl}: ` +
    `${laneRanges(t.high.lanes)} ${t.high.lanes.length === 1 ? 'has' : 'have'} ${plural(t.high.elements, 'element')}, ` +
    `${laneRanges(t.low.lanes)} ${t.low.lanes.length === 1 ? 'has' : 'have'} ${formatInteger(t.low.elements)}`
  const up = measured?.find((m) => m.vl === t.upVl)
  const down = measured?.find((m) => m.vl === t.downVl)
  if (!up || !down) return `${head}. Each instruction lasts as long as its busiest lane; running vl ${t.upVl} and vl ${t.downVl} to compare…`
  const upText = up.cycles === cycles ? `the run is as long as at vl ${t.upVl} (${plural(cycles, 'cycle')})` : `vl ${t.upVl} would take ${plural(up.cycles, 'cycle')} (this run: ${formatInteger(cycles)})`
  const saved = cycles - down.cycles
  const downText = t.downVl === 0 ? '' : saved > 0 ? `; vl ${t.downVl} would be ${plural(saved, 'cycle')} shorter` : `; vl ${t.downVl} would take ${plural(down.cycles, 'cycle')}`
  return `${head}: ${upText}${downText}.`
}
