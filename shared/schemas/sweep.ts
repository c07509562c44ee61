/**
 * Sweeps: one program and machine run over a grid of one to three swept
 * parameters (machine fields or program symbols). The definition, the figures
 * of one point and the CSV columns, shared by the CLI, the browser pool, the
 * server and its workers.
 */
import { z } from 'zod'
import { STALL_REASONS } from '../sim/trace/types'
import { SCENARIO_PROGRAM_MAX_LENGTH } from './scenario'

/** At most three swept parameters: a curve, a grid, or a grid of curves. */
export const SWEEP_MAX_PARAMETERS = 3
/** A SPEC is short text: `1..256`, `1..256:8` or a comma list. */
export const SWEEP_SPEC_MAX_LENGTH = 2000
/** Points a sweep may have in the browser (more belong on the server). */
export const SWEEP_DEFAULT_MAX_POINTS = 10_000
/** Points a sweep may have at all (the CLI and the server). */
export const SWEEP_HARD_MAX_POINTS = 1_000_000
/** Cycles one point may take before it fails with 'cycle-limit' (the timing model's default). */
export const SWEEP_DEFAULT_CYCLE_LIMIT = 5_000_000
/** Wall-clock time of the whole sweep; past it the sweep stops and keeps the points done. */
export const SWEEP_DEFAULT_TIME_LIMIT_MS = 10 * 60_000

export const sweepParameterSchema = z
  .object({
    /** A dotted machine field (`issue`, `units.fpu.latency`) or a program symbol (`AVL`). */
    path: z
      .string()
      .trim()
      .min(1, 'A swept parameter needs a name')
      .max(100, 'A parameter name has at most 100 characters')
      .regex(/^[A-Za-z_0-9][A-Za-z_0-9.$]*$/, 'A parameter is a dotted machine field (units.fpu.latency) or a symbol name (AVL)'),
    /** `A..B`, `A..B:STEP` or `v1,v2,...`. */
    spec: z.string().trim().min(1, 'Give the values: A..B, A..B:STEP or a comma list').max(SWEEP_SPEC_MAX_LENGTH, `A value list has at most ${SWEEP_SPEC_MAX_LENGTH} characters`),
  })
  .strict()
export type SweepParameter = z.output<typeof sweepParameterSchema>

export const sweepLimitsSchema = z
  .object({
    maxPoints: z.number().int().min(1).max(SWEEP_HARD_MAX_POINTS).default(SWEEP_DEFAULT_MAX_POINTS),
    cycleLimit: z.number().int().min(1).max(SWEEP_DEFAULT_CYCLE_LIMIT).default(SWEEP_DEFAULT_CYCLE_LIMIT),
    timeLimitMs: z.number().int().min(1).max(24 * 3600_000).default(SWEEP_DEFAULT_TIME_LIMIT_MS),
  })
  .strict()
export type SweepLimits = z.output<typeof sweepLimitsSchema>

export const sweepDefinitionSchema = z
  .object({
    program: z.string().min(1, 'The program is empty').max(SCENARIO_PROGRAM_MAX_LENGTH, `A program has at most ${SCENARIO_PROGRAM_MAX_LENGTH} characters`),
    /** The base machine (any fields; defaults fill the rest). Validated against the machine schema when the sweep is resolved. */
    machine: z.record(z.string(), z.unknown()).default({}),
    parameters: z
      .array(sweepParameterSchema)
      .min(1, 'Sweep at least one parameter')
      .max(SWEEP_MAX_PARAMETERS, `Sweep at most ${SWEEP_MAX_PARAMETERS} parameters`)
      .refine((ps) => new Set(ps.map((p) => p.path)).size === ps.length, 'A parameter is swept only once'),
    limits: sweepLimitsSchema.prefault({}),
  })
  .strict()
export type SweepDefinition = z.output<typeof sweepDefinitionSchema>
export type SweepDefinitionInput = z.input<typeof sweepDefinitionSchema>

/** A swept value: a number, an enum name or a boolean. */
export const sweepValueSchema = z.union([z.number(), z.string(), z.boolean()])
export type SweepValue = z.output<typeof sweepValueSchema>

const stallCountsSchema = z.object(Object.fromEntries(STALL_REASONS.map((r) => [r, z.number()])) as Record<(typeof STALL_REASONS)[number], z.ZodNumber>)

/** The figures of one point that ran to the end. */
export const pointFiguresSchema = z.object({
  cycles: z.number(),
  flops: z.number(),
  flopsPerCycle: z.number(),
  peakFlopsPerCycle: z.number(),
  fractionOfPeak: z.number(),
  laneBusyMean: z.number(),
  laneBusyMin: z.number(),
  unitUtilization: z.object({ alu: z.number(), mul: z.number(), fpu: z.number(), div: z.number() }),
  bankUtilization: z.array(z.number()),
  busUtilization: z.object({ load: z.number(), store: z.number() }),
  ringUtilization: z.number(),
  stalls: stallCountsSchema,
})
export type PointFigures = z.output<typeof pointFiguresSchema>

