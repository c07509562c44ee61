import { describe, expect, it } from 'vitest'
import type { RunSummary } from '@shared/schemas/scenario'
import { STALL_REASONS } from '@shared/sim/trace/types'
import { metricRows, programRows, valueText } from '@/lib/scenarios/versionDiff'

const stalls = (over: Partial<Record<(typeof STALL_REASONS)[number], number>> = {}) =>
  Object.fromEntries(STALL_REASONS.map((r) => [r, over[r] ?? 0])) as Record<(typeof STALL_REASONS)[number], number>

const lines = (n: number, from = 1) => Array.from({ length: n }, (_, i) => `line ${from + i}`)

describe('the readable version diff', () => {
  it('numbers removed lines in the old text and added lines in the new one (unified diff convention, GNU diffutils)', () => {
    const rows = programRows([
      { op: 'equal', oldStart: 1, newStart: 1, lines: ['vsetvli t0, a0, e32, m1, ta, ma'] },
      { op: 'delete', oldStart: 2, newStart: null, lines: ['vfadd.vv v1, v2, v3'] },
      { op: 'insert', oldStart: null, newStart: 2, lines: ['vfmul.vv v1, v2, v3', 'vfadd.vv v4, v1, v1'] },
    ])
    expect(rows).toEqual([
      { kind: 'equal', oldNo: 1, newNo: 1, text: 'vsetvli t0, a0, e32, m1, ta, ma' },
      { kind: 'delete', oldNo: 2, newNo: null, text: 'vfadd.vv v1, v2, v3' },
      { kind: 'insert', oldNo: null, newNo: 2, text: 'vfmul.vv v1, v2, v3' },
      { kind: 'insert', oldNo: null, newNo: 3, text: 'vfadd.vv v4, v1, v1' },
    ])
  })

  it('folds a long unchanged run between changes to three lines of context on each side (the diff -u default)', () => {
    const rows = programRows([
      { op: 'delete', oldStart: 1, newStart: null, lines: ['old'] },
      { op: 'equal', oldStart: 2, newStart: 1, lines: lines(20, 2) },
      { op: 'insert', oldStart: null, newStart: 21, lines: ['new'] },
    ])
    expect(rows.map((r) => (r.kind === 'fold' ? `fold ${r.count}` : r.kind))).toEqual([
      'delete', 'equal', 'equal', 'equal', 'fold 14', 'equal', 'equal', 'equal', 'insert',
    ])
  })

  it('drops unchanged lines before the first change and after the last one', () => {
    const rows = programRows([
      { op: 'equal', oldStart: 1, newStart: 1, lines: lines(10) },
      { op: 'insert', oldStart: null, newStart: 11, lines: ['x'] },
      { op: 'equal', oldStart: 11, newStart: 12, lines: lines(10, 11) },
    ])
    expect(rows[0]).toEqual({ kind: 'fold', count: 7 })
    expect(rows.at(-1)).toEqual({ kind: 'fold', count: 7 })
  })

  it('keeps a short unchanged run whole rather than folding one line', () => {
    const rows = programRows([
      { op: 'delete', oldStart: 1, newStart: null, lines: ['a'] },
      { op: 'equal', oldStart: 2, newStart: 1, lines: lines(7, 2) },
      { op: 'insert', oldStart: null, newStart: 8, lines: ['b'] },
    ])
    expect(rows.some((r) => r.kind === 'fold')).toBe(false)
    expect(rows).toHaveLength(9)
  })

  it('shows metrics before and after with a signed change, and only the stall reasons that occur', () => {
    const before: RunSummary = { status: 'ok', cycles: 120, flopsPerCycle: 2, stallCycles: stalls({ raw: 10 }) }
    const after: RunSummary = { status: 'ok', cycles: 96, flopsPerCycle: 2.5, stallCycles: stalls({ raw: 4, bank: 3 }) }
    expect(metricRows(before, after)).toEqual([
      { label: 'cycles', before: '120', after: '96', change: '−24' },
      { label: 'flops per cycle', before: '2', after: '2.500', change: '+0.500' },
      { label: 'stall cycles: raw', before: '10', after: '4', change: '−6' },
      { label: 'stall cycles: bank', before: '0', after: '3', change: '+3' },
    ])
  })

  it('says why a version did not run instead of comparing numbers', () => {
    const before: RunSummary = { status: 'failed', stage: 'assemble', code: 'unknown_mnemonic', message: 'line 2: unknown instruction' }
    const after: RunSummary = { status: 'ok', cycles: 40, flopsPerCycle: 1, stallCycles: stalls() }
    expect(metricRows(before, after)).toEqual([
      { label: 'run', before: 'did not run (assemble): line 2: unknown instruction', after: '40 cycles', change: '' },
    ])
  })

  it.each([
    [undefined, '(none)'],
    [null, '(not set)'],
    ['', '(empty)'],
    ['lockstep', 'lockstep'],
    [8, '8'],
    [false, 'false'],
    [{ start: 0, end: 40 }, '{"start":0,"end":40}'],
  ])('writes the field value %j as %s', (v, s) => {
    expect(valueText(v)).toBe(s)
  })
})

describe('field labels in the version diff (issue 10)', () => {
  it('names machine fields by the machine form label and content fields by the scenario form label', async () => {
    const { diffFieldLabel } = await import('@/lib/scenarios/versionDiff')
    expect(diffFieldLabel('machine', 'rfBanks')).toBe('Banks per lane')
    expect(diffFieldLabel('machine', 'fpuElementsPerCycle.32')).toBe('FPU elements per beat, SEW 32')
    expect(diffFieldLabel('fields', 'initialData')).toBe('Named data')
    expect(diffFieldLabel('fields', 'title')).toBe('Title')
  })
})
