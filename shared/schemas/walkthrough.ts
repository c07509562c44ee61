/**
 * Walkthroughs: an ordered explanation of one scenario version's run, step
 * by step, for a class. A step moves the Lane chart to a cycle (or a range),
 * highlights what it talks about, sets the chart's switches and shows a note
 * in Markdown. A step may end with a question the student answers before the
 * next one; a number question's answer is read from the run itself (a trace
 * fact), so a model change can never make the expected answer false. A step
 * may also carry checks: the claims its note makes, kept as expectations so
 * a test (and the Bench) can assert them against the run.
 *
 * @example
 *   walkthroughSchema.parse({
 *     title: 'Uneven lanes',
 *     steps: [{ cursor: 12, note: 'Lane 7 has **one** element fewer.', highlight: { lane: 7 } }],
 *   })
 */
import { z } from 'zod'
import { expectationSchema, EXPECTATION_METRICS, PHASE_FIELDS, type PhaseField } from './expectation'
import { STALL_REASONS } from '../sim/trace/types'
import { textFieldError } from './text'

export const WALKTHROUGH_TITLE_MAX_LENGTH = 200
/** Walkthroughs one scenario version may carry (a lecture's few stories, each on the same run). */
export const WALKTHROUGHS_MAX = 10
/** A lecture's worth of steps; a longer story is two walkthroughs. */
export const WALKTHROUGH_STEPS_MAX = 50
/** A note is a caption beside the chart, not an essay. */
export const WALKTHROUGH_NOTE_MAX_LENGTH = 4000
export const QUESTION_TEXT_MAX_LENGTH = 1000
export const QUESTION_OPTIONS_MAX = 6
export const STEP_CHECKS_MAX = 10
/** Largest cycle a step may name (the timing model's default cycle limit). */
export const WALKTHROUGH_MAX_CYCLE = 5_000_000

const cycle = z
  .number({ error: 'A cycle is a whole number' })
  .int('A cycle is a whole number')
  .min(0, 'A cycle is at least 0')
  .max(WALKTHROUGH_MAX_CYCLE, `A cycle is at most ${WALKTHROUGH_MAX_CYCLE}`)
const whole = (what: string, max: number) =>
  z.number({ error: `${what} is a whole number` }).int(`${what} is a whole number`).min(0, `${what} is at least 0`).max(max, `${what} is at most ${max}`)

/** What a step points at; null or absent: nothing. */
export const walkthroughHighlightSchema = z
  .object({
    instruction: whole('The instruction', 100_000_000).nullable().optional(),
    lane: whole('The lane', 63).nullable().optional(),
    register: whole('The register', 31).nullable().optional(),
  })
  .strict()

/**
 * A number the run decides: a metric, a stall count, a phase bound of one
 * instruction in one lane or an instruction's latency; `minus` subtracts a
 * second fact (e.g. how many cycles lane 7 waits: its issue minus lane 0's).
 */
const factVariants = [
  z.object({ kind: z.literal('metric'), metric: z.enum(EXPECTATION_METRICS) }).strict(),
  z.object({ kind: z.literal('stall'), reason: z.enum(STALL_REASONS) }).strict(),
  z
    .object({
      kind: z.literal('phase'),
      lane: whole('The lane', 63),
      instruction: whole('The instruction', 100_000_000),
      field: z.enum(PHASE_FIELDS as [PhaseField, ...PhaseField[]]),
    })
    .strict(),
  z.object({ kind: z.literal('latency'), instruction: whole('The instruction', 100_000_000) }).strict(),
] as const
const factError = { error: 'A fact is of kind metric, stall, phase or latency' }
export const baseFactSchema = z.discriminatedUnion('kind', [...factVariants], factError)
export const traceFactSchema = z.discriminatedUnion(
  'kind',
  [
    factVariants[0].extend({ minus: baseFactSchema.optional() }),
    factVariants[1].extend({ minus: baseFactSchema.optional() }),
    factVariants[2].extend({ minus: baseFactSchema.optional() }),
    factVariants[3].extend({ minus: baseFactSchema.optional() }),
  ],
  factError,
)
export type TraceFact = z.output<typeof traceFactSchema>

