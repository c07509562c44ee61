/**
 * Finding the spans (stall or resource use) that cover one cycle, fast enough
 * to follow a cursor through a long run. The trace stores its spans sorted by
 * start cycle; a prefix maximum of their end cycles lets a lookup walk back
 * from the last span starting at or before the cycle and stop as soon as no
 * earlier span can still be open.
 *
 * @example
 *   const idx = spanIndex(trace.usage)
 *   for (const i of spansAt(idx, 120)) console.log(trace.usage.resource[i])
 */

export interface SpanColumns {
  count: number
  start: Int32Array
  length: Int32Array
}

export interface SpanIndex {
  spans: SpanColumns
  /** maxEnd[i]: the largest end (exclusive) of spans 0..i. */
  maxEnd: Int32Array
}

export function spanIndex(spans: SpanColumns): SpanIndex {
  const maxEnd = new Int32Array(spans.count)
  let m = -1
  for (let i = 0; i < spans.count; i++) {
    const end = (spans.start[i] ?? 0) + (spans.length[i] ?? 0)
    if (end > m) m = end
    maxEnd[i] = m
  }
  return { spans, maxEnd }
}

/** Position of the last span starting at or before `cycle`, or -1. */
function lastStartingBy(spans: SpanColumns, cycle: number): number {
  let lo = 0
  let hi = spans.count - 1
  let last = -1
  while (lo <= hi) {
    const mid = (lo + hi) >> 1
    if ((spans.start[mid] ?? 0) <= cycle) {
      last = mid
      lo = mid + 1
    } else hi = mid - 1
  }
  return last
}

/** Positions of the spans covering `cycle` (start <= cycle < start + length), latest start first. */
export function spansAt(index: SpanIndex, cycle: number): number[] {
  const { spans, maxEnd } = index
  const out: number[] = []
  for (let i = lastStartingBy(spans, cycle); i >= 0 && (maxEnd[i] ?? 0) > cycle; i--) {
    if ((spans.start[i] ?? 0) + (spans.length[i] ?? 0) > cycle) out.push(i)
  }
  return out
}
