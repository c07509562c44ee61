/**
 * Bounds and closed forms derived by hand from the timing model (the team's
 * timing model v2, in the project's words in docs/model.md), one machine field
 * or section at a time. Each expected value is worked out in the comment
 * beside it; none comes from running the engine.
 *
 * Notation: L lanes, b beats a lane, D the FPU latency. The single-instruction
 * closed form (model section 5): one vfadd.vv dispatched in cycle 0 reads in
 * 1..b, takes beats in 2..b+1, writes in 2+D..b+1+D, and the run takes
 * b + D + 2 cycles (cycles count from 0 to the last busy one).
 */
import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import type { VectorOp } from '../../../shared/sim/exec/stream'
import { createTimingState, finish, step } from '../../../shared/sim/timing/simulate'
import { laneTiming } from '../../../shared/sim/trace/types'
import { runPipeline } from '../../../shared/sim/run'
import { REDUCTION_CURVE } from '../../sweep/programs'
import { ampleMachine, buildOp, buildStream, unitLoad, unitStore } from './factories'

const D = 4
const vfadd = (d: number, vl: number, a = 1, b = 2): VectorOp => buildOp({ vl, dstRegs: [d], srcRegs: [[a], [b]], text: `vfadd.vv v${d}, v${a}, v${b}` })
const vdiv = (d: number, vl: number): VectorOp => buildOp({ op: 'vdiv.vv', text: `vdiv.vv v${d}, v1, v2`, unit: 'div', flopsPerElement: 0, vl, dstRegs: [d], srcRegs: [[1], [2]] })
const independent = (n: number, vl: number) => Array.from({ length: n }, (_, k) => vfadd(8 + k, vl))
const cyclesOf = (ops: VectorOp[], machine: Parameters<typeof ampleMachine>[0]) => {
  const s = createTimingState(buildStream(ops), ampleMachine(machine), { identicalLanes: false })
  while (step(s));
  const { trace, error } = finish(s)
  expect(error).toBeUndefined()
  return trace
}

describe('lane slots (model section 4: an instruction holds a slot from its first read to its last write)', () => {
  it('n independent instructions of b beats on one slot take at least n x (b + D) cycles', () => {
    // With laneSlots 1 the next instruction starts reading only after the previous one wrote its last word:
    // each occupies the lane for its b reads/beats and D cycles of latency, b + D cycles at least, in turn.
    const n = 6
    const b = 4 // vl 32 on 8 lanes, FP64: 4 elements a lane, one a beat
    const t = cyclesOf(independent(n, 32), { lanes: 8, laneSlots: 1 })
    expect(t.cycles).toBeGreaterThanOrEqual(n * (b + D))
  })

  it('three slots overlap them: the same stream takes fewer cycles than on one', () => {
    // Common practice: more slots let the next instruction read while the previous one waits out its latency.
    expect(cyclesOf(independent(6, 32), { lanes: 8, laneSlots: 3 }).cycles).toBeLessThan(cyclesOf(independent(6, 32), { lanes: 8, laneSlots: 1 }).cycles)
  })
})

describe('renaming (model section 3: a physical register returns to the pool when its replacing writer finishes)', () => {
  it('one spare physical register serialises writers: n of them take at least n x (b + D + 1) cycles', () => {
    // physRegs 33 leaves one register beyond the 32 architectural ones. Writer k + 1 needs it, and it is freed
    // only when writer k finishes: writer k, dispatched in cycle t, finishes in t + b + D + 1 at the earliest
    // (the closed form), and writer k + 1 is dispatched no earlier than that. So dispatches are b + D + 1
    // apart, and n writers need n x (b + D + 1) cycles.
    const n = 5
    const b = 4
    expect(cyclesOf(independent(n, 32), { lanes: 8, physRegs: 33 }).cycles).toBeGreaterThanOrEqual(n * (b + D + 1))
  })
})

