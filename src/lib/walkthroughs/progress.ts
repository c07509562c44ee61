/**
 * Where a student is in a walkthrough: which steps' questions are answered
 * and whether the next step may be shown. A step with a question holds the
 * student there until an answer was checked (right or wrong: the
 * explanation is shown either way, and a lecture must go on). Pure.
 */
import type { Walkthrough } from '@shared/schemas/walkthrough'
import type { AnswerVerdict } from '@shared/walkthroughs/facts'

export interface Answered {
  answer: number
  verdict: AnswerVerdict
}

/** True when the student may go from step `index` to the next one. */
export function mayAdvance(w: Walkthrough, index: number, answers: ReadonlyMap<number, Answered>): boolean {
  if (index >= w.steps.length - 1) return false
  const step = w.steps[index]
  return !step?.question || answers.has(index)
}

/**
 * The step a jump to `target` lands on: never past the first unanswered
 * question before it (going back is always allowed).
 */
export function reachable(w: Walkthrough, from: number, target: number, answers: ReadonlyMap<number, Answered>): number {
  const last = w.steps.length - 1
  const want = Math.max(0, Math.min(last, target))
  if (want <= from) return want
  for (let i = from; i < want; i++) if (!mayAdvance(w, i, answers)) return i
  return want
}
