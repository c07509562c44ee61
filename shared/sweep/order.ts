/**
 * The order in which runners take a sweep's points: the points of one
 * program (the same swept symbol values and VLEN) together, in index order
 * inside, groups in the order their first point comes. A runner then
 * assembles and executes each program once and re-times its stream for the
 * machines that follow, whatever the parameters' order (with `issue` swept
 * slowest and `AVL` fastest, index order would meet each program again after
 * every issue policy, past the runner's cache). Results stay keyed by index.
 *
 * @example
 *   // issue = serial,staggered x AVL = 1,2: indexes 0 (serial,1) 1 (serial,2) 2 (staggered,1) 3 (staggered,2)
 *   programOrder(sweep, 4) // [0, 2, 1, 3]
 */
import { pointValues, type ResolvedSweep } from './resolve'

export function programOrder(sweep: ResolvedSweep, planned: number): number[] {
  return programGroups(sweep, planned).flat()
}

/** The points of each program, in the order above (one group when no parameter changes the program). */
export function programGroups(sweep: ResolvedSweep, planned: number): number[][] {
  const keyed = sweep.parameters.map((p, k) => (p.kind === 'symbol' || p.path === 'vlen' ? k : -1)).filter((k) => k >= 0)
  if (keyed.length === 0) return planned > 0 ? [Array.from({ length: planned }, (_, i) => i)] : []
  const groups = new Map<string, number[]>()
  for (let i = 0; i < planned; i++) {
    const values = pointValues(sweep, i)
    const key = keyed.map((k) => String(values[k])).join('\u0000')
    const g = groups.get(key)
    if (g) g.push(i)
    else groups.set(key, [i])
  }
  return [...groups.values()]
}

/** Points of the largest program a chunk keeps whole; a larger one (a machine field swept alone) is cut. */
const WHOLE_PROGRAM_POINTS = 32

/**
 * Point indexes in chunks of about `size` points, in program order, made of
 * whole programs: a program split over two chunks may be prepared by two
 * runners (the heavy grid's 1,000-instruction programs, three points each,
 * were split every other time at two points a chunk). Only a program of more
 * than WHOLE_PROGRAM_POINTS points is cut, into chunks of `size`. The CLI's
 * threads and the server's queue take their chunks from here.
 */
export function chunkPrograms(groups: readonly number[][], size: number): number[][] {
  const out: number[][] = []
  let open: number[] = []
  for (const g of groups) {
    if (g.length > WHOLE_PROGRAM_POINTS) {
      for (let start = 0; start < g.length; start += size) out.push(g.slice(start, start + size))
      continue
    }
    open.push(...g)
    if (open.length >= size) {
      out.push(open)
      open = []
    }
  }
  if (open.length > 0) out.push(open)
  return out
}

/**
 * The chunks of chunkPrograms in the order runners take them: the last
 * first. A sweep's values are written in increasing order and its cost
 * usually grows with them (a vector length, a program's size: a heavy-grid
 * point at AVL 256 takes about ten times one at AVL 8), so the most
 * expensive chunks go first and the cheapest are left for the end, where a
 * runner that finished would otherwise wait for one that took an expensive
 * last chunk: longest processing time first, the classic list-scheduling
 * rule (Graham, 1969). Results stay keyed by index.
 */
export function largestFirst(chunks: readonly number[][]): number[][] {
  return [...chunks].reverse()
}

/** A sweep's points as runners take them: chunks of about `size` points made of whole programs, largest first. */
export function sweepChunks(sweep: ResolvedSweep, planned: number, size: number): number[][] {
  return largestFirst(chunkPrograms(programGroups(sweep, planned), size))
}
