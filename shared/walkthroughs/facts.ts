/**
 * The numbers a walkthrough's questions ask for, read from the run itself,
 * and the check of a student's answer against them. Pure: the Bench, the
 * share page and the Learn claim tests call it on a run's trace.
 *
 * @example
 *   factValue(trace, { kind: 'phase', lane: 7, instruction: 1, field: 'execStart',
 *                      minus: { kind: 'phase', lane: 0, instruction: 1, field: 'execStart' } })
 */
import type { z } from 'zod'
import type { baseFactSchema, TraceFact, WalkthroughStep } from '../schemas/walkthrough'
import { laneTiming, type TimingTrace } from '../sim/trace/types'
import { metricValue, position } from '../expectations/evaluate'

/** A fact's value, or a sentence saying why the run has none (no such lane, instruction or phase). */
export type FactValue = { ok: true; value: number } | { ok: false; why: string }

type BaseFact = z.output<typeof baseFactSchema>

function baseValue(trace: TimingTrace, fact: BaseFact): FactValue {
  switch (fact.kind) {
    case 'metric':
      return { ok: true, value: metricValue(trace, fact.metric) }
    case 'stall':
      return { ok: true, value: trace.metrics.stallCycles[fact.reason] }
    case 'phase': {
      if (fact.lane >= trace.laneCount) return { ok: false, why: `the machine has ${trace.laneCount} lanes (0 to ${trace.laneCount - 1})` }
      const pos = position(trace, fact.instruction)
      if (pos < 0) return { ok: false, why: `the run has no instruction ${fact.instruction}` }
      const v = laneTiming(trace, pos, fact.lane)[fact.field]
      return v === null ? { ok: false, why: `lane ${fact.lane} has no active element in instruction ${fact.instruction}` } : { ok: true, value: v }
    }
    case 'latency': {
      const pos = position(trace, fact.instruction)
      const ins = pos < 0 ? undefined : trace.instructions[pos]
      if (!ins) return { ok: false, why: `the run has no instruction ${fact.instruction}` }
      return ins.latency === null ? { ok: false, why: `instruction ${fact.instruction} did not finish` } : { ok: true, value: ins.latency }
    }
  }
}

export function factValue(trace: TimingTrace, fact: TraceFact): FactValue {
  const a = baseValue(trace, fact)
  if (!a.ok || !fact.minus) return a
  const b = baseValue(trace, fact.minus)
  return b.ok ? { ok: true, value: a.value - b.value } : b
}

export type AnswerVerdict = { right: boolean; expected: string; explanation: string }

/**
 * Checks an answer to a step's question: the chosen option's index for a
 * choice, the typed number for a number question (right within the
 * question's tolerance of the fact's value in this run).
 */
export function checkAnswer(step: WalkthroughStep, answer: number, trace: TimingTrace): AnswerVerdict | null {
  const q = step.question
  if (!q) return null
  if (q.kind === 'choice') return { right: answer === q.correct, expected: q.options[q.correct] ?? '', explanation: q.explanation }
  const v = factValue(trace, q.fact)
  if (!v.ok) return { right: false, expected: `no answer in this run: ${v.why}`, explanation: q.explanation }
  return { right: Math.abs(answer - v.value) <= q.tolerance, expected: String(v.value), explanation: q.explanation }
}
