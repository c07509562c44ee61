/**
 * Lesson 3: chaining a dependent instruction on its producer's words, and
 * what turning it off costs.
 *
 * Hand derivation (timing model sections 4, 5; L = 8, D = 4, vl = 64 so
 * b = 8 in every lane): `vfmul.vv` (#1) is dispatched in cycle 2, reads
 * 3..10, beats 4..11, writes 8..15. `vfadd.vv` (#2) reads v3.
 * Chaining on: word w of v3 is written in 8 + w and readable from 9 + w;
 * staggered issue lets #2 start only after the lane finished reading #1, in
 * 11, and by then word w is always there (11 + w > 9 + w): reads 11..18,
 * beats 12..19, writes 16..23, no `raw` cycle, cycles = 24. (v9 is chosen so
 * that its words never share a bank with v3's renamed register.)
 * Chaining off: #2 reads v3 only after #1 finished writing in every lane
 * (15), from 16: beats 17..24, writes 21..28, cycles = 29, i.e. D + 1 = 5
 * more. Each lane waits on v3 in cycles 11..15 (it can read v9 meanwhile):
 * 5 `raw` cycles x 8 lanes = 40.
 */
import { cyclesAre, defineLesson, phaseIs, stallCyclesAre } from './lesson'

export const chaining = defineLesson({
  id: 'chaining',
  title: 'Chaining on and off',
  teaches: 'How a dependent instruction reads its producer\'s results word by word as they are written, and what waiting for the whole register costs.',
  program: `# Lesson: chaining (a Chimeline lesson scenario)
  li a0, 64
  vsetvli t0, a0, e64, m1, ta, ma
  vfmul.vv v3, v1, v2     # producer: writes v3
  vfadd.vv v10, v3, v9    # consumer: reads v3
`,
  machine: { lanes: 8, issue: 'staggered', chaining: true, rfBanks: 6, units: { fpu: { latency: 4 } } },
  walkthrough: {
    title: 'Chaining on and off',
    steps: [
      {
        cursor: 8,
        window: { start: 0, end: 23 },
        highlight: { instruction: 1, lane: 0, register: 3 },
        subRows: true,
        dependencies: true,
        note:
          '**A dependent pair.** `vfmul.vv` writes v3 and `vfadd.vv` reads it: a true (read after write) dependence.\n\n' +
          'In lane 0 the multiply writes its first result in cycle **8** (its first beat in cycle 4, plus the FPU latency of 4) and its last in cycle **15**.',
        checks: [phaseIs(0, 1, 'execStart', 4), phaseIs(0, 1, 'writeStart', 8), phaseIs(0, 1, 'writeEnd', 15)],
      },
      {
        cursor: 11,
        window: { start: 0, end: 23 },
        highlight: { instruction: 2, lane: 0, register: 3 },
        subRows: true,
        dependencies: true,
        note:
          '**Chaining.** With chaining a consumer may read a word the cycle after its producer wrote it: it does not wait for the whole register.\n\n' +
          'The add starts reading v3 in cycle **11**, while the multiply is still writing (until cycle 15). What sets that start is the lane: it finished reading the multiply in cycle **10**, and under staggered issue the next instruction starts the cycle after.',
        checks: [phaseIs(0, 2, 'readStart', 11), phaseIs(0, 1, 'readEnd', 10)],
      },
      {
        cursor: 23,
        window: { start: 0, end: 23 },
        highlight: { instruction: 2, lane: 0 },
        note: 'The add writes its last result in cycle **23** and the run takes **24** cycles. No lane ever waits for a word of v3: **0** `raw` stall cycles.',
        checks: [phaseIs(0, 2, 'writeEnd', 23), cyclesAre(24), stallCyclesAre('raw', 0)],
      },
      {
        cursor: 15,
        window: { start: 0, end: 23 },
        highlight: { instruction: 1 },
        dependencies: true,
        note:
          '**Without chaining** (`chaining` off) the add may read v3 only after the multiply has finished writing in *every* lane, that is from cycle 16. It then writes its last result in cycle **28**, and the run takes **29** cycles: 5 more, one FPU latency plus the cycle between a write and a read.\n\n' +
          'Each lane waits 5 cycles for v3: **40** `raw` stall cycles over the 8 lanes. The longer the producer\'s latency, the more chaining saves.',
        checks: [phaseIs(0, 1, 'writeEnd', 15)],
      },
      {
        cursor: 11,
        window: { start: 0, end: 23 },
        highlight: { instruction: 2, lane: 0 },
        note: '**Your turn.** The first word of v3 is written in cycle 8, so chaining would allow reading it from cycle 9.',
        question: {
          kind: 'choice',
          text: 'Why does the add start reading in cycle 11 and not in cycle 9?',
          options: [
            'The lane is still reading the multiply until cycle 10; staggered issue starts the next instruction the cycle after.',
            'v3\'s first word is only written in cycle 10.',
            'A bank conflict refuses the first read twice.',
            'Chaining is off in this machine.',
          ],
          correct: 0,
          explanation: 'The lane reads the multiply\'s 8 words in cycles 3 to 10. Its next arithmetic instruction may start the cycle after, 11; by then v3\'s words are already there, so chaining hides all of the dependence.',
        },
        checks: [phaseIs(0, 1, 'writeStart', 8)],
      },
    ],
  },
  laneLoads: [{ step: 0, instruction: 1, lane: 0, elements: 8, beats: 8 }],
  experiments: [
    { step: 3, label: 'chaining: off', machine: { chaining: false }, checks: [phaseIs(0, 2, 'writeEnd', 28), cyclesAre(29), stallCyclesAre('raw', 40)] },
  ],
})
