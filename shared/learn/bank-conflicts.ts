/**
 * Lesson 4: register-file banks, a conflict between two source operands, and
 * the number of banks.
 *
 * Hand derivation (timing model section 5; L = 8, D = 4, 6 single-port
 * banks, vl = 64 so b = 8): word w of register p is in bank (p + w) mod
 * rfBanks. Sources are not renamed before their first writer, so v1 and v7
 * are physical 1 and 7: banks (1 + w) mod 6 and (7 + w) mod 6, equal for every
 * w. In cycle 3 both want bank 1: one is refused, in every lane (8 `bank`
 * stall cycles). Then the second operand reads word w while the first reads
 * w + 1, in banks 1 + w + 1 and 1 + w: no further conflict. Reads 3..11 (9
 * cycles for 16 words on two operands), the first beat needs both word 0s
 * queued: cycle 5; beats 5..12, writes 9..16, cycles = 17 (16 without the
 * conflict). With 8 banks (or 7) the two start in different banks
 * ((7 + w) mod 8 != (1 + w) mod 8): no stall, reads 3..10, cycles = 16.
 */
import { cyclesAre, defineLesson, phaseIs, stallCyclesAre } from './lesson'

export const bankConflicts = defineLesson({
  id: 'bank-conflicts',
  title: 'Bank conflicts and the number of banks',
  teaches: 'How a lane\'s register file is split into banks, why two operands in the same bank cost a cycle, and how more banks avoid it.',
  program: `# Lesson: bank conflicts (a Chimeline lesson scenario)
  li a0, 64
  vsetvli t0, a0, e64, m1, ta, ma
  vfadd.vv v3, v1, v7     # v1 and v7: 7 - 1 = 6, a multiple of the bank count
`,
  machine: { lanes: 8, rfBanks: 6, rfPortsPerBank: 1, units: { fpu: { latency: 4 } } },
  walkthrough: {
    title: 'Bank conflicts and the number of banks',
    steps: [
      {
        cursor: 3,
        window: { start: 0, end: 16 },
        highlight: { instruction: 1, lane: 0 },
        subRows: true,
        note:
          '**Banks.** Each lane\'s slice of the register file is split into 6 banks with one port each, and a port does one read or one write a cycle. Word *w* of register *p* lives in bank (*p* + *w*) mod 6, so consecutive words of a register rotate through the banks.\n\n' +
          'An add reads two words a beat: at full speed, both operands read a word in the same cycle, from two different banks.',
        checks: [phaseIs(0, 1, 'readStart', 3)],
      },
      {
        cursor: 3,
        window: { start: 0, end: 16 },
        highlight: { instruction: 1, lane: 0, register: 7 },
        subRows: true,
        note:
          '**A conflict.** v1 and v7 differ by 6, the number of banks, so word *w* of both sits in the *same* bank. (The bank follows the physical register; nothing has written v1 or v7 yet, so renaming has not moved them.) In cycle 3 both operands ask for bank 1; one is refused its port. That happens in every lane: **8** `bank` stall cycles in all.',
        checks: [stallCyclesAre('bank', 8)],
      },
      {
        cursor: 11,
        window: { start: 0, end: 16 },
        highlight: { instruction: 1, lane: 0 },
        subRows: true,
        note:
          '**One cycle lost, once.** From then on the refused operand reads one word behind the other, so they never meet in a bank again. Lane 0 reads in cycles 3 to **11** (nine cycles for eight words), takes its first beat in cycle **5** rather than 4, and writes its last result in cycle **16**.\n\n' +
          'The run takes **17** cycles; without the conflict it would take 16.',
        checks: [phaseIs(0, 1, 'readEnd', 11), phaseIs(0, 1, 'execStart', 5), phaseIs(0, 1, 'writeEnd', 16), cyclesAre(17)],
      },
      {
        cursor: 3,
        window: { start: 0, end: 16 },
        highlight: { instruction: 1 },
        note:
          '**More banks.** With 8 banks, 7 − 1 = 6 is not a multiple of the bank count: the operands start in different banks, **0** `bank` stall cycles, and the run takes **16** cycles. With 7 banks likewise.\n\n' +
          'Banks matter more than this example shows: a fused multiply-add reads three words and writes one every beat, so single-port banks need at least four banks per lane to keep one FMA a cycle going, and a few more to absorb the conflicts of several instructions in flight.',
        checks: [cyclesAre(17)],
      },
      {
        cursor: 9,
        window: { start: 0, end: 16 },
        highlight: { instruction: 1, lane: 0 },
        note: '**Your turn.** Lane 0 takes its first beat in cycle 5, and the FPU latency is 4 cycles.',
        question: {
          kind: 'number',
          text: 'In which cycle does lane 0 write its first result?',
          fact: { kind: 'phase', lane: 0, instruction: 1, field: 'writeStart' },
          explanation: 'The first beat enters the FPU in cycle 5 and its result asks for a write port 4 cycles later: cycle 9, one cycle later than without the conflict.',
        },
        checks: [phaseIs(0, 1, 'execStart', 5)],
      },
    ],
  },
  laneLoads: [{ step: 2, instruction: 1, lane: 0, elements: 8, beats: 8 }],
  experiments: [
    { step: 3, label: '8 banks', machine: { rfBanks: 8 }, checks: [stallCyclesAre('bank', 0), cyclesAre(16), phaseIs(0, 1, 'readEnd', 10)] },
    { step: 3, label: '7 banks', machine: { rfBanks: 7 }, checks: [stallCyclesAre('bank', 0), cyclesAre(16)] },
  ],
})
