/** The line under the progress bar that says which points failed and why, since the plot leaves them out. */
import { describe, expect, it } from 'vitest'
import type { SweepPointResult } from '@shared/schemas/sweep'
import { failureSummary } from '@/lib/sweeps/failures'

const sweep = { parameters: [{ path: 'AVL' }, { path: 'issue' }] } as Parameters<typeof failureSummary>[0]
const ok = (index: number, avl: number): SweepPointResult => ({ index, values: [avl, 'serial'], status: 'ok', figures: null, error: null })
const failed = (index: number, avl: number): SweepPointResult => ({
  index,
  values: [avl, 'serial'],
  status: 'failed',
  figures: null,
  error: { stage: 'execute', code: 'memory', message: `line 26, column 5: access at AVL ${avl} is outside the data memory` },
})

describe('failed points', () => {
  it('say nothing when every point ran', () => {
    expect(failureSummary(sweep, [ok(0, 1), ok(1, 2)])).toBeNull()
  })

  it('are counted, and the first by index is named with its values, stage and message', () => {
    expect(failureSummary(sweep, [ok(0, 19), failed(3, 21), failed(2, 20)])).toBe(
      '2 points failed and are not plotted (Status column); the first, AVL=20, issue=serial: execute: line 26, column 5: access at AVL 20 is outside the data memory',
    )
    expect(failureSummary(sweep, [failed(5, 20)])).toMatch(/^1 point failed and is not plotted/)
  })
})
