import { describe, expect, it } from 'vitest'
import { parseMachine } from '../../../shared/schemas/machine'
import { PRESETS } from '../../../shared/sim/presets'
import { simulate } from '../../../shared/sim/timing/simulate'
import { laneTiming } from '../../../shared/sim/trace/types'
import { ampleMachine, buildOp, buildStream, fma, unitLoad, unitStore } from './factories'

const textbook = parseMachine(PRESETS.find((p) => p.id === 'textbook-1')!.machine)
const fmaStream = (n: number, vl: number) => buildStream(Array.from({ length: n }, (_, i) => fma(8 + (i % 8), 1, 2, vl)))
const long8 = (input = {}) => ampleMachine({ lanes: 8, vlen: 16384, ...input })
const reduction = (vl: number, op = 'vfredusum.vs', shape: 'reduction' | 'ordered-reduction' = 'reduction') =>
  buildStream([buildOp({ op, text: `${op} v4, v8, v1`, shape, vl, dstRegs: [4], srcRegs: [[8], [1]] })])

describe('checks against references outside the project', () => {
  it('textbook (Hennessy and Patterson, vector chapter, from memory): DAXPY at n = 64 with chaining and one memory pipeline takes 3n <= cycles <= 3n + start-up', () => {
    const n = 64
    const stream = buildStream([
      unitLoad(1, n, 0x1000),
      buildOp({ op: 'vfmul.vf', text: 'vfmul.vf v2, v1, fa0', vl: n, srcRegs: [[1]], dstRegs: [2] }),
      unitLoad(3, n, 0x2000),
      buildOp({ op: 'vfadd.vv', text: 'vfadd.vv v4, v2, v3', vl: n, srcRegs: [[2], [3]], dstRegs: [4] }),
      unitStore(4, n, 0x2000),
    ])
    const { trace, error } = simulate(stream, textbook)
    expect(error).toBeUndefined()
    const m = textbook
    const startUp = 3 * m.memLatency + m.units.mul.latency + m.units.fpu.latency
    expect(trace.cycles).toBeGreaterThanOrEqual(3 * n)
    expect(trace.cycles).toBeLessThanOrEqual(3 * n + startUp)
  })

  it('common practice: 8 lanes with one FP64 FMA a cycle peak at 16 flops a cycle', () => {
    const { trace } = simulate(fmaStream(1, 8), parseMachine({ lanes: 8 }))
    expect(trace.metrics.peakFlopsPerCycle).toBe(16)
  })

  it('common practice: a 512-bit load bus fills 8 lanes with one FP64 element each a cycle', () => {
    const { trace } = simulate(buildStream([unitLoad(1, 256)]), long8({ memLatency: 10 }))
    // 256 elements / 8 per cycle = 32 request cycles; every lane gets one element in each.
    for (let l = 0; l < 8; l++) expect(laneTiming(trace, 0, l).beats).toBe(32)
    const t = laneTiming(trace, 0, 0)
    expect(t.writeEnd! - t.writeStart!).toBe(31)
    let bits = 0
    for (let i = 0; i < trace.usage.count; i++) if (trace.resources[trace.usage.resource[i]!]!.name === 'load bus 0') bits += trace.usage.amount[i]! * trace.usage.length[i]!
    expect(bits).toBe(256 * 64)
  })

  it.each([
    [4, 1],
    [6, 1],
    [8, 1],
    [6, 2],
  ])('common practice: with %i banks of %i port(s) an FMA stream runs at most banks x ports / 4 beats a cycle a lane', (rfBanks, rfPortsPerBank) => {
    const { trace } = simulate(fmaStream(40, 64), parseMachine({ lanes: 8, vlen: 16384, rfBanks, rfPortsPerBank }))
    const beatsPerLane = 40 * 8
    const bound = Math.min(1, (rfBanks * rfPortsPerBank) / 4)
    expect(beatsPerLane / trace.cycles).toBeLessThanOrEqual(bound + 1e-9)
  })

  it('common practice: several accumulators speed an unordered reduction by more than 1.6x on long vectors', () => {
    const one = simulate(reduction(256), long8({ reductionAccumulators: 1 })).trace.cycles
    const four = simulate(reduction(256), long8({ reductionAccumulators: 4 })).trace.cycles
    expect(one / four).toBeGreaterThan(1.6)
  })
})

describe('model properties built on those facts', () => {
  it.each(['staggered', 'lockstep'] as const)('a long stream of independent vfmacc.vv at vl 256 on 8 lanes reaches at least 97%% of peak under %s', (issue) => {
    const { trace } = simulate(fmaStream(200, 256), long8({ issue }))
    expect(trace.metrics.flopsPerCycle / trace.metrics.peakFlopsPerCycle).toBeGreaterThanOrEqual(0.97)
  })

  it('the same stream runs clearly below peak under serial', () => {
    const staggered = simulate(fmaStream(200, 256), long8({ issue: 'staggered' })).trace.metrics
    const serial = simulate(fmaStream(200, 256), long8({ issue: 'serial' })).trace.metrics
    expect(serial.flopsPerCycle / serial.peakFlopsPerCycle).toBeLessThan(0.9)
    expect(serial.flopsPerCycle).toBeLessThan(staggered.flopsPerCycle * 0.92)
  })

  it('an unordered sum at vl 256 on 8 lanes with FPU latency 4 runs at least 1.6x faster with 4 accumulators than with 1', () => {
    const m = (A: number) => long8({ reductionAccumulators: A, units: { fpu: { latency: 4 } } })
    const one = simulate(reduction(256), m(1)).trace.cycles
    const four = simulate(reduction(256), m(4)).trace.cycles
    expect(one / four).toBeGreaterThanOrEqual(1.6)
  })

  it.each([
    [4, 1],
    [6, 2],
  ])('ordered vfredosum at vl 256 costs about vl x (D + ringHopLatency) with D = %i and hop %i', (D, hop) => {
    const { trace } = simulate(reduction(256, 'vfredosum.vs', 'ordered-reduction'), long8({ units: { fpu: { latency: D } }, ringHopLatency: hop }))
    const expected = 256 * (D + hop)
    expect(Math.abs(trace.cycles - expected) / expected).toBeLessThan(0.02)
  })
})
