/**
 * Lesson 1: how a vector of vl elements spreads over the lanes, and how many
 * beats a lane needs for its share at two element widths.
 *
 * Hand derivation (timing model sections 1, 2 and 5; L = 8 lanes, FPU
 * latency D = 4): `li` runs in cycle 0, the first `vsetvli` in cycle 1, so
 * the first `vfadd.vv` (#1) is dispatched in cycle 2 and reads from cycle 3.
 * vl = 64: every lane holds n = 64 / 8 = 8 elements; at SEW 64 a beat carries
 * one element (fpuElementsPerCycle[64] = 1), b = 8: reads 3..10, beats
 * 4..11, writes 8..15, latency b + D + 2 = 14.
 * The second `vsetvli` (#2) runs in cycle 3, the FP32 add (#3) is dispatched
 * in cycle 4; staggered issue lets it start the cycle after the lane finished
 * reading #1: 11. At SEW 32 a beat carries two elements: b = 8 / 2 = 4, reads
 * 11..14, beats 12..15, writes 16..19; the run's last busy cycle is 19, so
 * cycles = 20. With 16 lanes, n = 4, b = 4: #1 reads 3..6.
 */
import { defineLesson, phaseIs } from './lesson'

export const lanesAndBeats = defineLesson({
  id: 'lanes-and-beats',
  title: 'Lanes, vector length and beats',
  teaches: 'How vl elements spread over the lanes, and how the element width sets the beats each lane needs.',
  program: `# Lesson: lanes, vector length and beats (a Chimeline lesson scenario)
  li a0, 64
  vsetvli t0, a0, e64, m1, ta, ma   # vl = 64 elements of 64 bits
  vfadd.vv v3, v1, v2
  vsetvli t0, a0, e32, m1, ta, ma   # vl = 64 elements of 32 bits
  vfadd.vv v10, v8, v9
`,
  machine: { lanes: 8, issue: 'staggered', fpuElementsPerCycle: { '64': 1, '32': 2 }, units: { fpu: { latency: 4 } } },
  walkthrough: {
    title: 'Lanes, vector length and beats',
    steps: [
      {
        cursor: 3,
        window: { start: 0, end: 19 },
        highlight: { instruction: 1, lane: 0 },
        subRows: true,
        note:
          '**Elements per lane.** `vsetvli` asks for `vl` = 64 elements of 64 bits. The machine has 8 lanes, and element *i* lives in lane *i* mod 8, so every lane holds 64 / 8 = **8** elements of each register.\n\n' +
          'The `vfadd.vv` is dispatched in cycle 2 (the `li` and the `vsetvli` each take the front end for one cycle first), and every lane starts reading its slice in cycle **3**.',
        checks: [phaseIs(0, 1, 'readStart', 3), phaseIs(7, 1, 'readStart', 3)],
      },
      {
        cursor: 10,
        window: { start: 0, end: 19 },
        highlight: { instruction: 1, lane: 0 },
        subRows: true,
        note:
          '**Beats.** A lane\'s datapath is 64 bits wide: its FPU takes one *beat* a cycle, and at 64 bits a beat carries one element. Eight elements are **8** beats.\n\n' +
          'Lane 0 reads one word a cycle, cycles 3 to **10**, takes its first beat in cycle **4**, and writes each result 4 cycles (the FPU latency) after its beat: cycles **8** to **15**.',
        checks: [phaseIs(0, 1, 'readEnd', 10), phaseIs(0, 1, 'execStart', 4), phaseIs(0, 1, 'writeStart', 8), phaseIs(0, 1, 'writeEnd', 15)],
      },
      {
        cursor: 15,
        window: { start: 0, end: 19 },
        highlight: { instruction: 1 },
        note:
          '**One instruction: beats + latency + 2.** From its dispatch to its last write the add takes 8 beats + 4 cycles of latency + 2 = **14** cycles. The 2 are the dispatch cycle and the read of the first word, which come before the first beat.\n\n' +
          'With 16 lanes each lane would hold only 4 elements, and the same add would finish reading in cycle **6**.',
        checks: [{ kind: 'latency', instruction: 1, op: '==', value: 14 }],
      },
      {
        cursor: 11,
        window: { start: 0, end: 19 },
        highlight: { instruction: 3, lane: 0 },
        subRows: true,
        note:
          '**Narrower elements, fewer beats.** The second `vsetvli` keeps `vl` = 64 but sets the element width to 32 bits. Each lane still holds 8 elements, but one FPU beat now carries two FP32 elements, so the second add needs only **4** beats a lane.\n\n' +
          'It starts reading in cycle **11**, the cycle after the lane finished reading the first add, and reads its 4 words until cycle **14**.',
        checks: [phaseIs(0, 3, 'readStart', 11), phaseIs(0, 3, 'readEnd', 14)],
      },
      {
        cursor: 14,
        window: { start: 0, end: 19 },
        highlight: { instruction: 3, lane: 0 },
        note: '**Your turn.** The FP32 add takes its beats in cycles 12 to 15, and the FPU latency is still 4 cycles.',
        question: {
          kind: 'number',
          text: 'In which cycle does lane 0 write its last FP32 result?',
          fact: { kind: 'phase', lane: 0, instruction: 3, field: 'writeEnd' },
          explanation: 'The last beat enters the FPU in cycle 15 and its result is written 4 cycles later, in cycle 19. That is the last busy cycle of the run, which therefore takes 20 cycles (0 to 19).',
        },
        checks: [phaseIs(0, 3, 'execStart', 12)],
      },
    ],
  },
  laneLoads: [
    { step: 0, instruction: 1, lane: 0, elements: 8, beats: 8 },
    { step: 0, instruction: 1, lane: 7, elements: 8, beats: 8 },
    { step: 1, instruction: 1, lane: 0, elements: 8, beats: 8 },
    { step: 3, instruction: 3, lane: 0, elements: 8, beats: 4 },
    { step: 3, instruction: 3, lane: 7, elements: 8, beats: 4 },
  ],
  experiments: [{ step: 2, label: '16 lanes', machine: { lanes: 16 }, checks: [phaseIs(0, 1, 'readEnd', 6)] }],
})
