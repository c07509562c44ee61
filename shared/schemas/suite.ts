/**
 * Suites: a named set of scenarios of a workspace, run together on the
 * server's job queue (optionally all on one preset instead of each scenario's
 * own machine), with a history of runs that records the timing model's
 * version, pass or fail per expectation and each kernel's characterisation
 * figures. One schema per concept, shared by the server, its workers, the
 * client and the OpenAPI description.
 */
import { z } from 'zod'
import { PRESET_IDS } from '../sim/presets'
import { STALL_REASONS } from '../sim/trace/types'
import { expectationSchema } from './expectation'
import { pointFiguresSchema } from './sweep'
import { textFieldError } from './text'

/** Scenarios a suite holds: one suite run is one job, so it stays a job of minutes. */
export const SUITE_MAX_SCENARIOS = 50
/** Watchers a suite may have: every red run e-mails them all, and counts against the starter's mail budget. */
export const SUITE_MAX_WATCHERS = 20
export const SUITE_TITLE_MAX_LENGTH = 200
export const SUITE_DESCRIPTION_MAX_LENGTH = 2000
/** Suites a workspace may keep. */
export const SUITES_PER_WORKSPACE = 100
/** Suite runs a workspace may have queued or running at once (429 past it). */
export const SUITE_RUNS_ACTIVE_MAX = 3
/** Suite runs a workspace may start in 24 hours (429 past it). */
export const SUITE_RUNS_PER_DAY = 200
/** Runs one suite's history keeps; older ones are deleted when a new one is queued. */
export const SUITE_HISTORY_MAX = 100
/** What one scenario of a suite run may take (the save run's limits): over them, that scenario's run fails at its stage. */
export const SUITE_SCENARIO_LIMITS = { steps: 1_000_000, cycles: 1_000_000 } as const

const presetId = z.enum(PRESET_IDS, { error: `The preset is one of ${PRESET_IDS.join(', ')}` })

export const suiteBodySchema = z
  .object({
    title: z.string({ error: textFieldError('A title') }).trim().min(1, 'A title is required').max(SUITE_TITLE_MAX_LENGTH, `A title has at most ${SUITE_TITLE_MAX_LENGTH} characters`),
    description: z.string({ error: textFieldError('A description') }).max(SUITE_DESCRIPTION_MAX_LENGTH, `A description has at most ${SUITE_DESCRIPTION_MAX_LENGTH} characters`).default(''),
    scenarioIds: z
      .array(z.uuid('Each entry is a scenario id'))
      .min(1, 'A suite holds at least one scenario')
      .max(SUITE_MAX_SCENARIOS, `A suite holds at most ${SUITE_MAX_SCENARIOS} scenarios`)
      .refine((ids) => new Set(ids).size === ids.length, 'A scenario is in a suite once'),
    /** Run every scenario on this preset instead of its own machine; null: each on its own. */
    presetId: presetId.nullable().default(null),
    /** Members e-mailed when a run of the suite has a failing expectation. */
    watcherIds: z
      .array(z.uuid('Each watcher is a user id'))
      .max(SUITE_MAX_WATCHERS, `At most ${SUITE_MAX_WATCHERS} watchers`)
      .refine((ids) => new Set(ids).size === ids.length, 'A watcher is listed once')
      .default([]),
  })
  .strict()
export type SuiteBody = z.output<typeof suiteBodySchema>
export type SuiteBodyInput = z.input<typeof suiteBodySchema>

/** POST .../suites/:suiteId/runs: optionally on another preset than the suite's (a characterisation on several machines). */
export const suiteRunBodySchema = z
  .object({ presetId: presetId.nullable().optional() })
  .strict()
export type SuiteRunBody = z.output<typeof suiteRunBodySchema>

export const SUITE_RUN_STATUSES = ['queued', 'running', 'passed', 'failed', 'error'] as const
export type SuiteRunStatus = (typeof SUITE_RUN_STATUSES)[number]

