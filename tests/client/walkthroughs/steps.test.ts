import { describe, expect, it } from 'vitest'
import { walkthroughSchema } from '@shared/schemas/walkthrough'
import type { AnswerVerdict } from '@shared/walkthroughs/facts'
import { EMPTY_VIEW } from '@/lib/bench/viewState'
import { mayAdvance, reachable, type Answered } from '@/lib/walkthroughs/progress'
import { glideCycle, moveStep, removeStep, replaceStep, stepFromView, viewOfStep } from '@/lib/walkthroughs/steps'

describe('walkthrough steps and the Bench view', () => {
  const view = { cursor: 12, window: { start: 4, end: 30 }, selected: 3, subRows: true, dependencies: false, register: 8 }

  it('records a step from the view and shows it again', () => {
    const step = stepFromView(view, { note: 'Lane 7 waits.', lane: 7 })
    expect(step).toEqual({ cursor: 12, window: { start: 4, end: 30 }, highlight: { instruction: 3, lane: 7, register: 8 }, subRows: true, dependencies: false, note: 'Lane 7 waits.', checks: [] })
    expect(walkthroughSchema.parse({ title: 't', steps: [step] }).steps[0]).toEqual(step)
    expect(viewOfStep(step, EMPTY_VIEW)).toEqual(view)
  })

  it('keeps the viewer’s switches and register where the step leaves them open, and clears a stale selection', () => {
    const step = walkthroughSchema.parse({ title: 't', steps: [{ cursor: 5 }] }).steps[0]!
    expect(viewOfStep(step, view)).toEqual({ cursor: 5, window: null, selected: null, subRows: true, dependencies: false, register: 8 })
  })

  it('moves, replaces and removes steps', () => {
    expect(moveStep(['a', 'b', 'c'], 0, 2)).toEqual(['b', 'c', 'a'])
    expect(moveStep(['a', 'b', 'c'], 2, 0)).toEqual(['c', 'a', 'b'])
    expect(moveStep(['a', 'b', 'c'], 1, 9)).toEqual(['a', 'c', 'b'])
    expect(moveStep(['a', 'b'], 5, 0)).toEqual(['a', 'b'])
    expect(replaceStep(['a', 'b'], 1, 'x')).toEqual(['a', 'x'])
    expect(removeStep(['a', 'b', 'c'], 1)).toEqual(['a', 'c'])
  })

  it('glides the cursor in whole cycles from start to end, eased (half way at t = 0.5)', () => {
    expect(glideCycle(10, 110, 0)).toBe(10)
    expect(glideCycle(10, 110, 0.5)).toBe(60)
    expect(glideCycle(10, 110, 1)).toBe(110)
    expect(glideCycle(10, 110, 2)).toBe(110)
    expect(glideCycle(110, 10, 0.25)).toBe(98) // 2 * 0.25^2 = 0.125 of the way
  })
})

describe('walkthrough progress', () => {
  const w = walkthroughSchema.parse({
    title: 't',
    steps: [{ cursor: 0 }, { cursor: 1, question: { kind: 'choice', text: 'Which?', options: ['a', 'b'], correct: 1 } }, { cursor: 2 }, { cursor: 3 }],
  })
  const verdict: AnswerVerdict = { right: false, expected: 'b', explanation: '' }

  it('holds the student at a question until it is answered, right or wrong', () => {
    const none = new Map<number, Answered>()
    expect(mayAdvance(w, 0, none)).toBe(true)
    expect(mayAdvance(w, 1, none)).toBe(false)
    expect(mayAdvance(w, 1, new Map([[1, { answer: 0, verdict }]]))).toBe(true)
    expect(mayAdvance(w, 3, none)).toBe(false) // the last step has no next
  })

  it('stops a jump forward at the first unanswered question; going back is always allowed', () => {
    const none = new Map<number, Answered>()
    expect(reachable(w, 0, 3, none)).toBe(1)
    expect(reachable(w, 0, 3, new Map([[1, { answer: 1, verdict }]]))).toBe(3)
    expect(reachable(w, 3, 0, none)).toBe(0)
    expect(reachable(w, 0, -4, none)).toBe(0)
  })
})

describe('walkthrough keys', () => {
  it('maps Space and arrows, Home, Esc, and b only in Present mode; leaves modified keys alone', async () => {
    const { walkthroughKeyAction } = await import('@/lib/walkthroughs/keys')
    expect([' ', 'ArrowRight', 'ArrowLeft', 'Home', 'Escape'].map((key) => walkthroughKeyAction({ key }, false))).toEqual(['next', 'next', 'previous', 'first', 'leave'])
    expect(walkthroughKeyAction({ key: 'b' }, false)).toBeNull()
    expect(walkthroughKeyAction({ key: 'b' }, true)).toBe('blank')
    expect(walkthroughKeyAction({ key: 'ArrowRight', ctrlKey: true }, false)).toBeNull()
  })
})

describe('the recorder’s question form', () => {
  it('builds a choice and a number question the schema accepts, and reads them back', async () => {
    const { EMPTY_QUESTION_FORM, formOfQuestion, questionOfForm } = await import('@/lib/walkthroughs/questionForm')
    const { walkthroughQuestionSchema } = await import('@shared/schemas/walkthrough')
    const choice = { ...EMPTY_QUESTION_FORM, kind: 'choice' as const, text: 'Which lane ends last?', options: 'lane 0\n\n lane 3 ', correct: 1, explanation: 'It has one more element.' }
    const q1 = walkthroughQuestionSchema.parse(questionOfForm(choice))
    expect(q1).toEqual({ kind: 'choice', text: 'Which lane ends last?', options: ['lane 0', 'lane 3'], correct: 1, explanation: 'It has one more element.' })
    expect(questionOfForm(formOfQuestion(q1))).toEqual(q1)
    const wait = { ...EMPTY_QUESTION_FORM, kind: 'number' as const, text: 'How many cycles does lane 3 wait?', lane: 3, instruction: 2, field: 'execStart', minusLane: 0 }
    const q2 = walkthroughQuestionSchema.parse(questionOfForm(wait))
    expect(q2).toMatchObject({ fact: { kind: 'phase', lane: 3, instruction: 2, field: 'execStart', minus: { kind: 'phase', lane: 0, instruction: 2, field: 'execStart' } } })
    expect(walkthroughQuestionSchema.parse(questionOfForm(formOfQuestion(q2)))).toEqual(q2)
    expect(questionOfForm(EMPTY_QUESTION_FORM)).toBeUndefined()
  })
})

describe('Make my copy: the target workspace', () => {
  it('prefers a workspace the reader owns (the current one when owned), then one they edit, never one they only view', async () => {
    const { copyTarget } = await import('@/lib/walkthroughs/copyTarget')
    const ws = (id: string, role: 'owner' | 'editor' | 'viewer') => ({ id, name: id, role, defaultPreset: 'starter-4' })
    const klass = ws('class', 'viewer')
    expect(copyTarget([klass, ws('mine', 'owner'), ws('team', 'editor')], 'class')?.id).toBe('mine')
    expect(copyTarget([ws('a', 'owner'), ws('b', 'owner')], 'b')?.id).toBe('b')
    expect(copyTarget([klass, ws('team', 'editor')], 'class')?.id).toBe('team')
    expect(copyTarget([klass], 'class')).toBeNull()
  })
})
