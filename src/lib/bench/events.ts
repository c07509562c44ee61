/**
 * The Cycle scrubber's events: cycles in which an instruction starts or
 * finishes a phase in some lane, or a lane starts to stall. Sorted, distinct.
 *
 * @example
 *   const ev = scrubberEvents(trace)
 *   nextEvent(ev, 10) // the first event cycle after 10, or null
 */
import { LANE_FIELD_COUNT, NO_CYCLE, type TimingTrace } from '@shared/sim/trace/types'

export function scrubberEvents(trace: TimingTrace): Int32Array {
  const cycles = new Set<number>()
  const t = trace.laneTimes
  // Fields 2..7 of each record are the phase starts and ends.
  for (let r = 0; r < t.length; r += LANE_FIELD_COUNT) {
    for (let k = 2; k < LANE_FIELD_COUNT; k++) {
      const v = t[r + k] ?? NO_CYCLE
      if (v !== NO_CYCLE) cycles.add(v)
    }
  }
  for (let i = 0; i < trace.stalls.count; i++) cycles.add(trace.stalls.start[i] ?? 0)
  return Int32Array.from(cycles).sort()
}

/** Index of the first event greater than `cycle`. */
function upperBound(events: Int32Array, cycle: number): number {
  let lo = 0
  let hi = events.length
  while (lo < hi) {
    const mid = (lo + hi) >> 1
    if ((events[mid] ?? 0) <= cycle) lo = mid + 1
    else hi = mid
  }
  return lo
}

/** The first event after `cycle`, or null when there is none. */
export function nextEvent(events: Int32Array, cycle: number): number | null {
  const i = upperBound(events, cycle)
  return i < events.length ? (events[i] ?? null) : null
}

/** The last event before `cycle`, or null when there is none. */
export function previousEvent(events: Int32Array, cycle: number): number | null {
  let lo = 0
  let hi = events.length
  while (lo < hi) {
    const mid = (lo + hi) >> 1
    if ((events[mid] ?? 0) < cycle) lo = mid + 1
    else hi = mid
  }
  return lo > 0 ? (events[lo - 1] ?? null) : null
}

/** A cycle clamped into the run: 0 .. cycles - 1 (0 for an empty run). */
export function clampCycle(cycle: number, cycles: number): number {
  if (!Number.isFinite(cycle)) return 0
  return Math.min(Math.max(0, Math.round(cycle)), Math.max(0, cycles - 1))
}
