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
