/**
 * The sweep API: `prepareRun` assembles and executes once at one VLEN,
 * `timePrepared` times that stream on any machine of that VLEN. The reference
 * is the one-shot pipeline (`runPipeline`), which must agree on every result;
 * the vfredusum sums are checked against the binary32 sums worked by hand in
 * fpOrderFixture.ts (IEEE 754 round-to-nearest-even).
 */
import { readFileSync } from 'node:fs'
import { describe, expect, it } from 'vitest'
import { prepareRun, runPipeline, timePrepared, timePreparedMetrics, type PreparedRun } from '../../shared/sim/run'
import { readDump } from '../../shared/sim/exec/dump'
import { elementSum, machine as orderMachine, machineSum, program as sumProgram } from './fpOrderFixture'

const saxpy = readFileSync(new URL('../../examples/saxpy.s', import.meta.url), 'utf8')

function prepared(text: string, vlen?: number): PreparedRun {
  const p = prepareRun({ program: text }, vlen === undefined ? {} : { vlen })
  if (!p.ok) throw new Error(p.error.message)
  return p.prepared
}

describe('prepareRun + timePrepared', () => {
  it('time every machine as runPipeline does, from one preparation', () => {
    const p = prepared(saxpy, 8192)
    for (const m of [{ lanes: 8 }, { lanes: 4, rfBanks: 2 }, { lanes: 16, physRegs: 40 }]) {
      const once = runPipeline({ program: saxpy, machine: m })
      const again = timePrepared(p, m)
      if (!once.ok || !again.ok) throw new Error('run failed')
      expect(again.trace).toEqual(once.trace)
      expect(again.functional).toEqual(once.functional)
    }
  })

  it('give a sweep point the metrics of the full trace, with and without alike lanes timed once, and the same errors', () => {
    // Alike lanes (saxpy at vl 256 on 8 lanes: one timed lane), a ragged tail (5 lanes: classes), reductions over the ring (every lane timed), a cycle limit.
    const reduction = readFileSync(new URL('../../examples/reduction.s', import.meta.url), 'utf8')
    const cases: [string, object][] = [
      [saxpy, { lanes: 8 }],
      [saxpy, { lanes: 5, rfBanks: 3 }],
      [saxpy, { lanes: 8, identicalLanes: false }],
      [reduction, { lanes: 8, reductionAccumulators: 2 }],
    ]
    for (const [text, machine] of cases) {
      const p = prepared(text, 8192)
      const { identicalLanes, ...m } = machine as { identicalLanes?: boolean }
      const timing = identicalLanes === false ? { identicalLanes: false, recordUsage: false } : { recordUsage: false }
      const full = timePrepared(p, m, { timing })
      const figures = timePreparedMetrics(p, m, timing)
      if (!full.ok || !figures.ok) throw new Error('run failed')
      expect(figures.metrics).toEqual(full.trace.metrics)
    }
    const cut = timePreparedMetrics(prepared(saxpy, 8192), { lanes: 8 }, { cycleLimit: 50 })
    expect(cut.ok || cut.error).toEqual({ stage: 'simulate', code: 'cycle-limit', message: 'the run exceeded the cycle limit of 50 cycles' })
  })

  it('leave the prepared stream as it was (one preparation serves many timings)', () => {
    const p = prepared(saxpy, 8192)
    const before = structuredClone(p.stream)
    timePrepared(p, { lanes: 3 })
    timePrepared(p, { lanes: 8, identicalLanes: false })
    expect(p.stream).toEqual(before)
  })

  it('refuse a machine whose VLEN differs from the preparation, naming the field', () => {
    const r = timePrepared(prepared(saxpy, 512), { vlen: 1024 })
    expect(r.ok).toBe(false)
    if (r.ok) return
    expect(r.error.stage).toBe('machine')
    expect(r.error.fields?.[0]?.field).toBe('vlen')
    expect(r.error.message).toMatch(/1024.*512/)
  })

  it('refuse an invalid machine with its field, as runPipeline does', () => {
    const r = timePrepared(prepared(saxpy, 512), { lanes: 0 })
    expect(r.ok || r.error.fields?.map((f) => f.field)).toEqual(['lanes'])
  })

  it('report assembly errors with line and column', () => {
    const r = prepareRun({ program: 'vadd.vv v1, v2\n' })
    expect(r.ok).toBe(false)
    if (r.ok) return
    expect(r.error.stage).toBe('assemble')
    expect(r.error.diagnostics?.[0]?.line).toBe(1)
  })

  it('refuse a VLEN that is not a power of two from 64 to 65536 (RISC-V V 1.0 section 2: VLEN a power of two)', () => {
    const r = prepareRun({ program: saxpy }, { vlen: 300 })
    expect(r.ok || r.error.fields?.[0]?.field).toBe('vlen')
  })

  it("sum vfredusum in element order by default and in a machine's order on request (binary32 sums worked by hand)", () => {
    const sumOf = (p: PreparedRun): unknown => {
      const d = readDump(p.program, p.functional.memory, { label: 'sum', count: 1, type: 'f32' })
      if (!d.ok) throw new Error(d.message)
      return d.values[0]
    }
    expect(sumOf(prepared(sumProgram, 128))).toBe(elementSum)
    const m = prepareRun({ program: sumProgram }, { fpReductionOrder: 'machine', orderMachine })
    if (!m.ok) throw new Error(m.error.message)
    expect(m.prepared.fpReductionOrder).toBe('machine')
    expect(m.prepared.vlen).toBe(orderMachine.vlen ?? 512)
    expect(sumOf(m.prepared)).toBe(machineSum)
  })
})