/** The bound a characterisation names for a kernel (README "Characterisation report" has the rules). */
export const BOUNDS = ['compute', 'bank ports', 'memory bus', 'ring', 'dependences', 'front end', 'issue resources', 'start-up'] as const
export type Bound = (typeof BOUNDS)[number]

export const kernelFiguresSchema = pointFiguresSchema.extend({
  /** Bytes over the load and store buses a cycle. */
  bytesPerCycle: z.number(),
  /** The two largest stall reasons with their share of all stall cycles (fewer when fewer reasons stalled). */
  topStalls: z.array(z.object({ reason: z.enum(STALL_REASONS), share: z.number() })),
  bound: z.enum(BOUNDS),
  /** The one-line verdict: the bound and the figure that decided it. */
  verdict: z.string(),
})
export type KernelFigures = z.output<typeof kernelFiguresSchema>

export const expectationResultSchema = z.object({
  index: z.number().int(),
  expectation: expectationSchema,
  text: z.string(),
  pass: z.boolean(),
  measured: z.string().nullable(),
  note: z.string().nullable(),
  at: z.object({ cycle: z.number(), lane: z.number().nullable(), instruction: z.number().nullable() }).nullable(),
})

/** One scenario of a suite run: the version it ran, its verdicts and figures, or why it could not run. */
export const suiteRunEntrySchema = z.object({
  scenarioId: z.string(),
  title: z.string(),
  /** The version number that ran (null: the scenario was deleted before the run). */
  version: z.number().int().nullable(),
  status: z.enum(['ok', 'failed', 'missing']),
  error: z.object({ stage: z.string(), code: z.string(), message: z.string() }).nullable(),
  results: z.array(expectationResultSchema),
  figures: kernelFiguresSchema.nullable(),
})
export type SuiteRunEntry = z.output<typeof suiteRunEntrySchema>

export const suiteRunSummarySchema = z.object({
  id: z.string(),
  suiteId: z.string(),
  status: z.enum(SUITE_RUN_STATUSES),
  /** The machine every scenario ran on, or null: each on its own. */
  presetId: z.string().nullable(),
  /** MODEL_VERSION of the engine that ran it (null until a worker takes it). */
  modelVersion: z.number().int().nullable(),
  passed: z.number().int(),
  failed: z.number().int(),
  scenarios: z.number().int(),
  message: z.string().nullable(),
  startedBy: z.string().nullable(),
  createdAt: z.string(),
  finishedAt: z.string().nullable(),
})
export type SuiteRunSummary = z.output<typeof suiteRunSummarySchema>

/**
 * What changed since the suite's previous finished run: its model version and
 * machine, and each claim whose verdict flipped (`title › claim: pass -> FAIL`),
 * so a change of results can be traced to a model or machine change.
 */
export const suiteRunPreviousSchema = z.object({
  id: z.string(),
  modelVersion: z.number().int().nullable(),
  presetId: z.string().nullable(),
  changed: z.array(z.string()),
})

export const suiteRunSchema = suiteRunSummarySchema.extend({ suiteTitle: z.string(), entries: z.array(suiteRunEntrySchema), previous: suiteRunPreviousSchema.nullable() })
export type SuiteRun = z.output<typeof suiteRunSchema>

export const suiteSchema = z.object({
  id: z.string(),
  title: z.string(),
  description: z.string(),
  presetId: z.string().nullable(),
  scenarios: z.array(z.object({ id: z.string(), title: z.string().nullable(), version: z.number().int().nullable(), expectations: z.number().int() })),
  watchers: z.array(z.object({ id: z.string(), name: z.string() })),
  lastRun: suiteRunSummarySchema.nullable(),
  createdAt: z.string(),
  updatedAt: z.string(),
})
export type Suite = z.output<typeof suiteSchema>

export const suiteResponseSchema = z.object({ suite: suiteSchema })
export const suiteListResponseSchema = z.object({ suites: z.array(suiteSchema) })
export const suiteRunResponseSchema = z.object({ run: suiteRunSchema })
export const suiteRunListResponseSchema = z.object({ runs: z.array(suiteRunSummarySchema) })
export const suiteRunCreatedResponseSchema = z.object({ run: suiteRunSummarySchema })
