/**
 * Side by side's pure parts on traces written by hand (tests/client/lanechart/buildTrace.ts):
 * the expected lane-cycles are counted by hand from the phase spans below
 * (phase ends inclusive, as the Lane chart draws them), and the URL round trip.
 */
import { describe, expect, it } from 'vitest'
import { divergence, latencyRows, metricRows, phaseMask, EXECUTE, READ, WRITE } from '@/lib/compare/diff'
import { compareQuery, decodeRun, viewFromQuery } from '@/lib/compare/url'
import { buildTrace } from '../lanechart/buildTrace'

// One instruction on two lanes: read 0-1, execute 2-3, write 4 in both lanes.
const a = buildTrace({ lanes: 2, cycles: 5, instructions: [{ text: 'vfadd.vv v1, v2, v3', lanes: [[2, 2, 0, 1, 2, 3, 4, 4], [2, 2, 0, 1, 2, 3, 4, 4]] }] })
// The same, but lane 1 executes one cycle longer (2-4) and writes in 5; the run is 6 cycles.
const b = buildTrace({ lanes: 2, cycles: 6, instructions: [{ text: 'vfadd.vv v1, v2, v3', lanes: [[2, 2, 0, 1, 2, 3, 4, 4], [2, 2, 0, 1, 2, 4, 5, 5]] }] })

describe('Side by side: phases, differences, URL', () => {
  it('marks each lane-cycle with its phases, ends inclusive', () => {
    const m = phaseMask(a, 6)
    expect(Array.from(m.subarray(0, 6))).toEqual([READ, READ, EXECUTE, EXECUTE, WRITE, 0])
  })

  it('counts, per cycle of the longer run, the lanes whose phases differ; the first such cycle', () => {
    const r = divergence(a, b)
    if (!r.ok) throw new Error(r.message)
    // Lane 1: cycle 4 is WRITE in a and EXECUTE in b; cycle 5 is idle in a and WRITE in b. Lane 0 never differs.
    expect(Array.from(r.divergence.perCycle)).toEqual([0, 0, 0, 0, 1, 1])
    expect(r.divergence).toMatchObject({ cycles: 6, lanes: 2, first: 4, differing: 2 })
    const same = divergence(a, a)
    expect(same.ok && same.divergence.first).toBe(null)
  })

  it('counts a lane only one run has as idle in the other', () => {
    const one = buildTrace({ lanes: 1, cycles: 5, instructions: [{ lanes: [[2, 2, 0, 1, 2, 3, 4, 4]] }] })
    const r = divergence(one, a)
    if (!r.ok) throw new Error(r.message)
    // Lane 1 of `a` is busy in cycles 0-4; `one` has no lane 1.
    expect(Array.from(r.divergence.perCycle)).toEqual([1, 1, 1, 1, 1])
  })

  it('lists metrics with b - a and b / a, and latencies instruction by instruction', () => {
    const rows = metricRows(a, b)
    expect(rows.find((r) => r.metric === 'cycles')).toEqual({ metric: 'cycles', a: 5, b: 6, delta: 1, ratio: 1.2 })
    expect(rows.find((r) => r.metric === 'flops')?.ratio).toBe(null)
    const la = { ...a, instructions: a.instructions.map((i) => ({ ...i, latency: 5 })) }
    const lb = { ...b, instructions: [...b.instructions.map((i) => ({ ...i, latency: 6 })), { ...b.instructions[0]!, text: 'vse64.v v1, (a1)', latency: 2 }] }
    expect(latencyRows(la, lb)).toEqual([
      { index: 0, textA: 'vfadd.vv v1, v2, v3', textB: 'vfadd.vv v1, v2, v3', same: true, latencyA: 5, latencyB: 6, delta: 1 },
      { index: 1, textA: null, textB: 'vse64.v v1, (a1)', same: false, latencyA: null, latencyB: 2, delta: null },
    ])
  })

  it('keeps both runs and the view in the URL, any character of a program included', () => {
    const program = '# é ✓ 𝑥\n  li a0, 4\n'
    const q = compareQuery({ a: { kind: 'program', program, machine: { lanes: 4 } }, b: { kind: 'program', machine: { lanes: 8 }, label: 'Default 8-lane' }, cursor: 12, window: { start: 3.4, end: 40.2 } })
    expect(q.w).toBe('3-41')
    const ra = decodeRun(q.a, 'a')
    expect(ra.ok && ra.run).toEqual({ kind: 'program', program, machine: { lanes: 4 } })
    expect(viewFromQuery(q)).toEqual({ cursor: 12, window: { start: 3, end: 41 } })
    expect(decodeRun('eyJr', 'b')).toEqual({ ok: false, message: 'Run B in the link is not readable (cut short when copied?)' })
    const bad = decodeRun(btoa(JSON.stringify({ kind: 'version', scenarioId: 'x', version: 0 })), 'a')
    expect(bad.ok).toBe(false)
    expect(!bad.ok && bad.message).toMatch(/^Run A in the link: scenarioId: /)
  })
})
