/**
 * Lesson 2: a vector length that leaves the lanes unevenly loaded, and what
 * the three issue policies make of it.
 *
 * Hand derivation (timing model sections 1, 4, 5; L = 8, D = 4): vl = 60 =
 * 7 x 8 + 4, so n_l = ceil((60 - l) / 8) is 8 for lanes 0..3 and 7 for lanes
 * 4..7; at SEW 64, b_l = n_l. The three independent adds (#1..#3) are
 * dispatched in cycles 2, 3, 4; #1 reads from 3 in every lane.
 * staggered: lane l starts #k+1 the cycle after it finished reading #k, so
 * #k starts in 3 + (k - 1) b_l: lane 0 in 3, 11, 19, lane 7 in 3, 10, 17.
 * Lane 7 writes #3 until 17 + 7 + 4 = 28, lane 0 until 19 + 8 + 4 = 31, so
 * cycles = 32.
 * lockstep: #k+1 starts in every lane the cycle after the last lane finished
 * reading #k (lane 0: 10, 18), i.e. 11 and 19 everywhere; lanes 4..7 finish
 * reading one cycle earlier and wait one `barrier` cycle before #2 and #3:
 * 4 lanes x 2 = 8. The busiest lane is unchanged, so cycles = 32.
 * serial: #k+1 starts after #k finished writing in every lane: #1 ends 15, #2
 * reads 16..23 and ends 16 + 8 + 4 = 28, #3 reads 29..36 and ends 41:
 * cycles = 42.
 */
import { cyclesAre, defineLesson, phaseIs, stallCyclesAre } from './lesson'

export const unevenLanes = defineLesson({
  id: 'uneven-lanes',
  title: 'Uneven lanes and the three issue policies',
  teaches: 'Why a vector length that is not a multiple of the lane count lets some lanes run ahead, and how serial, lockstep and staggered issue differ.',
  program: `# Lesson: uneven lanes and the issue policies (a Chimeline lesson scenario)
  li a0, 60
  vsetvli t0, a0, e64, m1, ta, ma   # vl = 60 = 7 x 8 + 4
  vfadd.vv v3, v1, v2
  vfadd.vv v10, v8, v9
  vfadd.vv v16, v14, v15
`,
  machine: { lanes: 8, issue: 'staggered', units: { fpu: { latency: 4 } } },
  walkthrough: {
    title: 'Uneven lanes and the three issue policies',
    steps: [
      {
        cursor: 9,
        window: { start: 0, end: 31 },
        highlight: { instruction: 1, lane: 7 },
        subRows: true,
        note:
          '**An uneven split.** `vl` = 60 on 8 lanes: 60 = 7 × 8 + 4, so lanes 0 to 3 hold **8** elements and lanes 4 to 7 hold **7**. At 64 bits an element is a beat.\n\n' +
          'So lane 7 reads the first add in cycles 3 to **9**, one cycle less than lane 0, which reads until cycle **10**.',
        checks: [phaseIs(7, 1, 'readStart', 3), phaseIs(7, 1, 'readEnd', 9), phaseIs(0, 1, 'readEnd', 10)],
      },
      {
        cursor: 10,
        window: { start: 0, end: 31 },
        highlight: { instruction: 2, lane: 7 },
        subRows: true,
        note:
          '**Staggered issue.** Under the `staggered` policy a lane starts the next arithmetic instruction the cycle after *it* finished reading the previous one, whatever the other lanes are doing.\n\n' +
          'Lane 7 starts the second add in cycle **10**, while lane 0 is still reading the first; lane 0 starts it in cycle **11**.',
        checks: [phaseIs(7, 2, 'readStart', 10), phaseIs(0, 2, 'readStart', 11)],
      },
      {
        cursor: 17,
        window: { start: 0, end: 31 },
        highlight: { instruction: 3, lane: 7 },
        note:
          '**The lead grows.** Every instruction adds a cycle to lane 7\'s lead: it starts the third add in cycle **17**, lane 0 in cycle **19**.\n\n' +
          'Lane 7 writes its last result in cycle **28**, lane 0 in cycle **31**. The run still takes **32** cycles: the busiest lane sets the length, and the light lanes are free earlier for whatever comes next.',
        checks: [phaseIs(7, 3, 'readStart', 17), phaseIs(0, 3, 'readStart', 19), phaseIs(7, 3, 'writeEnd', 28), phaseIs(0, 3, 'writeEnd', 31), cyclesAre(32)],
      },
      {
        cursor: 19,
        window: { start: 0, end: 31 },
        highlight: { instruction: 3 },
        note:
          '**Lockstep and serial.** Under `lockstep` all lanes start an instruction together, the cycle after the *last* lane finished reading the previous one. Lanes 4 to 7 then wait one cycle before the second and the third add: 4 lanes × 2 = **8** `barrier` stall cycles, and lane 7 starts the third add in cycle **19**, with lane 0. The run still takes **32** cycles here.\n\n' +
          'Under `serial` an instruction starts only once the previous one has finished *writing* in every lane, so no two adds overlap: **42** cycles. Change *issue* on the Bench to see both.',
        checks: [phaseIs(0, 3, 'readStart', 19)],
      },
      {
        cursor: 17,
        window: { start: 0, end: 31 },
        highlight: { instruction: 3, lane: 7 },
        note: '**Your turn.** Look at where lanes 0 and 7 start reading the third add.',
        question: {
          kind: 'number',
          text: 'How many cycles earlier than lane 0 does lane 7 start reading the third add (staggered issue)?',
          fact: { kind: 'phase', lane: 0, instruction: 3, field: 'readStart', minus: { kind: 'phase', lane: 7, instruction: 3, field: 'readStart' } },
          explanation: 'Lane 7 has one beat fewer in every add, and staggered issue lets it start each next add as soon as it is done reading: after two adds it is 2 cycles ahead (19 − 17).',
        },
      },
    ],
  },
  laneLoads: [
    { step: 0, instruction: 1, lane: 0, elements: 8, beats: 8 },
    { step: 0, instruction: 1, lane: 3, elements: 8, beats: 8 },
    { step: 0, instruction: 1, lane: 4, elements: 7, beats: 7 },
    { step: 0, instruction: 1, lane: 7, elements: 7, beats: 7 },
  ],
  experiments: [
    { step: 3, label: 'issue: lockstep', machine: { issue: 'lockstep' }, checks: [stallCyclesAre('barrier', 8), phaseIs(7, 3, 'readStart', 19), phaseIs(0, 3, 'readStart', 19), cyclesAre(32)] },
    { step: 3, label: 'issue: serial', machine: { issue: 'serial' }, checks: [cyclesAre(42)] },
  ],
})
