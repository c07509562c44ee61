/**
 * Arrows of the dependency overlay: for the selected instruction, from each
 * producer to each consumer it takes part in, drawn in every lane where both
 * are active, from the producer's first written word (its write phase start,
 * else the end of its last phase) to the consumer's first read that can take
 * it: the cycle after that write, kept within the consumer's read phase (or
 * the consumer's first phase when it has no reads). The trace carries no register operands,
 * so the pairs come from the caller (from the register use the run returns).
 *
 * @example
 *   dependencyArrows(trace, layout, [{ from: 3, to: 5 }], 5)
 *   // one arrow per lane: { fromCycle, fromY, toCycle, toY, lane, from: 3, to: 5 }
 */
import { laneTiming, type TimingTrace } from '@shared/sim/trace/types'
import type { ChartLayout } from './layout'

/** Producer and consumer, as InstructionTrace.index. */
export interface DependencyPair {
  from: number
  to: number
}

export interface Arrow {
  from: number
  to: number
  lane: number
  /** Middle of the producer's first written cycle. */
  fromCycle: number
  fromY: number
  /** Middle of the consumer's first read cycle that can take the produced word. */
  toCycle: number
  toY: number
}

function groupOf(layout: ChartLayout, position: number, lane: number): number {
  const gi = layout.groupsByInstruction
  for (let j = gi.offsets[position]!; j < gi.offsets[position + 1]!; j++) {
    const g = gi.items[j]!
    if (layout.groups.lane[g] === lane) return g
  }
  return -1
}

function centreY(layout: ChartLayout, group: number, subRow: number): number {
  const lane = layout.groups.lane[group]!
  const track = layout.groups.track[group]!
  const row = layout.subRows ? subRow : 0
  return lane * (layout.laneHeight + layout.laneGap) + (row * layout.tracks + track + 0.5) * layout.trackHeight
}

export function dependencyArrows(trace: TimingTrace, layout: ChartLayout, pairs: readonly DependencyPair[], selected: number | null): Arrow[] {
  if (selected === null) return []
  const positionOf = new Map<number, number>()
  trace.instructions.forEach((ins, pos) => positionOf.set(ins.index, pos))
  const out: Arrow[] = []
  for (const pair of pairs) {
    if (pair.from !== selected && pair.to !== selected) continue
    const p = positionOf.get(pair.from)
    const c = positionOf.get(pair.to)
    if (p === undefined || c === undefined) continue
    for (let lane = 0; lane < trace.laneCount; lane++) {
      const gp = groupOf(layout, p, lane)
      const gc = groupOf(layout, c, lane)
      if (gp === -1 || gc === -1) continue
      const tp = laneTiming(trace, p, lane)
      const tc = laneTiming(trace, c, lane)
      const produced = tp.writeStart !== null ? { cycle: tp.writeStart, row: 2 } : { cycle: tp.execEnd ?? tp.readEnd, row: tp.execEnd !== null ? 1 : 0 }
      const consumed = tc.readStart !== null ? { cycle: tc.readStart, row: 0 } : { cycle: tc.execStart ?? tc.writeStart, row: tc.execStart !== null ? 1 : 2 }
      if (produced.cycle === null || consumed.cycle === null) continue
      // A consumer reads a word at the earliest the cycle after its producer wrote it (chaining),
      // so the arrow points there, within the consumer's reads; its first read may be of another operand.
      const toCycle = tc.readStart !== null && tc.readEnd !== null ? Math.min(tc.readEnd, Math.max(consumed.cycle, produced.cycle + 1)) : consumed.cycle
      out.push({
        from: pair.from,
        to: pair.to,
        lane,
        fromCycle: produced.cycle + 0.5,
        fromY: centreY(layout, gp, produced.row),
        toCycle: toCycle + 0.5,
        toY: centreY(layout, gc, consumed.row),
      })
    }
  }
  return out
}
