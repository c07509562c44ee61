/**
 * The summation order of an unordered FP sum (vfredusum) that a machine's
 * timing implies (timing model section 8), for functional execution
 * (`execute(program, { fpReductionOrder: machineReductionOrder(machine) })`),
 * so that a user sees the rounding their design would really give.
 *
 * - Element i lives in lane i mod L at local index floor(i / L); local
 *   elements go in beats of `fpuElementsPerCycle[SEW]`, beat j into
 *   accumulator j mod A, a beat's elements added in element order. An
 *   accumulator starts empty: its first element is taken as it is.
 * - A lane combines its partials as the engine does when nothing conflicts:
 *   the two earliest ready partials (lower accumulator first on a tie), one
 *   combine a cycle, each ready D cycles after it started.
 * - The lane partials meet over the ring (from the highest active lane down to
 *   lane 0) or the tree (at level k lane l adds what lane l + 2^k sends), and
 *   vs1[0] is added last.
 * A lane or accumulator without an active element contributes nothing (adding
 * -0.0, the identity of IEEE 754 addition, would give the same bits). Under
 * port or ring contention the engine may pair partials differently; this order
 * is the conflict-free one (docs/model.md).
 */
import type { Machine } from '../../schemas/machine'
import type { UnorderedSum } from '../exec/machine'
import { elementsPerBeat, laneElements, unitLatency } from './config'

type Add = (a: number, b: number) => number
/** A partial sum, or null while nothing was added to it. */
type Partial = number | null

const plus = (add: Add, a: Partial, b: Partial): Partial => (a === null ? b : b === null ? a : add(a, b))

/** The lane's partial: beats into A accumulators, then the greedy pairwise combine of the engine. */
function lanePartial(add: Add, local: Partial[], epc: number, A: number, D: number): Partial {
  const beats = Math.ceil(local.length / epc)
  if (beats === 0) return null
  const acc: Partial[] = new Array<Partial>(Math.min(A, beats)).fill(null)
  const ready: number[] = new Array<number>(acc.length).fill(-1)
  // Conflict-free beat cycles: one beat a cycle, and accumulator j mod A free D cycles after its last beat.
  const beatAt: number[] = []
  for (let j = 0; j < beats; j++) {
    const t = Math.max(j > 0 ? (beatAt[j - 1] ?? 0) + 1 : 0, j >= A ? (beatAt[j - A] ?? 0) + D : 0)
    beatAt.push(t)
    const a = j % A
    for (let e = j * epc; e < Math.min(local.length, (j + 1) * epc); e++) acc[a] = plus(add, acc[a] ?? null, local[e] ?? null)
    ready[a] = t + D
  }
  let left = acc.length
  for (let c = (beatAt[beats - 1] ?? 0) + 1; left > 1; c++) {
    let i1 = -1
    let i2 = -1
    for (let k = 0; k < ready.length; k++) {
      const t = ready[k] ?? -1
      if (t < 0 || t > c) continue
      if (i1 < 0 || t < (ready[i1] ?? 0)) {
        i2 = i1
        i1 = k
      } else if (i2 < 0 || t < (ready[i2] ?? 0)) i2 = k
    }
    if (i1 < 0 || i2 < 0) continue
    acc[i1] = plus(add, acc[i1] ?? null, acc[i2] ?? null)
    acc[i2] = null
    ready[i1] = c + D
    ready[i2] = -1
    left--
  }
  return acc.reduce<Partial>((s, p) => plus(add, s, p), null)
}

/** The order `machine` sums a vfredusum in; pass it to execute's `fpReductionOrder`. */
export function machineReductionOrder(machine: Machine): UnorderedSum {
  const L = machine.lanes
  const A = machine.reductionAccumulators
  const D = unitLatency(machine, 'fpu')
  return ({ start, values, indices, add, vl, sew }) => {
    const epc = elementsPerBeat(machine, 'fpu', sew)
    const lanes = Math.min(vl, L)
    // Every local position of every lane, masked-off ones null: they still take their place in a beat.
    const local: Partial[][] = Array.from({ length: lanes }, (_, l) => new Array<Partial>(laneElements(vl, l, L)).fill(null))
    indices.forEach((i, k) => {
      ;(local[i % L] as Partial[])[Math.floor(i / L)] = values[k] ?? 0
    })
    const part = local.map((x) => lanePartial(add, x, epc, A, D))
    let total: Partial
    if (machine.interLane === 'tree') {
      for (let dist = 1; dist < lanes; dist *= 2) {
        for (let l = 0; l + dist < lanes; l += 2 * dist) part[l] = plus(add, part[l] ?? null, part[l + dist] ?? null)
      }
      total = part[0] ?? null
    } else {
      total = null
      for (let l = lanes - 1; l >= 0; l--) total = plus(add, total, part[l] ?? null)
    }
    return total === null ? start : add(start, total)
  }
}