describe('dispatch width (model section 2: up to dispatchWidth vector instructions a cycle, in program order)', () => {
  it('n one-beat instructions dispatched one a cycle end no earlier than n - 1 + (1 + D + 2)', () => {
    // The last one is dispatched in cycle n - 1 at the earliest; from its dispatch it needs b + D + 2 cycles (b = 1)
    // counted from its dispatch cycle: the run lasts at least (n - 1) + D + 3 cycles.
    const n = 12
    expect(cyclesOf(independent(n, 8), { lanes: 8, dispatchWidth: 1 }).cycles).toBeGreaterThanOrEqual(n - 1 + D + 3)
  })

  it('with dispatch width 4 the last of 12 is dispatched in cycle 2 at the earliest, and every instruction no earlier than floor(k / 4)', () => {
    const t = cyclesOf(independent(12, 8), { lanes: 8, dispatchWidth: 4 })
    t.instructions.forEach((ins, k) => expect(ins.dispatch).toBeGreaterThanOrEqual(Math.floor(k / 4)))
    expect(t.instructions.filter((i) => i.dispatch === 0)).toHaveLength(4)
  })
})

describe('gathers (model section 7: strided and indexed accesses move gatherElementsPerCycle elements a cycle)', () => {
  it.each([1, 2, 4])('a strided load of vl 64 at g = %i elements a cycle takes at least 64 / g cycles of bus', (g) => {
    // 64 elements at g a cycle need 64 / g cycles of requests, then memLatency until the last arrives.
    const op = unitLoad(8, 64, 0x1000, 64, { memory: { pattern: 'strided', isStore: false, addresses: Float64Array.from({ length: 64 }, (_, i) => 0x1000 + 64 * i) } })
    const t = cyclesOf([op], { lanes: 8, gatherElementsPerCycle: g, memLatency: 16 })
    expect(t.cycles).toBeGreaterThanOrEqual(64 / g + 16)
  })
})

describe('permutations over the ring (model section 9: a ring link carries one word a cycle each way)', () => {
  // vslidedown by one: destination element i comes from source element i + 1. Element i lives in lane i mod L,
  // so each moved element goes from lane (i + 1) mod L to lane i mod L: (i - (i + 1)) mod L = L - 1 hops on a
  // one-way ring, and 1 hop the other way on a bidirectional ring. vl - 1 elements move (the last gets none).
  const L = 8
  const vl = 64
  const slide = buildOp({ op: 'vslidedown.vi', shape: 'permutation', unit: 'alu', flopsPerElement: 0, vl, dstRegs: [8], srcRegs: [[4]], sourceIndex: Int32Array.from({ length: vl }, (_, i) => (i + 1 < vl ? i + 1 : -1)) })
  const linkWords = (ringBidirectional: boolean) => {
    const t = cyclesOf([slide], { lanes: L, ringBidirectional })
    const links = L * 2
    return { words: Math.round(t.metrics.ringUtilization * t.cycles * links), cycles: t.cycles }
  }

  it('a slide down by one crosses L - 1 links per element on a one-way ring: (vl - 1) x (L - 1) link-words', () => {
    expect(linkWords(false).words).toBe((vl - 1) * (L - 1))
  })

  it('and one link per element on a bidirectional ring: vl - 1 link-words, and no more cycles', () => {
    const two = linkWords(true)
    expect(two.words).toBe(vl - 1)
    expect(two.cycles).toBeLessThanOrEqual(linkWords(false).cycles)
  })
})

describe('stepping the engine by hand (createTimingState, step): one vfadd.vv, vl 4, one lane, ample ports', () => {
  it('dispatches in cycle 0, reads 1..4, executes 2..5, writes 6..9 and ends after cycle 9 (b + D + 2 = 10 cycles)', () => {
    // Closed form with b = 4 (4 elements, one a beat), D = 4.
    const s = createTimingState(buildStream([vfadd(3, 4)]), ampleMachine({ lanes: 1, vlen: 256 }), { identicalLanes: false })
    const busy: number[] = []
    const more: boolean[] = []
    for (let c = 0; c < 10; c++) {
      more.push(step(s))
      expect(s.cycle).toBe(c + 1)
      busy.push(s.ctx.progress[0] ?? 0)
      if (c === 0) {
        // After cycle 0: the op was dispatched and nothing else has happened in the lane.
        expect(s.opIdx).toBe(1)
        expect(s.dispatchAt[0]).toBe(0)
        expect(s.completeAt[0]).toBe(-1)
      }
    }
    expect(more).toEqual([true, true, true, true, true, true, true, true, true, false])
    expect(busy).toEqual([0, 1, 1, 1, 1, 1, 1, 1, 1, 1])
    expect(s.completeAt[0]).toBe(9)
    const { trace } = finish(s)
    expect(trace.cycles).toBe(10)
    expect(laneTiming(trace, 0, 0)).toMatchObject({ readStart: 1, readEnd: 4, execStart: 2, writeStart: 6, writeEnd: 9 })
  })
})

