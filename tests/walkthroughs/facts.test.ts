/**
 * Walkthrough questions answered from the run: the expected answers are the
 * closed form of one vfadd.vv at vl 64 on the default machine, worked out by
 * hand in tests/expectations/evaluate.test.ts (handbook timing model sections
 * 2 and 5): lane 3 reads in cycles 3..10, executes from 4 and writes 8..15;
 * the latency is b + D + 2 = 14.
 */
import { describe, expect, it } from 'vitest'
import { walkthroughStepSchema } from '../../shared/schemas/walkthrough'
import { runPipeline } from '../../shared/sim/run'
import { checkAnswer, factValue } from '../../shared/walkthroughs/facts'

const VFADD = `
  li a0, 64
  vsetvli t0, a0, e64, m1, ta, ma
  vfadd.vv v3, v1, v2
`

describe('walkthrough facts and answers (closed form of one vfadd.vv)', () => {
  const run = runPipeline({ program: VFADD, machine: {} })
  if (!run.ok) throw new Error(run.error.message)
  const trace = run.trace

  it('reads phases, latency and differences of two facts', () => {
    expect(factValue(trace, { kind: 'phase', lane: 3, instruction: 1, field: 'writeEnd' })).toEqual({ ok: true, value: 15 })
    expect(factValue(trace, { kind: 'latency', instruction: 1 })).toEqual({ ok: true, value: 14 })
    // writeEnd - readStart = 15 - 3 = 12 cycles.
    expect(factValue(trace, { kind: 'phase', lane: 3, instruction: 1, field: 'writeEnd', minus: { kind: 'phase', lane: 3, instruction: 1, field: 'readStart' } })).toEqual({ ok: true, value: 12 })
  })

  it('says why a fact has no value rather than inventing one', () => {
    const r = factValue(trace, { kind: 'phase', lane: 9, instruction: 1, field: 'writeEnd' })
    expect(r).toEqual({ ok: false, why: 'the machine has 8 lanes (0 to 7)' })
  })

  it('checks a number answer against the run, within the tolerance, and a choice against its right option', () => {
    const step = walkthroughStepSchema.parse({ cursor: 8, question: { kind: 'number', text: 'Latency?', fact: { kind: 'latency', instruction: 1 }, explanation: 'b + D + 2' } })
    expect(checkAnswer(step, 14, trace)).toEqual({ right: true, expected: '14', explanation: 'b + D + 2' })
    expect(checkAnswer(step, 13, trace)?.right).toBe(false)
    const lenient = walkthroughStepSchema.parse({ ...step, question: { ...step.question, tolerance: 1 } })
    expect(checkAnswer(lenient, 13, trace)?.right).toBe(true)
    const choice = walkthroughStepSchema.parse({ cursor: 0, question: { kind: 'choice', text: 'Which?', options: ['a', 'b'], correct: 1 } })
    expect(checkAnswer(choice, 1, trace)).toMatchObject({ right: true, expected: 'b' })
    expect(checkAnswer(choice, 0, trace)?.right).toBe(false)
  })
})
