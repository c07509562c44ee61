/**
 * Words for the Lane chart: the hover description of a bar (what the
 * tooltip shows and the `hover` event carries) and the summary a screen
 * reader hears for the whole chart.
 *
 * @example
 *   chartLabel(trace) // "Lane chart: 8 lanes, 120 cycles, 12 instructions"
 */
import { laneTiming, type TimingTrace } from '@shared/sim/trace/types'
import { PHASES, STALL_KIND, stallReasonName, type ChartLayout, type Phase } from './layout'
import type { Hit } from './hit'
import { formatInteger } from '@/utils/format'

export interface PhaseSpan {
  start: number
  end: number
}

export interface HoverInfo {
  /** InstructionTrace.index. */
  index: number
  text: string
  lane: number
  elements: number
  beats: number
  read: PhaseSpan | null
  execute: PhaseSpan | null
  write: PhaseSpan | null
  /** The phase of the bar under the pointer; null on a stall. */
  phase: Phase | null
  /** The stall under the pointer (a stall bar, or a strip on the phase bar): reason and the whole span's cycles [start, end] inclusive. */
  stall: { reason: string; start: number; end: number } | null
}

function span(start: number | null, end: number | null): PhaseSpan | null {
  return start === null || end === null ? null : { start, end }
}

export function describeHit(trace: TimingTrace, layout: ChartLayout, hit: Hit): HoverInfo {
  const ins = trace.instructions[hit.instruction]
  if (!ins) throw new RangeError(`no instruction at position ${hit.instruction} (the trace has ${trace.instructions.length})`)
  const t = laneTiming(trace, hit.instruction, hit.lane)
  return {
    index: ins.index,
    text: ins.text,
    lane: hit.lane,
    elements: t.elements,
    beats: t.beats,
    read: span(t.readStart, t.readEnd),
    execute: span(t.execStart, t.execEnd),
    write: span(t.writeStart, t.writeEnd),
    phase: hit.kind === STALL_KIND ? null : PHASES[hit.kind]!,
    stall: hit.stall === -1 ? null : stallSpan(trace, layout, hit.stall),
  }
}

/** The stall span a stall bar was cut from (layout.ts cuts spans where they meet phase bars). */
function stallSpan(trace: TimingTrace, layout: ChartLayout, bar: number): { reason: string; start: number; end: number } {
  const k = layout.bars.stall[bar]!
  const start = trace.stalls.start[k]
  const length = trace.stalls.length[k]
  if (start === undefined || length === undefined) throw new RangeError(`bar ${bar} names stall span ${k}, the trace has ${trace.stalls.count}`)
  return { reason: stallReasonName(trace.stalls.reason[k]!), start, end: start + length - 1 }
}

const plural = (n: number, word: string) => `${formatInteger(n)} ${word}${n === 1 ? '' : 's'}`

export function chartLabel(trace: Pick<TimingTrace, 'laneCount' | 'cycles' | 'instructions'>): string {
  return `Lane chart: ${plural(trace.laneCount, 'lane')}, ${plural(trace.cycles, 'cycle')}, ${plural(trace.instructions.length, 'instruction')}`
}