describe('reduction accumulators past the FPU latency (model section 8; docs/model.md "Two rules of thumb")', () => {
  it('8 accumulators take exactly D = 4 cycles more than 4 on a 256-element sum: one more combine level, nothing gained in the fold', () => {
    // Lane 7 holds 32 elements and takes its first beat in cycle 41. With A >= D no beat waits for its
    // accumulator, so beats run in 41..72 for A = 4 and A = 8 alike, the unit busy every cycle.
    // A = 4: partials ready 73..76; the two earliest ready are combined in 74 (ready 78), 76 (80), 80 (84).
    // A = 8: partials ready 69..76; combines in 73 (77), 74 (78), 75 (79), 76 (80), 78 (82), 80 (84), 84 (88).
    // The ring, vs1[0] and the write are the same afterwards, so the run is 4 cycles longer.
    const run = (reductionAccumulators: number) => {
      const r = runPipeline({ program: REDUCTION_CURVE, machine: { reductionAccumulators } })
      if (!r.ok) throw new Error(r.error.message)
      return r.trace
    }
    const [four, eight] = [run(4), run(8)]
    const last = four.instructions.length - 1
    expect(laneTiming(four, last, 7)).toMatchObject({ execStart: 41, execEnd: 84 })
    expect(laneTiming(eight, last, 7)).toMatchObject({ execStart: 41, execEnd: 88 })
    expect(eight.cycles - four.cycles).toBe(D)
  })
})

describe('carry and borrow outs write a mask (model version 3; RISC-V V 1.0 section 11.4: vmadc and vmsbc write mask registers)', () => {
  it.each(['vmadc.vv', 'vmsbc.vv'])('%s at SEW 64 writes one word a lane, after its last beat: write at b + 1 + D, cycles b + D + 2', (op) => {
    // 8 lanes, vl 512: n = 64 elements and b = 64 beats a lane (the ALU takes 64 / SEW = 1 element a beat).
    // Reads in 1..64, beats in 2..65 (section 5); the destination is 64 mask bits = one word, complete with
    // the last beat, so it asks for a port at 65 + D with the ALU latency D = 2 and is written then.
    const alu = 2
    const b = 64
    const trace = cyclesOf([buildOp({ op, text: `${op} v3, v1, v2`, unit: 'alu', flopsPerElement: 0, vl: 512 })], { lanes: 8, vlen: 8 * 64 * 64 })
    for (let l = 0; l < 8; l++) expect(laneTiming(trace, 0, l)).toMatchObject({ readStart: 1, readEnd: b, execStart: 2, writeStart: b + 1 + alu, writeEnd: b + 1 + alu })
    expect(trace.cycles).toBe(b + alu + 2)
  })
})

describe('segment accesses move nf fields per element (model version 3; handbook section 11; docs/model.md "Segment accesses")', () => {
  // 8 lanes, vl 256, EEW 64, 512-bit buses: 8 values of 64 bits a bus cycle; ample ports; memLatency M = 16.
  // The access is dispatched in cycle 0 and gets the memory port in cycle 1.
  const M = 16
  const machine = { lanes: 8, memLatency: M }
  const vl = 256
  it('vlseg2e64.v requests its 2 x 256 values in cycles 1..64: 1 + 64 + M cycles, 32 more than vle64.v (1 + 32 + M)', () => {
    const plain = cyclesOf([unitLoad(8, vl)], machine)
    const seg = cyclesOf([unitLoad(8, vl, 0x1000, 64, { nf: 2, dstRegs: [8, 9, 10, 11] })], machine)
    expect(plain.cycles).toBe(1 + 32 + M)
    expect(seg.cycles).toBe(1 + 64 + M)
    // Lane 7 gets both fields of element 255, the last values, requested in cycle 64: written on arrival in 64 + M.
    expect(laneTiming(seg, 0, 7)).toMatchObject({ elements: 32, writeEnd: 64 + M })
    // 2 x 256 x 64 bits over 81 cycles of a 512-bit bus.
    expect(seg.metrics.busUtilization.load).toBeCloseTo((2 * vl * 64) / (81 * 512), 12)
  })

  it('vsseg2e64.v reads 64 words a lane, one a cycle: element j is ready in 2j + 3, the last bus row leaves in 66, 67 cycles (vse64.v: 34)', () => {
    // Plain: lane l reads word j in j + 1, sends element j in j + 2 (8 elements, one bus row, a cycle): last in 33.
    // Segment: the two words of element j are read in 2j + 1 and 2j + 2 and queued by 2j + 3; a bus row of
    // 8 elements is 16 values, two cycles: lanes 0-3 in 2j + 3, lanes 4-7 in 2j + 4. Row 31: 65 and 66.
    const plain = cyclesOf([unitStore(8, vl)], machine)
    const seg = cyclesOf([{ ...unitStore(8, vl), nf: 2, srcRegs: [[8, 9, 10, 11]] }], machine)
    expect(plain.cycles).toBe(34)
    expect(seg.cycles).toBe(67)
    expect(laneTiming(seg, 0, 0)).toMatchObject({ readStart: 1, readEnd: 64, writeEnd: 65 })
    expect(laneTiming(seg, 0, 7)).toMatchObject({ readStart: 1, readEnd: 64, writeEnd: 66 })
  })
})

