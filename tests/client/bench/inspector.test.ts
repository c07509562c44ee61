import { describe, expect, it } from 'vitest'
import { laneTiming } from '@shared/sim/trace/types'
import { busyResources, indexTrace, inspectCycle, phaseBounds } from '@/lib/bench/inspector'
import { singleAdd, handTrace } from './fixtures'

describe('phaseBounds', () => {
  it.each([
    // total, start, end, cycle, expected   (one word a cycle at most: timing model section 1, 64-bit datapath)
    [8, 10, 17, 9, { lo: 0, hi: 0 }],
    [8, 10, 17, 10, { lo: 1, hi: 1 }],
    [8, 10, 17, 13, { lo: 4, hi: 4 }],
    [8, 10, 20, 12, { lo: 0, hi: 3 }],
    [8, 10, 20, 18, { lo: 6, hi: 8 }],
    [8, 10, 20, 20, { lo: 8, hi: 8 }],
  ])('bounds %i words over cycles %i..%i at cycle %i', (total, start, end, cycle, expected) => {
    expect(phaseBounds(total, start, end, cycle)).toEqual(expected)
  })

  it('narrows to the exact count when the phase ran without gaps (common practice: a gapless phase moves one word a cycle)', () => {
    const b = phaseBounds(16, 3, 18, 7)
    expect(b.lo).toBe(b.hi)
    expect(b.lo).toBe(5)
  })
})

describe('inspectCycle on one vfadd.vv (handbook timing model section 5)', () => {
  // 16 FP64 elements on one lane: b = 16 beats, D = 4 (FPU default).
  const r = singleAdd(16, { lanes: 1 })
  const trace = r.trace
  const idx = indexTrace(trace)
  const add = trace.instructions.find((i) => i.op === 'vfadd.vv')!
  const pos = trace.instructions.indexOf(add)
  const d = add.dispatch!

  it('runs the closed form: reads d+1..d+b, executes d+2..d+b+1, writes d+2+D..d+b+1+D', () => {
    const t = laneTiming(trace, pos, 0)
    expect([t.readStart, t.readEnd, t.execStart, t.writeStart, t.writeEnd]).toEqual([d + 1, d + 16, d + 2, d + 6, d + 21])
  })

  it('shows the instruction reading and executing five cycles in, with exact progress', () => {
    const s = inspectCycle(idx, d + 5).lanes[0]!
    expect(s.phases.read).toEqual([expect.objectContaining({ index: add.index, done: { lo: 5, hi: 5 }, total: 16 })])
    expect(s.phases.exec).toEqual([expect.objectContaining({ index: add.index, done: { lo: 4, hi: 4 }, total: 16 })])
    expect(s.phases.write).toEqual([])
  })

  it('counts one word waiting in the operand queue: five read, four taken by the unit', () => {
    const s = inspectCycle(idx, d + 5).lanes[0]!
    expect(s.queues).toEqual([{ index: add.index, fill: { lo: 1, hi: 1 }, depth: trace.machine.operandQueueDepth }])
  })

  it('names the lane FPU as busy with the vfadd.vv in an execute cycle', () => {
    const fpu = busyResources(idx, d + 5).find((u) => u.name === 'lane 0 fpu')
    expect(fpu?.users.map((u) => u.text)).toEqual([add.text])
    expect(fpu?.used).toBe(1)
  })

  it('shows only the write phase after the last beat, with the count of words written', () => {
    const s = inspectCycle(idx, d + 19).lanes[0]!
    expect(s.phases.read).toEqual([])
    expect(s.phases.write[0]?.done).toEqual({ lo: 14, hi: 14 })
    expect(s.queues).toEqual([])
  })
})

describe('inspectCycle stall reasons', () => {
  it('reports the stall span covering the cycle with the waiting instruction', () => {
    const trace = handTrace(
      [
        { text: 'vfadd.vv v1,v2,v3', lanes: [[2, 2, 1, 2, 2, 7, 6, 7]] },
        { text: 'vfmul.vv v4,v1,v1', lanes: [[2, 2, 7, 8, 8, 12, 12, 13]] },
      ],
      [{ lane: 0, start: 3, length: 4, reason: 0, instruction: 1 }],
    )
    const idx = indexTrace(trace)
    expect(inspectCycle(idx, 4).lanes[0]!.stall).toEqual({ reason: 'raw', index: 1, text: 'vfmul.vv v4,v1,v1' })
    expect(inspectCycle(idx, 7).lanes[0]!.stall).toBeNull()
  })
})
