/**
 * Issue 10, "why is it slow": a ragged tail said in numbers. Element i lives
 * in lane i mod L (the machine schema's own description of `lanes`, the
 * handbook's section 1), so vl 250 on 8 lanes is 8 × 31 + 2: lanes 0–1 hold
 * 32 elements and lanes 2–7 hold 31 (counted by hand). The neighbour runs
 * of the Worker (the stream timed at another vl) are checked against real
 * runs of the program with that vl written in its text.
 */
import { describe, expect, it } from 'vitest'
import { runPipeline } from '@shared/sim/run'
import { laneRanges, raggedTail, raggedTailSentence } from '@/lib/bench/raggedTail'
import { neighbourCycles } from '@/lib/bench/vlNeighbours'

const program = (vl: number) => `    .data
    .balign 8
src:
    .zero 4096
    .text
    li      a0, ${vl}
    vsetvli t0, a0, e64, m2, ta, ma
    la      a1, src
    vle64.v v2, (a1)
    vfadd.vv v4, v2, v2
    vfadd.vv v6, v2, v2
    vfmacc.vv v8, v2, v4
    vfmacc.vv v10, v2, v6
    vse64.v v8, (a1)
`
const machine = { lanes: 8 }
const cyclesAt = (vl: number) => {
  const r = runPipeline({ program: program(vl), machine })
  if (!r.ok) throw new Error(r.error.message)
  return r.trace.cycles
}

describe('ragged tails', () => {
  it('names lane ranges the way people write them', () => {
    expect(laneRanges([0, 1])).toBe('lanes 0–1')
    expect(laneRanges([3])).toBe('lane 3')
    expect(laneRanges([0, 2, 3, 4])).toBe('lanes 0, 2–4')
  })

  it('finds vl 250 on 8 lanes: lanes 0–1 have 32 elements, lanes 2–7 have 31, neighbours 256 and 248', () => {
    const r = runPipeline({ program: program(250), machine })
    if (!r.ok) throw new Error(r.error.message)
    const t = raggedTail(r.trace)
    expect(t).toEqual({ vl: 250, instructions: 6, high: { lanes: [0, 1], elements: 32 }, low: { lanes: [2, 3, 4, 5, 6, 7], elements: 31 }, upVl: 256, downVl: 248 })
  })

  it('finds nothing when the lanes divide vl', () => {
    const r = runPipeline({ program: program(256), machine })
    if (!r.ok) throw new Error(r.error.message)
    expect(raggedTail(r.trace)).toBeNull()
  })

  it('times the neighbours as the program itself would run at that vl', () => {
    const measured = neighbourCycles(program(250), machine, 250, [256, 248])
    expect(measured).toEqual([
      { vl: 256, cycles: cyclesAt(256) },
      { vl: 248, cycles: cyclesAt(248) },
    ])
  })

  it('says it in numbers once the neighbours are measured', () => {
    const r = runPipeline({ program: program(250), machine })
    if (!r.ok) throw new Error(r.error.message)
    const t = raggedTail(r.trace)!
    const measured = neighbourCycles(program(250), machine, 250, [t.upVl, t.downVl])
    const sentence = raggedTailSentence(t, r.trace.cycles, measured)
    expect(sentence).toContain('lanes 0–1 have 32 elements, lanes 2–7 have 31')
    const saved = r.trace.cycles - cyclesAt(248)
    // A run this short is bound by latency, not beats: the sentence says what the neighbours measured, whichever way.
    if (saved > 0) expect(sentence).toContain(`vl 248 would be ${saved} cycle${saved === 1 ? '' : 's'} shorter`)
    else expect(sentence).toContain(`vl 248 would take ${cyclesAt(248)} cycles`)
    if (cyclesAt(256) === r.trace.cycles) expect(sentence).toContain('the run is as long as at vl 256')
    else expect(sentence).toContain(`vl 256 would take ${cyclesAt(256)} cycles`)
  })
})

describe('ideal latency beside the measured one', () => {
  it('is the closed form b + D + 2 of one vfadd.vv with ports to spare, and equals the measured latency there (handbook section 5)', async () => {
    const { singleAdd } = await import('./fixtures')
    const { instructionRows } = await import('@/lib/bench/instructionRows')
    const { trace } = singleAdd(256)
    const pos = trace.instructions.findIndex((i) => i.op === 'vfadd.vv')
    const row = instructionRows(trace)[pos]!
    // vl 256 on 8 lanes at FP64: 32 elements a lane, one a beat (default fpuElementsPerCycle[64] = 1), so b = 32; D = the FPU latency.
    const D = trace.machine.units.fpu.latency
    expect(row.ideal).toBe(32 + D + 2)
    expect(row.latency).toBe(row.ideal)
    expect(row.lostTo?.reasons).toEqual([])
  })

  it('on the Bench\'s default preset the same vfadd.vv takes longer, and the difference is laid to its stall reasons', async () => {
    const { run } = await import('./fixtures')
    const { instructionRows } = await import('@/lib/bench/instructionRows')
    const { PRESETS } = await import('@shared/sim/presets')
    const preset = PRESETS.find((p) => p.id === 'long-vector-8')!
    const { trace } = run('    li a0, 256\n    vsetvli t0, a0, e64, m8, ta, ma\n    vfadd.vv v8, v16, v24\n', preset.machine)
    const pos = trace.instructions.findIndex((i) => i.op === 'vfadd.vv')
    const row = instructionRows(trace)[pos]!
    expect(row.ideal).not.toBeNull()
    expect(row.latency!).toBeGreaterThan(row.ideal!)
    expect(row.lostTo!.reasons.length).toBeGreaterThan(0)
    expect(row.lostTo!.reasons.reduce((a, r) => a + r.cycles, 0)).toBeGreaterThan(0)
  })
})