describe('segment accesses of every shape finish, no faster than their bus allows (model version 3; fast-check)', () => {
  it('loads and stores of nf 2..8 fields, EEW 8..64, unit-stride or strided, any queue depth: done, and at least vl x nf x EEW / busBits cycles on the bus', () => {
    fc.assert(
      fc.property(
        fc.record({
          lanes: fc.constantFrom(1, 3, 4, 8),
          nf: fc.integer({ min: 2, max: 8 }),
          eew: fc.constantFrom(8, 16, 32, 64 as const),
          vl: fc.integer({ min: 1, max: 40 }),
          store: fc.boolean(),
          strided: fc.boolean(),
          operandQueueDepth: fc.integer({ min: 1, max: 4 }),
        }),
        ({ lanes, nf, eew, vl, store, strided, operandQueueDepth }) => {
          const regs = Array.from({ length: nf }, (_, f) => 8 + f)
          const pattern = strided ? ('strided' as const) : ('unit' as const)
          const addresses = Float64Array.from({ length: vl }, (_, i) => 0x1000 + i * nf * (eew / 8) * (strided ? 2 : 1))
          const base = store ? unitStore(8, vl, 0x1000, eew) : unitLoad(8, vl, 0x1000, eew)
          const op: VectorOp = { ...base, nf, memory: { pattern, isStore: store, addresses }, ...(store ? { srcRegs: [regs] } : { dstRegs: regs }) }
          const trace = cyclesOf([op], { lanes, vlen: Math.max(64 * lanes, 512), operandQueueDepth })
          // cyclesOf checks the run ended without error; the bus moves at most 512 / EEW values (gathers: 1) a cycle.
          const perCycle = strided ? 1 : 512 / eew
          expect(trace.cycles).toBeGreaterThanOrEqual(Math.ceil((vl * nf) / perCycle))
        },
      ),
      { numRuns: 150 },
    )
  })
})

describe('the divider (model section 6; docs/model.md "Divider": one element a beat, not pipelined, the result after cyclesPerBeat)', () => {
  // One lane, ample ports, K = cyclesPerBeat. Reads of word j come in 1 + j while the operand queue (depth 4)
  // has room, and in any case in the cycle of beat j - 4, which is before 2 + jK for K >= 1: so beats are bound
  // by the divider alone. Beat j enters in 2 + jK (the unit is busy K cycles a beat), its result asks for a write
  // port in 2 + jK + K and is written then (results are K cycles apart, one write port is enough). The last of b
  // beats writes in 2 + bK, and the run ends after that cycle: bK + 3 cycles (with K = D this is b + D + 2 for b = 1).
  const K = 20
  const machine = { lanes: 1, vlen: 512, units: { div: { cyclesPerBeat: K } } }

  it('one vdiv.vv of b = 4 elements: beats 2, 2 + K, 2 + 2K, 2 + 3K; writes 2 + K .. 2 + 4K; 4K + 3 cycles', () => {
    const trace = cyclesOf([vdiv(3, 4)], machine)
    expect(trace.cycles).toBe(4 * K + 3)
    expect(laneTiming(trace, 0, 0)).toMatchObject({ elements: 4, beats: 4, readStart: 1, readEnd: 4, execStart: 2, writeStart: 2 + K, writeEnd: 2 + 4 * K })
  })

  it('two independent ones share it: the second one\'s beats follow the first one\'s, 2 x 4K + 3 cycles', () => {
    // The second one reads its words long before the divider frees (from 6 on, with the default 3 slots), so its
    // beat j enters in 2 + (4 + j)K and its last result is written in 2 + 8K.
    const trace = cyclesOf([vdiv(3, 4), vdiv(4, 4)], machine)
    expect(trace.cycles).toBe(8 * K + 3)
    expect(laneTiming(trace, 1, 0)).toMatchObject({ execStart: 2 + 4 * K, writeStart: 2 + 5 * K, writeEnd: 2 + 8 * K })
  })
})

