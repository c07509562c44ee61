import { describe, expect, it } from 'vitest'
import { checkMachine } from '../../../shared/schemas/machine'
import { simulate } from '../../../shared/sim/timing/simulate'
import { laneTiming } from '../../../shared/sim/trace/types'
import { ampleMachine, buildOp, buildStream } from './factories'

// The inter-lane phase of an unordered reduction (timing model section 8): the ring walks L - 1 steps of
// hop + D; the tree (log2 L levels, a level k hop costing 2^k x ringHopLatency) takes sum_k (2^k hop + D).
const sum = (L: number, A: number) =>
  buildStream([buildOp({ op: 'vfredusum.vs', text: 'vfredusum.vs v4, v8, v1', shape: 'reduction', vl: L * A, dstRegs: [4], srcRegs: [[8], [1]] })])
const machine = (interLane: 'ring' | 'tree', L: number, D: number, A: number, hop: number) =>
  ampleMachine({ lanes: L, vlen: Math.max(4096, 64 * L * A), interLane, reductionAccumulators: A, ringHopLatency: hop, units: { fpu: { latency: D } } })

/**
 * Each lane holds A elements, one per accumulator: reads in 1..A, beats in 2..A+1, the A partials combine
 * pairwise (log2 A levels of D, the last pair ready A - 1 cycles after the first) so the lane partial is
 * ready at P = A + 1 + D(1 + log2 A) when D >= A / 2. It leaves the cycle after (the send follows the add's
 * cycle); lane 0 then adds vs1[0] (D) and writes vd[0]; cycles count to that write, inclusive.
 */
const lanePartial = (D: number, A: number) => A + 1 + D * (1 + Math.log2(A))
const ringCycles = (L: number, D: number, A: number, hop: number) => lanePartial(D, A) + 2 + (L - 1) * (hop + D) + D
const treeCycles = (L: number, D: number, A: number, hop: number) => {
  let phase = 0
  for (let k = 0; 2 ** k < L; k++) phase += 2 ** k * hop + D
  return lanePartial(D, A) + 2 + phase + D
}

const CASES: [number, number, number, number][] = []
for (const L of [1, 2, 4, 8, 16, 32, 64]) for (const [D, A, hop] of [[4, 1, 1], [4, 4, 1], [2, 2, 3], [6, 4, 2], [3, 1, 4]] as const) CASES.push([L, D, A, hop])

describe("interLane 'tree' (timing model section 8)", () => {
  it('is accepted by the machine schema next to ring, and nothing else is', () => {
    expect(checkMachine({ interLane: 'tree' }).ok).toBe(true)
    const r = checkMachine({ interLane: 'star' })
    expect(r.ok ? '' : r.issues[0]!.message).toBe('"star" is not one of ring, tree')
  })

  it.each(CASES)('times one vfredusum on %i lanes (D %i, A %i, hop %i) by the closed forms of the ring and the tree', (L, D, A, hop) => {
    const ring = simulate(sum(L, A), machine('ring', L, D, A, hop))
    const tree = simulate(sum(L, A), machine('tree', L, D, A, hop))
    expect(ring.error).toBeUndefined()
    expect(tree.error).toBeUndefined()
    expect(ring.trace.cycles).toBe(ringCycles(L, D, A, hop))
    expect(tree.trace.cycles).toBe(treeCycles(L, D, A, hop))
  })

  it.each([4, 8, 16, 64])('beats the ring on %i lanes, by (L - 1) D - log2(L) D cycles', (L) => {
    const D = 4
    const ring = simulate(sum(L, 4), machine('ring', L, D, 4, 1)).trace.cycles
    const tree = simulate(sum(L, 4), machine('tree', L, D, 4, 1)).trace.cycles
    expect(tree).toBeLessThan(ring)
    expect(ring - tree).toBe((L - 1) * D - Math.log2(L) * D)
  })

  it('sends each lane partial once, over 2^k links at level k, and finishes every lane (7 active lanes of 8)', () => {
    const { trace, error } = simulate(sum(7, 1), machine('tree', 8, 4, 1, 1))
    expect(error).toBeUndefined()
    for (let l = 0; l < 8; l++) {
      const t = laneTiming(trace, 0, l)
      if (l === 7) expect(t.writeEnd).toBeNull()
      else expect(t.writeEnd).not.toBeNull()
    }
    let words = 0
    for (let i = 0; i < trace.usage.count; i++) if (trace.resources[trace.usage.resource[i]!]!.kind === 'ring') words += trace.usage.length[i]! * trace.usage.amount[i]!
    // Level 0: 1->0, 3->2, 5->4 (lane 6 has no partner); level 1: 2->0, 6->4 (2 links each); level 2: 4->0 (4 links).
    expect(words).toBe(3 + 2 * 2 + 4)
  })
})
