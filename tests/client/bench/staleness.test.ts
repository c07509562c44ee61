/**
 * Issue 10: a program with errors kept the last chart and metrics with no
 * mark. The Bench marks them stale with the error count and the first error.
 */
import { describe, expect, it } from 'vitest'
import { assemble } from '@shared/sim/isa'
import { staleness } from '@/lib/bench/staleness'

describe('stale results', () => {
  it('marks the last run stale while the program has errors, with the count and the first error', () => {
    const r = assemble('    vfadd.vv v1, v2, v3\n    vbogus v1\n    vfadd.vv v1, v2, v99\n')
    expect(r.ok).toBe(false)
    const errors = r.ok ? [] : r.errors
    const s = staleness({ hasTrace: true, programErrors: errors, machineErrors: 0 })
    expect(s?.kind).toBe('program')
    expect(s?.count).toBe(errors.length)
    expect(s?.count).toBeGreaterThanOrEqual(2)
    expect(s?.first?.line).toBe(2)
    expect(s?.sentence).toMatch(/^The program has \d+ errors: the chart and numbers below are from the last run that succeeded\.$/)
  })

  it('names an invalid machine when the program is fine', () => {
    expect(staleness({ hasTrace: true, programErrors: [], machineErrors: 1 })?.sentence).toMatch(/^The machine has 1 invalid field:/)
  })

  it('is not stale without a trace, nor when everything runs', () => {
    expect(staleness({ hasTrace: false, programErrors: [{ line: 1, column: 1, code: 'x', message: 'm' }], machineErrors: 0 })).toBeNull()
    expect(staleness({ hasTrace: true, programErrors: [], machineErrors: 0 })).toBeNull()
  })
})