describe('the store bus width (model section 7: a unit-stride store sends storeBusBits / EEW elements a cycle, in element order)', () => {
  // 8 lanes, vl 256, EEW 64: lane l holds elements l, l + 8, ...; it reads word j in j + 1 and may send it from
  // j + 2 (see the segment store above: with a 512-bit bus, a row of 8 elements a cycle, the last leaves in 33,
  // 34 cycles). A 256-bit bus carries 4 elements a cycle: group g of 4 elements (lanes 0-3 or 4-7 of row
  // floor(g / 2)) leaves in 2 + g, since row j is ready in j + 2 <= 2 + g. Groups 0..63: the last leaves in 65,
  // 66 cycles; lane 0 sends its last element (group 62) in 64, lane 7 (group 63) in 65. A 1024-bit bus could
  // carry 16 elements, but the lanes give only 8 a cycle (one word a lane a cycle): 34 cycles, as at 512.
  const vl = 256
  const storeCycles = (storeBusBits: number) => cyclesOf([unitStore(8, vl)], { lanes: 8, storeBusBits })
  it('512 bits: 34 cycles; 256 bits: 66, lane 0 done in 64 and lane 7 in 65; 1024 bits: still 34', () => {
    expect(storeCycles(512).cycles).toBe(34)
    const half = storeCycles(256)
    expect(half.cycles).toBe(66)
    expect(laneTiming(half, 0, 0)).toMatchObject({ elements: 32, readStart: 1, writeEnd: 64 })
    expect(laneTiming(half, 0, 7)).toMatchObject({ elements: 32, writeEnd: 65 })
    expect(storeCycles(1024).cycles).toBe(34)
  })
})

describe('chaining (model section 5: with chaining a word can be read the cycle after it is written; without, once its writer finished)', () => {
  // One lane, ample ports, b = 4, D = 4. The producer vfadd.vv v3 reads 1..4, takes beats 2..5 and writes word j
  // in 6 + j (closed form). The consumer vfadd.vv v4, v3, v2 may start reading in 5 (staggered issue: the cycle
  // after the producer's last read); its other source v2 is ready, and its 4 words fill the queue (depth 4) in
  // 5..8 either way. Chained, word j of v3 is readable from 7 + j, so the consumer reads v3 in 7..10, beats
  // 8..11, writes 12..15: 16 cycles. Unchained, every word of v3 is readable from the cycle after the producer's
  // last write (9): v3 read in 10..13, beats 11..14, writes 15..18: 19 cycles (2b + 2D + 3).
  const dependent = () => [vfadd(3, 4), vfadd(4, 4, 3, 2)]
  it('chained: 16 cycles, the consumer reading v3 in 7..10; unchained: 19, reading it in 10..13', () => {
    const chained = cyclesOf(dependent(), { lanes: 1, vlen: 256, chaining: true })
    expect(chained.cycles).toBe(16)
    expect(laneTiming(chained, 1, 0)).toMatchObject({ readStart: 5, readEnd: 10, execStart: 8, writeStart: 12, writeEnd: 15 })
    const unchained = cyclesOf(dependent(), { lanes: 1, vlen: 256, chaining: false })
    expect(unchained.cycles).toBe(19)
    expect(laneTiming(unchained, 1, 0)).toMatchObject({ readStart: 5, readEnd: 13, execStart: 11, writeStart: 15, writeEnd: 18 })
  })
})

