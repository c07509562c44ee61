/**
 * Expectations: claims about a run that a scenario keeps, so that a corner
 * case is re-checked after every run, model change or machine change. A claim
 * is structured data (what is measured, an operator, a value), never a formula
 * in text: the Bench builds it with a form, the CLI reads it from a bundle,
 * and shared/expectations evaluates it the same way in both.
 *
 * @example
 *   expectationSchema.parse({ kind: 'metric', metric: 'cycles', op: '<=', value: 120 })
 *   expectationSchema.parse({ kind: 'memory', label: 'res', type: 'f32', values: ['1.5', '2'], toleranceUlps: 1 })
 *   expectationSchema.parse({ kind: 'fails', stage: 'assemble' })
 */
import { z } from 'zod'
import { LANE_FIELDS, STALL_REASONS } from '../sim/trace/types'
import { textFieldError } from './text'

/** Claims one scenario keeps: enough for a corner case's checks, few enough to read on the Bench. */
export const EXPECTATIONS_MAX = 50
/** Values one register or memory claim compares (e.g. 256 f64 elements: a whole 16-kbit register group). */
export const EXPECTATION_VALUES_MAX = 256
/** Ulps a floating-point comparison may allow (2^20: far beyond any rounding difference, yet still a check). */
export const EXPECTATION_MAX_ULPS = 1 << 20

export const COMPARISON_OPS = ['==', '!=', '<', '<=', '>', '>='] as const
export type ComparisonOp = (typeof COMPARISON_OPS)[number]

/**
 * Run figures a metric claim may name (timing model section 10): `fractionOfPeak`
 * is flopsPerCycle / peakFlopsPerCycle (0 without FP work), `meanLaneBusy` the
 * mean of the lanes' busy fractions, `stallCycles` the stall cycles of all
 * reasons together.
 */
export const EXPECTATION_METRICS = [
  'cycles',
  'flops',
  'flopsPerCycle',
  'peakFlopsPerCycle',
  'fractionOfPeak',
  'meanLaneBusy',
  'loadBusUtilization',
  'storeBusUtilization',
  'ringUtilization',
  'stallCycles',
] as const
export type ExpectationMetric = (typeof EXPECTATION_METRICS)[number]

/** Lane phase bounds as the trace keeps them per (instruction, lane). */
export const PHASE_FIELDS = LANE_FIELDS.filter((f) => f !== 'elements' && f !== 'beats') as Exclude<(typeof LANE_FIELDS)[number], 'elements' | 'beats'>[]
export type PhaseField = (typeof PHASE_FIELDS)[number]

/** Element types of register and memory claims: the width and how the bits are read. */
export const ELEMENT_TYPES = ['i8', 'i16', 'i32', 'i64', 'u8', 'u16', 'u32', 'u64', 'f32', 'f64'] as const
export type ElementType = (typeof ELEMENT_TYPES)[number]

export const RUN_STAGES = ['machine', 'assemble', 'execute', 'simulate'] as const

const op = z.enum(COMPARISON_OPS, { error: `The operator is one of ${COMPARISON_OPS.join(' ')}` })
const finite = (what: string) => z.number({ error: `${what} is a number` }).refine(Number.isFinite, `${what} is a finite number`)
const wholeAtLeast0 = (what: string, max: number) =>
  z.number({ error: `${what} is a whole number` }).int(`${what} is a whole number`).min(0, `${what} is at least 0`).max(max, `${what} is at most ${max}`)

/**
 * One expected element as text: decimal (or 0x hex) integers, since 64-bit
 * ones do not fit a JSON number; for FP also NaN, Infinity, -Infinity, -0.
 */
const elementText = z.string({ error: textFieldError('A value') }).trim().min(1, 'A value is required').max(40, 'A value has at most 40 characters')
const INT_TEXT = /^[+-]?(\d+|0x[0-9a-f]+)$/i
const FP_TEXT = /^[+-]?(nan|infinity|inf|(\d+\.?\d*|\.\d+)(e[+-]?\d+)?)$/i

const valuesOf = z
  .array(elementText, { error: 'The values are a list' })
  .min(1, 'Give at least one value')
  .max(EXPECTATION_VALUES_MAX, `At most ${EXPECTATION_VALUES_MAX} values`)

const toleranceUlps = wholeAtLeast0('The tolerance in ulps', EXPECTATION_MAX_ULPS).optional()

/** Values must read as the type; a tolerance only makes sense for floating point. */
function checkElements(v: { type: ElementType; values: string[]; toleranceUlps?: number | undefined }, ctx: z.RefinementCtx): void {
  const fp = v.type === 'f32' || v.type === 'f64'
  v.values.forEach((text, i) => {
    if (!(fp ? FP_TEXT : INT_TEXT).test(text)) ctx.addIssue({ code: 'custom', path: ['values', i], message: `"${text}" is not ${fp ? 'a number' : 'an integer'} (value ${i + 1}, type ${v.type})` })
  })
  if (!fp && v.toleranceUlps !== undefined) ctx.addIssue({ code: 'custom', path: ['toleranceUlps'], message: 'A tolerance in ulps applies to f32 and f64 values only' })
}