const questionText = z
  .string({ error: textFieldError('A question') })
  .trim()
  .min(1, 'A question is required')
  .max(QUESTION_TEXT_MAX_LENGTH, `A question has at most ${QUESTION_TEXT_MAX_LENGTH} characters`)
const explanation = z
  .string({ error: textFieldError('An explanation') })
  .max(WALKTHROUGH_NOTE_MAX_LENGTH, `An explanation has at most ${WALKTHROUGH_NOTE_MAX_LENGTH} characters`)
  .default('')

/** Multiple choice: one right option among 2 to 6. */
export const choiceQuestionSchema = z
  .object({
    kind: z.literal('choice'),
    text: questionText,
    options: z
      .array(z.string().trim().min(1, 'An option is not empty').max(200, 'An option has at most 200 characters'))
      .min(2, 'Give at least two options')
      .max(QUESTION_OPTIONS_MAX, `At most ${QUESTION_OPTIONS_MAX} options`),
    correct: whole('The right option', QUESTION_OPTIONS_MAX - 1),
    explanation,
  })
  .strict()
  .refine((q) => q.correct < q.options.length, { message: 'The right option must be one of the options', path: ['correct'] })

/** A number the student types; right when within `tolerance` of the fact's value in this run. */
export const numberQuestionSchema = z
  .object({
    kind: z.literal('number'),
    text: questionText,
    fact: traceFactSchema,
    tolerance: z.number().min(0, 'The tolerance is at least 0').max(1e9).default(0),
    explanation,
  })
  .strict()

export const walkthroughQuestionSchema = z.union([choiceQuestionSchema, numberQuestionSchema], {
  error: 'A question is of kind choice or number',
})

export const walkthroughStepSchema = z
  .object({
    /** The cycle the cursor moves to. */
    cursor: cycle,
    /** The zoom window; null: keep the whole run in view. */
    window: z
      .object({ start: cycle, end: cycle })
      .refine((w) => w.start < w.end, { message: 'The window must start before it ends', path: ['end'] })
      .nullable()
      .default(null),
    highlight: walkthroughHighlightSchema.default({}),
    /** The Lane chart's R/E/W rows and dependency overlay; absent: as the viewer had them. */
    subRows: z.boolean().optional(),
    dependencies: z.boolean().optional(),
    note: z
      .string({ error: textFieldError('A note') })
      .max(WALKTHROUGH_NOTE_MAX_LENGTH, `A note has at most ${WALKTHROUGH_NOTE_MAX_LENGTH} characters`)
      .default(''),
    question: walkthroughQuestionSchema.optional(),
    /** The claims the note makes, asserted against the run. */
    checks: z.array(expectationSchema).max(STEP_CHECKS_MAX, `At most ${STEP_CHECKS_MAX} checks per step`).default([]),
  })
  .strict()
export type WalkthroughStep = z.output<typeof walkthroughStepSchema>

export const walkthroughSchema = z
  .object({
    title: z
      .string({ error: textFieldError('A title') })
      .trim()
      .min(1, 'A title is required')
      .max(WALKTHROUGH_TITLE_MAX_LENGTH, `A title has at most ${WALKTHROUGH_TITLE_MAX_LENGTH} characters`),
    steps: z
      .array(walkthroughStepSchema)
      .min(1, 'A walkthrough has at least one step')
      .max(WALKTHROUGH_STEPS_MAX, `At most ${WALKTHROUGH_STEPS_MAX} steps`),
  })
  .strict()
export type Walkthrough = z.output<typeof walkthroughSchema>
export type WalkthroughInput = z.input<typeof walkthroughSchema>

/** The walkthroughs of one scenario version, in the order the teacher keeps them. */
export const walkthroughListSchema = z.array(walkthroughSchema).max(WALKTHROUGHS_MAX, `At most ${WALKTHROUGHS_MAX} walkthroughs per scenario version`)