describe('operand queues (model section 5: operandQueueDepth words a source operand; a beat frees its words)', () => {
  // The divider above (K = 20, one lane) with b = 8: word j < q is read in 1 + j; word j >= q only once beat
  // j - q has freed an entry, in that beat's cycle 2 + (j - q)K (beats come before reads in a cycle). So the last
  // word is read in 2 + (7 - q)K: 102 with q = 2, 62 with q = 4, 8 with q = 8; the beats, and the run's
  // 8K + 3 = 163 cycles, do not change.
  const K = 20
  it.each([
    [2, 2 + 5 * K],
    [4, 2 + 3 * K],
    [8, 8],
  ])('depth %i: the last word is read in %i, and the run still takes 8K + 3 cycles', (operandQueueDepth, readEnd) => {
    const trace = cyclesOf([vdiv(3, 8)], { lanes: 1, vlen: 512, operandQueueDepth, units: { div: { cyclesPerBeat: K } } })
    expect(laneTiming(trace, 0, 0)).toMatchObject({ readStart: 1, readEnd, execStart: 2, writeEnd: 2 + 8 * K })
    expect(trace.cycles).toBe(8 * K + 3)
  })
})

describe('the arithmetic queue (model section 2: arithQueueDepth dispatched instructions wait; an entry frees when its instruction started in every lane)', () => {
  // One lane, b = 8, 6 independent vfadd.vv. The lane starts instruction k in 1 + 8k (each the cycle after the
  // previous one's last read). With depth 2, instructions 0..2 are dispatched in 0, 1, 2; then the queue holds two
  // and the next one is dispatched in the cycle an entry frees (the lanes issue before the front end in a cycle):
  // instruction k >= 3 in the start of k - 2, 1 + 8(k - 2). The lane never waits for dispatch, so the run takes
  // 6 x 8 + D + 2 = 54 cycles at any depth; with depth 8 all six are dispatched in 0..5.
  const ops = () => independent(6, 8)
  it('depth 2: dispatched in 0, 1, 2, 9, 17, 25; depth 8: in 0..5; 54 cycles either way', () => {
    const run = (arithQueueDepth: number) => {
      const s = createTimingState(buildStream(ops()), ampleMachine({ lanes: 1, vlen: 512, arithQueueDepth }), { identicalLanes: false })
      while (step(s));
      return { dispatch: Array.from(s.dispatchAt), cycles: finish(s).trace.cycles }
    }
    expect(run(2)).toEqual({ dispatch: [0, 1, 2, 9, 17, 25], cycles: 54 })
    expect(run(8)).toEqual({ dispatch: [0, 1, 2, 3, 4, 5], cycles: 54 })
  })
})

describe('the load bus width (model section 7: a unit-stride load requests loadBusBits / EEW elements a cycle)', () => {
  // 8 lanes, vl 256, EEW 64, memLatency M = 16, the port taken in cycle 1: 256 x 64 bits at B bits a cycle are
  // requested in cycles 1 .. 16384 / B, the last arrives M later and is written on arrival: 16384 / B + 1 + M
  // cycles. 256 bits: 81; 512: 49; 1024: 33 (16 elements a cycle, two for each lane, which writes two a cycle).
  const M = 16
  it.each([
    [256, 81],
    [512, 49],
    [1024, 33],
  ])('%i bits: %i cycles', (loadBusBits, cycles) => {
    expect(cyclesOf([unitLoad(8, 256)], { lanes: 8, memLatency: M, loadBusBits }).cycles).toBe(cycles)
  })
})

describe('issue policies (model section 4: when a lane may start its next arithmetic instruction)', () => {
  // 2 lanes, vl 3: lane 0 holds 2 elements (b = 2), lane 1 holds 1; three independent vfadd.vv dispatched in
  // 0, 1, 2; D = 4; the default 3 lane slots are enough for all three. Lane 0 starts instruction k in 1 + 2k
  // under `staggered` and `lockstep` (the cycle after its last read of k - 1), reads 1 + 2k..2 + 2k and writes
  // its last word in 7 + 2k: 12 cycles. Lane 1:
  // - staggered: starts k the cycle after its own last read of k - 1 and after k's dispatch: 1 + k; its last
  //   write is in 6 + k, 8 for the third;
  // - lockstep: starts k with lane 0, when every lane has read k - 1: 1 + 2k; last write 10;
  // - serial: starts k the cycle after k - 1 completed everywhere (its last write, 7 + 7(k - 1) on lane 0):
  //   1 + 7k in both lanes, so lane 0 writes its last word in 7 + 7k = 21, lane 1 in 20: 22 cycles.
  const ops = () => Array.from({ length: 3 }, (_, k) => vfadd(8 + k, 3))
  it.each([
    ['staggered', 12, 3, 8],
    ['lockstep', 12, 5, 10],
    ['serial', 22, 15, 20],
  ] as const)('%s: %i cycles; lane 1 starts the third instruction in %i and writes it in %i', (issue, cycles, start, write) => {
    const trace = cyclesOf(ops(), { lanes: 2, vlen: 256, issue })
    expect(trace.cycles).toBe(cycles)
    expect(laneTiming(trace, 2, 1)).toMatchObject({ elements: 1, readStart: start, writeEnd: write })
  })
})