export const metricClaimSchema = z.object({ kind: z.literal('metric'), metric: z.enum(EXPECTATION_METRICS, { error: `The metric is one of ${EXPECTATION_METRICS.join(', ')}` }), op, value: finite('The value') }).strict()

/** Stall cycles of one reason, over the whole run (lane-cycles, as the metrics count them). */
export const stallClaimSchema = z.object({ kind: z.literal('stall'), reason: z.enum(STALL_REASONS, { error: `The stall reason is one of ${STALL_REASONS.join(', ')}` }), op, value: wholeAtLeast0('The value', 1e12) }).strict()

/** A phase bound of one instruction (its `#` in the trace) in one lane. */
export const phaseClaimSchema = z
  .object({
    kind: z.literal('phase'),
    lane: wholeAtLeast0('The lane', 63),
    instruction: wholeAtLeast0('The instruction', 100_000_000),
    field: z.enum(PHASE_FIELDS as [PhaseField, ...PhaseField[]], { error: `The phase bound is one of ${PHASE_FIELDS.join(', ')}` }),
    op,
    value: wholeAtLeast0('The cycle', 1e12),
  })
  .strict()

/** complete - dispatch + 1 of one instruction. */
export const latencyClaimSchema = z.object({ kind: z.literal('latency'), instruction: wholeAtLeast0('The instruction', 100_000_000), op, value: wholeAtLeast0('The latency', 1e12) }).strict()

/** Elements of a vector register from element 0, continuing into the next registers (a register group). */
export const registerClaimSchema = z
  .object({ kind: z.literal('register'), register: wholeAtLeast0('The register', 31), type: z.enum(ELEMENT_TYPES, { error: `The type is one of ${ELEMENT_TYPES.join(', ')}` }), values: valuesOf, toleranceUlps })
  .strict()
  .superRefine(checkElements)

/** Elements of the data memory from a label of the program. */
export const memoryClaimSchema = z
  .object({
    kind: z.literal('memory'),
    label: z.string({ error: textFieldError('A label') }).trim().regex(/^[A-Za-z_.$][\w.$]*$/, 'A label is a name such as res or .Lout').max(100, 'A label has at most 100 characters'),
    type: z.enum(ELEMENT_TYPES, { error: `The type is one of ${ELEMENT_TYPES.join(', ')}` }),
    values: valuesOf,
    toleranceUlps,
  })
  .strict()
  .superRefine(checkElements)

/** A negative case: the run must fail at this stage (and with this code, when given). */
export const failsClaimSchema = z
  .object({ kind: z.literal('fails'), stage: z.enum(RUN_STAGES, { error: `The stage is one of ${RUN_STAGES.join(', ')}` }), code: z.string().trim().min(1).max(60).optional() })
  .strict()

export const EXPECTATION_KINDS = ['metric', 'stall', 'phase', 'latency', 'register', 'memory', 'fails'] as const
export type ExpectationKind = (typeof EXPECTATION_KINDS)[number]

export const expectationSchema = z.discriminatedUnion('kind', [metricClaimSchema, stallClaimSchema, phaseClaimSchema, latencyClaimSchema, registerClaimSchema, memoryClaimSchema, failsClaimSchema], {
  error: (iss) => (iss.code === 'invalid_union' ? `The kind is one of ${EXPECTATION_KINDS.join(', ')}` : undefined),
})
export type Expectation = z.output<typeof expectationSchema>
export type MetricClaim = z.output<typeof metricClaimSchema>
export type StallClaim = z.output<typeof stallClaimSchema>
export type PhaseClaim = z.output<typeof phaseClaimSchema>
export type LatencyClaim = z.output<typeof latencyClaimSchema>
export type RegisterClaim = z.output<typeof registerClaimSchema>
export type MemoryClaim = z.output<typeof memoryClaimSchema>
export type FailsClaim = z.output<typeof failsClaimSchema>

export const expectationListSchema = z.array(expectationSchema).max(EXPECTATIONS_MAX, `At most ${EXPECTATIONS_MAX} expectations per scenario`)

/** Where a verdict is decided on the Lane chart: a cycle, and the lane and instruction when there is one. */
export interface DecidingPoint {
  cycle: number
  lane: number | null
  instruction: number | null
}

/** One claim's verdict. `measured` is what the run gave, as text (null when the run has no such value). */
export interface ExpectationResult {
  index: number
  expectation: Expectation
  /** The claim in words, e.g. `cycles <= 120`. */
  text: string
  pass: boolean
  measured: string | null
  /** Why a claim failed beyond the measured value (first differing element, missing label, the run's error). */
  note: string | null
  at: DecidingPoint | null
}
