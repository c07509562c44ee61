/** The expectation schema: its limits and the messages that name the bad field. */
import { describe, expect, it } from 'vitest'
import { EXPECTATION_VALUES_MAX, EXPECTATIONS_MAX, expectationListSchema, expectationSchema } from '../../shared/schemas/expectation'
import { describeExpectation } from '../../shared/expectations/describe'

const issues = (v: unknown) => {
  const r = expectationSchema.safeParse(v)
  return r.success ? [] : r.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`)
}

describe('expectation schema', () => {
  it('reads each kind of claim of the issue and describes it in words', () => {
    const texts = [
      { kind: 'metric', metric: 'cycles', op: '<=', value: 120 },
      { kind: 'metric', metric: 'flopsPerCycle', op: '>=', value: 14.5 },
      { kind: 'stall', reason: 'bank', op: '==', value: 0 },
      { kind: 'phase', lane: 3, instruction: 5, field: 'writeEnd', op: '==', value: 47 },
      { kind: 'latency', instruction: 2, op: '<=', value: 40 },
      { kind: 'register', register: 4, type: 'f64', values: ['1', '2.5'] },
      { kind: 'memory', label: 'res', type: 'f32', values: ['1', '2', '3', '4', '5', '6', '7', '8', '9'], toleranceUlps: 2 },
      { kind: 'fails', stage: 'assemble' },
    ].map((c) => describeExpectation(expectationSchema.parse(c)))
    expect(texts).toEqual([
      'cycles <= 120',
      'flopsPerCycle >= 14.5',
      'stall.bank == 0',
      'lane 3, instruction 5, writeEnd == 47',
      'instruction 2 latency <= 40',
      'register v4 (f64) equals [1, 2.5]',
      'memory at label res (f32 x 9) equals [1, 2, 3, 4, 5, 6, 7, 8, … 9 values] within 2 ulps',
      'run fails at stage assemble',
    ])
  })

  it.each([
    ['an unknown kind', { kind: 'formula', text: 'cycles < 3' }, /^kind: The kind is one of metric, stall/],
    ['an unknown operator', { kind: 'metric', metric: 'cycles', op: '=<', value: 1 }, /^op: The operator is one of == != < <= > >=$/],
    ['an unknown stall reason', { kind: 'stall', reason: 'cache', op: '==', value: 0 }, /^reason: The stall reason is one of raw, bank/],
    ['a lane past 63', { kind: 'phase', lane: 64, instruction: 0, field: 'readStart', op: '==', value: 1 }, /^lane: The lane is at most 63$/],
    ['elements and beats as a phase bound', { kind: 'phase', lane: 0, instruction: 0, field: 'beats', op: '==', value: 1 }, /^field: The phase bound is one of readStart/],
    ['a value that is not an integer', { kind: 'register', register: 1, type: 'i32', values: ['1', '2.5'] }, /^values\.1: "2\.5" is not an integer \(value 2, type i32\)$/],
    ['a tolerance on integers', { kind: 'memory', label: 'res', type: 'u8', values: ['1'], toleranceUlps: 1 }, /^toleranceUlps: A tolerance in ulps applies to f32 and f64 values only$/],
    ['a register past v31', { kind: 'register', register: 32, type: 'f64', values: ['1'] }, /^register: The register is at most 31$/],
    ['an unknown field', { kind: 'metric', metric: 'cycles', op: '==', value: 1, why: 'x' }, /why/],
  ])('refuses %s, naming the field', (_what, claim, message) => {
    expect(issues(claim).join('\n')).toMatch(message)
  })

  it(`takes up to ${EXPECTATION_VALUES_MAX} values and ${EXPECTATIONS_MAX} claims, not one more`, () => {
    const values = (n: number) => Array.from({ length: n }, () => '1')
    expect(issues({ kind: 'register', register: 0, type: 'u8', values: values(EXPECTATION_VALUES_MAX) })).toEqual([])
    expect(issues({ kind: 'register', register: 0, type: 'u8', values: values(EXPECTATION_VALUES_MAX + 1) })).toEqual([`values: At most ${EXPECTATION_VALUES_MAX} values`])
    const claim = { kind: 'metric', metric: 'cycles', op: '<=', value: 1 }
    expect(expectationListSchema.safeParse(Array(EXPECTATIONS_MAX).fill(claim)).success).toBe(true)
    const over = expectationListSchema.safeParse(Array(EXPECTATIONS_MAX + 1).fill(claim))
    expect(over.success ? [] : over.error.issues.map((i) => i.message)).toEqual([`At most ${EXPECTATIONS_MAX} expectations per scenario`])
  })
})
