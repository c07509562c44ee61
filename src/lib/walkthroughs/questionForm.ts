/**
 * The recorder's question form and the schema's question, both ways. The
 * form is flat (one field per input); the schema checks what it builds and
 * names the bad field. A number question asks for a fact of the run: a
 * metric, a stall count, an instruction's latency, or a lane's phase time,
 * optionally minus the same phase in another lane ("how many cycles later
 * does lane 7 start than lane 0?").
 */
import type { WalkthroughStep } from '@shared/schemas/walkthrough'

type Question = NonNullable<WalkthroughStep['question']>

export interface QuestionForm {
  kind: 'none' | 'choice' | 'number'
  text: string
  /** Choice: one option a line. */
  options: string
  correct: number
  factKind: 'metric' | 'stall' | 'phase' | 'latency'
  metric: string
  reason: string
  lane: number | null
  instruction: number | null
  field: string
  /** Phase only: subtract the same phase of this lane (null: nothing). */
  minusLane: number | null
  tolerance: number
  explanation: string
}

export const EMPTY_QUESTION_FORM: QuestionForm = {
  kind: 'none',
  text: '',
  options: '',
  correct: 0,
  factKind: 'phase',
  metric: 'cycles',
  reason: 'raw',
  lane: 0,
  instruction: 0,
  field: 'execStart',
  minusLane: null,
  tolerance: 0,
  explanation: '',
}

/** The question the form describes (unchecked: the schema decides), or undefined for none. */
export function questionOfForm(f: QuestionForm): unknown {
  if (f.kind === 'none') return undefined
  if (f.kind === 'choice') {
    const options = f.options.split('\n').map((o) => o.trim()).filter((o) => o !== '')
    return { kind: 'choice', text: f.text, options, correct: f.correct, explanation: f.explanation }
  }
  const fact =
    f.factKind === 'metric'
      ? { kind: 'metric', metric: f.metric }
      : f.factKind === 'stall'
        ? { kind: 'stall', reason: f.reason }
        : f.factKind === 'latency'
          ? { kind: 'latency', instruction: f.instruction }
          : {
              kind: 'phase',
              lane: f.lane,
              instruction: f.instruction,
              field: f.field,
              ...(f.minusLane === null ? {} : { minus: { kind: 'phase', lane: f.minusLane, instruction: f.instruction, field: f.field } }),
            }
  return { kind: 'number', text: f.text, fact, tolerance: f.tolerance, explanation: f.explanation }
}

/** The form showing a step's question, to edit it. */
export function formOfQuestion(q: Question | undefined): QuestionForm {
  if (!q) return { ...EMPTY_QUESTION_FORM }
  const base = { ...EMPTY_QUESTION_FORM, text: q.text, explanation: q.explanation }
  if (q.kind === 'choice') return { ...base, kind: 'choice', options: q.options.join('\n'), correct: q.correct }
  const f = q.fact
  const common = { ...base, kind: 'number' as const, tolerance: q.tolerance, factKind: f.kind }
  switch (f.kind) {
    case 'metric': return { ...common, metric: f.metric }
    case 'stall': return { ...common, reason: f.reason }
    case 'latency': return { ...common, instruction: f.instruction }
    case 'phase': return { ...common, lane: f.lane, instruction: f.instruction, field: f.field, minusLane: f.minus?.kind === 'phase' ? f.minus.lane : null }
  }
}
