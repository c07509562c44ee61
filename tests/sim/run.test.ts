/**
 * The shared pipeline's `fpReductionOrder` option: element order by default
 * (as QEMU sums vfredusum), the machine's order on request. The expected sums
 * are computed independently in the fixture, in IEEE 754 binary32
 * round-to-nearest-even.
 */
import { describe, expect, it } from 'vitest'
import { runPipeline, type FpReductionOrder } from '../../shared/sim/run'
import { readDump } from '../../shared/sim/exec/dump'
import { elementSum, machine, machineSum, program } from './fpOrderFixture'

function sumOf(order?: FpReductionOrder): unknown {
  const r = runPipeline({ program, machine }, order ? { fpReductionOrder: order } : {})
  if (!r.ok) throw new Error(`run failed: ${r.error.message}`)
  const d = readDump(r.program, r.functional.memory, { label: 'sum', count: 1, type: 'f32' })
  if (!d.ok) throw new Error(d.message)
  return d.values[0]
}

describe('the pipeline sums vfredusum in the order asked for', () => {
  it('differs between the two orders only by rounding here (16777216 vs 16777218, binary32 RNE)', () => {
    expect(elementSum).toBe(16777216)
    expect(machineSum).toBe(16777218)
  })

  it.each([
    ['element order by default (as QEMU)', undefined, elementSum],
    ["element order when asked for 'element'", 'element', elementSum],
    ["the machine's order when asked for 'machine'", 'machine', machineSum],
  ] as const)('sums in %s', (_what, order, expected) => {
    expect(sumOf(order)).toBe(expected)
  })

  it('times the run the same way whatever the order (only the values differ)', () => {
    const a = runPipeline({ program, machine }, { fpReductionOrder: 'element' })
    const b = runPipeline({ program, machine }, { fpReductionOrder: 'machine' })
    if (!a.ok || !b.ok) throw new Error('run failed')
    expect(b.trace.cycles).toBe(a.trace.cycles)
    expect(b.trace.laneTimes).toEqual(a.trace.laneTimes)
  })
})
