/**
 * Lesson 5: an unordered reduction: per-lane accumulators that hide the FPU
 * latency, their combine, and the walk of the lane partials over the ring.
 *
 * Hand derivation (timing model section 8, docs/model.md "Unordered
 * reductions"; L = 8, D = 4, A = 4 accumulators, hop = 1): vl = 128 at SEW
 * 64, 16 elements (beats) a lane, read 3..18, beat j in cycle 4 + j. Beat j
 * goes to accumulator j mod 4, which is free again D = 4 cycles after its
 * previous beat, so no beat waits. The accumulators' last beats (j = 12..15,
 * cycles 16..19) are ready in 20, 21, 22, 23; the two earliest are combined
 * first: acc0 + acc1 starts 21, ready 25; acc2 + acc3 starts 23, ready 27;
 * then (25, 27) starts 27, ready 31. The partial leaves the cycle after: 32
 * (every lane alike; lane 7, the highest, starts the walk).
 * Ring: each step is a hop plus an add, 1 + 4 = 5: lane 6's running sum leaves
 * in 37, lane l's in 32 + 5 (7 - l): lane 1 in 62; lane 0 has it added by 67,
 * adds vs1[0] (4 more) and writes vd[0] in 71: cycles = 72. From lane 7's send
 * to the write: 7 x 5 + 4 = 39; lane 3 sends in 32 + 4 x 5 = 52 (the question).
 * One accumulator: a beat every D = 4 cycles, the last (j = 15) in
 * 4 + 4 x 15 = 64, ready 68, leaves 69; lane 0 writes 69 + 35 + 4 = 108,
 * cycles = 109. Tree: levels of 2^k hops + D, k = 0..2: 32 + (1 + 4) +
 * (2 + 4) + (4 + 4) + 4 = 55 (docs/model.md's (L - 1) hop + log2(L) D + D
 * after the partial): cycles = 56.
 */
import { cyclesAre, defineLesson, phaseIs, stallCyclesAre } from './lesson'

export const reduction = defineLesson({
  id: 'reduction',
  title: 'Reduction accumulators and the inter-lane ring',
  teaches: 'How each lane folds its elements into several accumulators to hide the adder\'s latency, and how the lane partials walk the ring to lane 0.',
  program: `# Lesson: a sum reduction (a Chimeline lesson scenario)
  li a0, 128
  vsetvli t0, a0, e64, m1, ta, ma   # 128 elements: 16 a lane
  vfredusum.vs v4, v1, v2           # v4[0] = v2[0] + sum of v1
`,
  machine: { lanes: 8, reductionAccumulators: 4, interLane: 'ring', ringHopLatency: 1, units: { fpu: { latency: 4 } } },
  walkthrough: {
    title: 'Reduction accumulators and the inter-lane ring',
    steps: [
      {
        cursor: 3,
        window: { start: 0, end: 71 },
        highlight: { instruction: 1 },
        subRows: true,
        note:
          '**A sum over the whole vector.** `vfredusum.vs` adds the 128 elements of v1, and `v2[0]`, into `v4[0]`. It is *unordered*: the machine may add in any order, so each lane first sums its own 16 elements.\n\n' +
          'Every lane reads its 16 words in cycles 3 to **18**, one a cycle.',
        checks: [phaseIs(0, 1, 'readEnd', 18), phaseIs(7, 1, 'readEnd', 18)],
      },
      {
        cursor: 8,
        window: { start: 0, end: 36 },
        highlight: { instruction: 1, lane: 7 },
        subRows: true,
        note:
          '**Accumulators.** An add cannot take a beat until the previous add into the same sum has left the FPU, 4 cycles later. With a single running sum a lane could take a beat only every fourth cycle.\n\n' +
          'This machine keeps **4** partial sums a lane and sends beat *j* to sum *j* mod 4: each one is free again just in time, so the lane takes a beat every cycle from cycle **4** and never holds up its reads.',
        checks: [phaseIs(7, 1, 'execStart', 4), phaseIs(7, 1, 'readEnd', 18), stallCyclesAre('queue', 0)],
      },
      {
        cursor: 32,
        subRows: false,
        window: { start: 0, end: 36 },
        highlight: { instruction: 1, lane: 7 },
        note:
          '**Combining the partials.** The 4 partial sums of a lane are then added in pairs: two levels of 4-cycle adds. Lane 7\'s total is ready in cycle 31, and it sends it to lane 6 in cycle **32**.\n\n' +
          'With one accumulator the same run would take **109** cycles instead of 72.',
        checks: [phaseIs(7, 1, 'writeEnd', 32)],
      },
      {
        cursor: 37,
        subRows: false,
        window: { start: 28, end: 71 },
        highlight: { instruction: 1, lane: 6 },
        note:
          '**The ring.** Lane 7 sends its total to lane 6, which adds its own and passes the sum on to lane 5, and so on down to lane 0. Each of the 7 steps costs one hop (1 cycle) and one add (4 cycles).\n\n' +
          'Lane 6\'s running sum leaves in cycle **37**, lane 1\'s in cycle **62**.',
        checks: [phaseIs(6, 1, 'writeEnd', 37), phaseIs(1, 1, 'writeEnd', 62)],
      },
      {
        cursor: 71,
        subRows: false,
        window: { start: 28, end: 71 },
        highlight: { instruction: 1, lane: 0, register: 4 },
        note:
          '**The result.** Lane 0 adds lane 1\'s sum, then `v2[0]`, and writes `v4[0]` in cycle **71**: the run takes **72** cycles, about half of them on the ring.\n\n' +
          'A tree (`interLane: tree`) combines the 8 lane totals in log2 8 = 3 levels instead of 7 steps, and the run would take **56** cycles.',
        checks: [phaseIs(0, 1, 'writeEnd', 71), cyclesAre(72)],
      },
      {
        cursor: 32,
        subRows: false,
        window: { start: 28, end: 71 },
        highlight: { instruction: 1, lane: 3 },
        note: '**Your turn.** Lane 7 sends its total in cycle **32**, and every step down the ring costs one hop and one add.',
        question: {
          kind: 'number',
          text: 'In which cycle does lane 3 send its running sum on to lane 2? Work it out from the ring\'s steps before you look at the chart.',
          fact: { kind: 'phase', lane: 3, instruction: 1, field: 'writeEnd' },
          explanation: 'Lanes 6, 5, 4 and 3 each receive the sum (1 cycle) and add their own total (4 cycles) before passing it on: 32 + 4 × 5 = 52.',
        },
        checks: [phaseIs(7, 1, 'writeEnd', 32)],
      },
    ],
  },
  laneLoads: [
    { step: 0, instruction: 1, lane: 0, elements: 16, beats: 16 },
    { step: 0, instruction: 1, lane: 7, elements: 16, beats: 16 },
  ],
  experiments: [
    { step: 2, label: '1 accumulator', machine: { reductionAccumulators: 1 }, checks: [cyclesAre(109), phaseIs(7, 1, 'writeEnd', 69)] },
    { step: 4, label: 'interLane: tree', machine: { interLane: 'tree' }, checks: [cyclesAre(56)] },
  ],
})