describe('unit latencies (model section 5: a result asks for its write port `latency` cycles after its beat)', () => {
  // The closed form with the unit's latency in place of D: one instruction of b = 4 beats on one lane reads in
  // 1..4, beats in 2..5, writes in 2 + lat..5 + lat, and takes b + lat + 2 cycles.
  it.each([
    ['alu', 'vadd.vv', 1],
    ['alu', 'vadd.vv', 6],
    ['mul', 'vmul.vv', 5],
    ['fpu', 'vfadd.vv', 7],
  ] as const)('%s (%s) at latency %i: writes from 2 + latency, b + latency + 2 cycles', (unit, op, latency) => {
    const inst = buildOp({ op, text: `${op} v3, v1, v2`, unit, flopsPerElement: unit === 'fpu' ? 1 : 0, vl: 4, dstRegs: [3], srcRegs: [[1], [2]] })
    const trace = cyclesOf([inst], { lanes: 1, vlen: 256, units: { [unit]: { latency } } })
    expect(trace.cycles).toBe(4 + latency + 2)
    expect(laneTiming(trace, 0, 0)).toMatchObject({ execStart: 2, writeStart: 2 + latency, writeEnd: 5 + latency })
  })
})

describe('the ring hop latency (model section 8: lane partials walk down the ring, a hop taking ringHopLatency cycles)', () => {
  // vfredusum.vs at vl = L = 8, one element a lane, D = 4, hop h. Every lane reads its element in 1, folds it in
  // 2, and knows its partial in 2 + D (it is ready then), during the lanes' turn; the ring moves values at the
  // start of a cycle, so lane 7 sends in s0 = 3 + D. A value sent in s arrives h later and is added there
  // (one beat), ready D later, and sent on at once: s(k + 1) = s(k) + h + D. Lane 0 adds the value sent in
  // s6 in a = s6 + h, adds vs1[0] D later, and writes vd[0] D after that: cycles = a + 2D + 1
  // = 4 + 2D + 7(h + D). h = 1: 47; h = 3: 61; each cycle of hop adds L - 1 = 7.
  const sum = () => buildOp({ op: 'vfredusum.vs', text: 'vfredusum.vs v3, v1, v2', shape: 'reduction', vl: 8, dstRegs: [3], srcRegs: [[1], [2]] })
  it.each([
    [1, 47],
    [3, 61],
  ])('hop %i: %i cycles on 8 lanes', (ringHopLatency, cycles) => {
    expect(cyclesOf([sum()], { lanes: 8, vlen: 512, ringHopLatency, interLane: 'ring' }).cycles).toBe(cycles)
  })
})

describe('FPU elements a beat (model section 1: fpuElementsPerCycle[SEW] elements a beat; a lane reads one word of each operand a cycle)', () => {
  // vfadd.vv at SEW 32, vl 8 on one lane (4 words an operand), D = 4, ample ports, e elements a beat:
  // - e = 1: 8 beats; beat j needs word floor(j / 2), read in 1 + floor(j / 2), so beats run 2..9 and the last
  //   word is complete after beat 7: written in 9 + D, 14 cycles (b + D + 2 with b = 8);
  // - e = 2: 4 beats, beat j needs word j (read in 1 + j): beats 2..5, a word a beat, 10 cycles;
  // - e = 4: 2 beats, beat j needs words 2j and 2j + 1 (read in 1 + 2j and 2 + 2j): beats in 3 and 5, the last
  //   two words written in 5 + D: 10 cycles. Past 64 bits of elements a beat the operand reads bound the lane.
  const fadd32 = () => buildOp({ vl: 8, sew: 32, eew: 32 })
  it.each([
    [1, 14],
    [2, 10],
    [4, 10],
  ])('%i FP32 elements a beat: %i cycles', (e, cycles) => {
    const trace = cyclesOf([fadd32()], { lanes: 1, vlen: 256, fpuElementsPerCycle: { 64: 1, 32: e, 16: 4 } })
    expect(trace.cycles).toBe(cycles)
    expect(laneTiming(trace, 0, 0)).toMatchObject({ elements: 8, beats: 8 / e })
  })
})