/** One point's result: its figures, or the stage and message of the run that failed there (a result, not an abort). */
export const sweepPointResultSchema = z.object({
  index: z.number().int().min(0),
  values: z.array(sweepValueSchema),
  status: z.enum(['ok', 'failed']),
  figures: pointFiguresSchema.nullable(),
  error: z.object({ stage: z.string(), code: z.string(), message: z.string() }).nullable(),
})
export type SweepPointResult = z.output<typeof sweepPointResultSchema>

/** The figure columns of the CSV, after the swept names and before status and error. */
export const SWEEP_FIGURE_COLUMNS = [
  'cycles',
  'flops',
  'flopsPerCycle',
  'peakFlopsPerCycle',
  'fractionOfPeak',
  'laneBusyMean',
  'laneBusyMin',
  ...STALL_REASONS.map((r) => `stall.${r}` as const),
] as const

/** Where a saved sweep ran: in the browser (saved with its points) or on the server's workers. */
export const SWEEP_RUNNERS = ['browser', 'server'] as const
export const SWEEP_STATUSES = ['queued', 'running', 'done', 'cancelled', 'stopped'] as const
export type SweepRunStatus = (typeof SWEEP_STATUSES)[number]
/** Points a workspace's server sweeps may run a day, and its sweeps queued or running at once. */
export const SWEEP_SERVER_POINTS_PER_DAY = 200_000
export const SWEEP_SERVER_CONCURRENT = 2

export const createSweepBodySchema = z
  .object({
    title: z.string().trim().min(1, 'A title is required').max(200, 'A title has at most 200 characters'),
    definition: sweepDefinitionSchema,
    runner: z.enum(SWEEP_RUNNERS, { error: `The runner is one of ${SWEEP_RUNNERS.join(', ')}` }),
    /** The scenario version the sweep belongs to, if any. */
    scenarioId: z.uuid().nullable().default(null),
    versionId: z.uuid().nullable().default(null),
    /** A browser sweep's results (at most its points). */
    points: z.array(sweepPointResultSchema).max(SWEEP_DEFAULT_MAX_POINTS).default([]),
    status: z.enum(['done', 'cancelled', 'stopped']).default('done'),
    message: z.string().max(1000).nullable().default(null),
  })
  .strict()
export type CreateSweepBody = z.output<typeof createSweepBodySchema>

export const sweepSummarySchema = z.object({
  id: z.uuid(),
  title: z.string(),
  runner: z.enum(SWEEP_RUNNERS),
  status: z.enum(SWEEP_STATUSES),
  planned: z.number().int(),
  done: z.number().int(),
  message: z.string().nullable(),
  scenarioId: z.uuid().nullable(),
  versionId: z.uuid().nullable(),
  /** The number of that scenario version, if the sweep belongs to one. */
  version: z.number().int().nullable(),
  parameters: z.array(sweepParameterSchema),
  createdAt: z.string(),
})
export type SweepSummary = z.output<typeof sweepSummarySchema>

/** GET /api/workspaces/:id/sweeps?scenarioId=...: one scenario's sweeps (its history lists them by version). */
export const sweepListQuerySchema = z.object({ scenarioId: z.uuid({ error: 'scenarioId is a scenario id (a UUID)' }).optional() })

export const sweepListResponseSchema = z.object({ sweeps: z.array(sweepSummarySchema) })
export const sweepResponseSchema = z.object({ sweep: sweepSummarySchema.extend({ definition: sweepDefinitionSchema, points: z.array(sweepPointResultSchema) }) })
export const sweepCreatedResponseSchema = z.object({ sweep: sweepSummarySchema })

/** Points a shared sweep may carry: the browser's limit, so that a share answer stays a few megabytes. */
export const SHARED_SWEEP_MAX_POINTS = SWEEP_DEFAULT_MAX_POINTS

/**
 * A sweep as a share link's reader sees it, read-only, beside the shared
 * version: no ids of people, workspaces or scenarios (share-link.ts).
 */
export const sharedSweepSchema = z.object({
  title: z.string(),
  runner: z.enum(SWEEP_RUNNERS),
  status: z.enum(SWEEP_STATUSES),
  message: z.string().nullable(),
  planned: z.number().int(),
  definition: sweepDefinitionSchema,
  points: z.array(sweepPointResultSchema),
})
export type SharedSweep = z.output<typeof sharedSweepSchema>
