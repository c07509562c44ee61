/**
 * Scenarios: a saved program + machine + data + view, with numbered,
 * immutable versions. One schema per concept, shared by the server (request
 * validation, OpenAPI) and the client (response validation, forms).
 */
import { z } from 'zod'
import { expectationListSchema } from './expectation'
import { machineSchema } from './machine'
import { textFieldError } from './text'
import { walkthroughListSchema } from './walkthrough'
import { STALL_REASONS } from '../sim/trace/types'

export const SCENARIO_TITLE_MAX_LENGTH = 200
export const SCENARIO_DESCRIPTION_MAX_LENGTH = 20_000
export const SCENARIO_TAGS_MAX = 20
export const SCENARIO_TAG_MAX_LENGTH = 40
/** The assembler's own cap is 1,000,000 characters; a scenario is a kernel, not a library. */
export const SCENARIO_PROGRAM_MAX_LENGTH = 200_000
export const VERSION_MESSAGE_MAX_LENGTH = 500
export const INITIAL_DATA_MAX_ENTRIES = 64
export const INITIAL_DATA_MAX_VALUES = 4096
/** The Bench's largest cycle (the timing model's default cycle limit). */
export const VIEW_MAX_CYCLE = 5_000_000
/** A soft-deleted workspace or scenario can be brought back for this long. */
export const UNDO_DAYS = 30

const cycle = z.number().int('A cycle is a whole number').min(0, 'A cycle is at least 0').max(VIEW_MAX_CYCLE, `A cycle is at most ${VIEW_MAX_CYCLE}`)

/**
 * What the Bench shows: cursor cycle, zoom window and selected instruction
 * (null: not set), whole cycles only; optionally the Lane chart's R/E/W rows
 * and Dependencies switches and the vector register the inspector shows
 * (absent in views saved before they existed: off and none).
 */
export const scenarioViewSchema = z
  .object({
    cursor: cycle.nullable().default(null),
    window: z
      .object({ start: cycle, end: cycle })
      .refine((w) => w.start < w.end, { message: 'The window must start before it ends', path: ['end'] })
      .nullable()
      .default(null),
    selected: z.number().int().min(0, 'An instruction index is at least 0').nullable().default(null),
    subRows: z.boolean().optional(),
    dependencies: z.boolean().optional(),
    register: z.number().int('A register is a whole number').min(0, 'A register is v0 to v31').max(31, 'A register is v0 to v31').nullable().optional(),
  })
  .strict()
export type ScenarioView = z.output<typeof scenarioViewSchema>

export const DATA_TYPES = ['i8', 'i16', 'i32', 'i64', 'u8', 'u16', 'u32', 'u64', 'f32', 'f64'] as const
export type DataType = (typeof DATA_TYPES)[number]

/**
 * Initial values of named data, applied over the program's `.data` when the
 * scenario runs: `{ label, type, values }`, values as decimal text (64-bit
 * integers do not fit a JSON number). A label's values must fit its size.
 */
export const initialDataEntrySchema = z
  .object({
    label: z.string({ error: textFieldError('A data label') }).min(1, 'A data label is required').max(100, 'A data label has at most 100 characters'),
    type: z.enum(DATA_TYPES, { error: `The type is one of ${DATA_TYPES.join(', ')}` }),
    values: z
      .array(z.string().trim().min(1, 'A value is required').max(40, 'A value has at most 40 characters'))
      .min(1, 'Give at least one value')
      .max(INITIAL_DATA_MAX_VALUES, `At most ${INITIAL_DATA_MAX_VALUES} values per label`),
  })
  .strict()
export type InitialDataEntry = z.output<typeof initialDataEntrySchema>

export const tagSchema = z
  .string({ error: textFieldError('A tag') })
  .trim()
  .toLowerCase()
  .min(1, 'A tag is not empty')
  .max(SCENARIO_TAG_MAX_LENGTH, `A tag has at most ${SCENARIO_TAG_MAX_LENGTH} characters`)
  .regex(/^[\p{L}\p{N}][\p{L}\p{N} ._+-]*$/u, 'A tag has letters, digits, spaces and . _ + - only, and starts with a letter or digit')

export const scenarioTitleSchema = z
  .string({ error: textFieldError('A title') })
  .trim()
  .min(1, 'A title is required')
  .max(SCENARIO_TITLE_MAX_LENGTH, `A title has at most ${SCENARIO_TITLE_MAX_LENGTH} characters`)

/** Everything a version snapshots: what a user edits on the Bench. */
export const scenarioContentSchema = z
  .object({
    title: scenarioTitleSchema,
    /** Markdown; the client renders it without raw HTML. */
    description: z.string().max(SCENARIO_DESCRIPTION_MAX_LENGTH, `A description has at most ${SCENARIO_DESCRIPTION_MAX_LENGTH} characters`).default(''),
    tags: z
      .array(tagSchema)
      .max(SCENARIO_TAGS_MAX, `At most ${SCENARIO_TAGS_MAX} tags`)
      .default([])
      .transform((tags) => [...new Set(tags)]),
    program: z.string({ error: textFieldError('A program') }).max(SCENARIO_PROGRAM_MAX_LENGTH, `A program has at most ${SCENARIO_PROGRAM_MAX_LENGTH} characters`),
    machine: machineSchema.prefault({}),
    initialData: z.array(initialDataEntrySchema).max(INITIAL_DATA_MAX_ENTRIES, `At most ${INITIAL_DATA_MAX_ENTRIES} data labels`).default([]),
    view: scenarioViewSchema.prefault({}),
    /** Claims each run is checked against (shared/schemas/expectation.ts); versions and bundles from before them have none. */
    expectations: expectationListSchema.default([]),
    /**
     * Step-by-step explanations of this version's run (shared/schemas/walkthrough.ts). They belong to
     * the version: its cycles are the cycles they point at. Versions and bundles from before them have none.
     */
    walkthroughs: walkthroughListSchema.default([]),
  })
  .strict()
/** Validated content: every default filled in, so two equal scenarios compare equal. */
export type ScenarioContent = z.output<typeof scenarioContentSchema>
export type ScenarioContentInput = z.input<typeof scenarioContentSchema>

/** Stall cycles by reason, every reason present. */
export const stallCountsSchema = z.object(Object.fromEntries(STALL_REASONS.map((r) => [r, z.number().int().min(0)])) as Record<(typeof STALL_REASONS)[number], z.ZodNumber>)

/**
 * The run summary a version keeps: the server runs the saved program on the
 * saved machine with the shared engine, so the numbers in the history come
 * from one model, not from whichever client saved. A program that does not
 * run keeps the stage and the message instead.
 */
export const runSummarySchema = z.discriminatedUnion('status', [
  z.object({
    status: z.literal('ok'),
    cycles: z.number().int().min(0),
    flopsPerCycle: z.number().min(0),
    stallCycles: stallCountsSchema,
  }),
  z.object({
    status: z.literal('failed'),
    stage: z.enum(['machine', 'assemble', 'execute', 'simulate']),
    code: z.string(),
    message: z.string(),
  }),
])
export type RunSummary = z.infer<typeof runSummarySchema>

export const personSchema = z.object({ id: z.uuid().nullable(), name: z.string() })

/** One immutable snapshot. */
export const scenarioVersionSchema = z.object({
  number: z.number().int().min(1),
  message: z.string(),
  /** The author's name is kept as it was when the version was written; id is null once the user is gone. */
  author: personSchema,
  createdAt: z.iso.datetime(),
  content: scenarioContentSchema,
  run: runSummarySchema,
  /**
   * Set on imported versions: the author name and date the bundle file
   * claimed. `author` and `createdAt` are the importer and the import time,
   * and `run` was computed again on import, so a file cannot put words or
   * figures in anyone's mouth.
   */
  originally: z.object({ author: z.string(), createdAt: z.iso.datetime() }).nullable().default(null),
})
export type ScenarioVersion = z.infer<typeof scenarioVersionSchema>

/** A version without its content, for history lists: its walkthroughs by title and length only. */
export const scenarioVersionSummarySchema = scenarioVersionSchema.omit({ content: true }).extend({
  walkthroughs: z.array(z.object({ title: z.string(), steps: z.number().int() })).default([]),
})
export type ScenarioVersionSummary = z.infer<typeof scenarioVersionSummarySchema>

/** A scenario as the API shows it: its newest content and version number. */
export const scenarioSchema = z.object({
  id: z.uuid(),
  workspaceId: z.uuid(),
  version: z.number().int().min(1),
  content: scenarioContentSchema,
  run: runSummarySchema,
  author: personSchema,
  createdAt: z.iso.datetime(),
  updatedAt: z.iso.datetime(),
  /** Set while the scenario is in the trash; it can be restored until `purgeAt`. */
  deletedAt: z.iso.datetime().nullable(),
  purgeAt: z.iso.datetime().nullable(),
})
export type Scenario = z.infer<typeof scenarioSchema>

/** A row of the Scenarios table. */
export const scenarioSummarySchema = z.object({
  id: z.uuid(),
  title: z.string(),
  tags: z.array(z.string()),
  version: z.number().int(),
  author: personSchema,
  cycles: z.number().int().nullable(),
  createdAt: z.iso.datetime(),
  updatedAt: z.iso.datetime(),
  deletedAt: z.iso.datetime().nullable(),
  purgeAt: z.iso.datetime().nullable(),
})
export type ScenarioSummary = z.infer<typeof scenarioSummarySchema>

export const SCENARIO_SORTS = ['updatedAt', 'createdAt', 'title', 'author'] as const
export const PAGE_SIZE_MAX = 100

const intParam = (name: string, min: number, max: number, def: number) =>
  z.coerce
    .number({ error: `${name} must be a number` })
    .int(`${name} must be a whole number`)
    .min(min, `${name} is at least ${min}`)
    .max(max, `${name} is at most ${max}`)
    .default(def)

/**
 * GET /api/workspaces/:id/scenarios?page&pageSize&sort&order&tag&author&q&trash
 * `tag` may repeat or be comma-separated: a scenario must carry every tag.
 * `q` matches title and description, case-insensitively. `trash=true` lists
 * the soft-deleted ones instead.
 */
export const scenarioListQuerySchema = z
  .object({
    page: intParam('page', 1, 100_000, 1),
    pageSize: intParam('pageSize', 1, PAGE_SIZE_MAX, 20),
    sort: z.enum(SCENARIO_SORTS, { error: `sort is one of ${SCENARIO_SORTS.join(', ')}` }).default('updatedAt'),
    order: z.enum(['asc', 'desc'], { error: 'order is asc or desc' }).default('desc'),
    tag: z
      .union([z.string(), z.array(z.string())])
      .optional()
      .transform((v) => (v === undefined ? [] : (Array.isArray(v) ? v : [v]).flatMap((s) => s.split(','))))
      .pipe(z.array(tagSchema).max(SCENARIO_TAGS_MAX)),
    author: z.uuid('author is a user id').optional(),
    q: z.string().trim().max(200, 'q has at most 200 characters').optional(),
    trash: z.enum(['true', 'false']).default('false').transform((v) => v === 'true'),
  })
  .strict()
export type ScenarioListQuery = z.output<typeof scenarioListQuerySchema>

export const scenarioListResponseSchema = z.object({
  scenarios: z.array(scenarioSummarySchema),
  page: z.number().int(),
  pageSize: z.number().int(),
  total: z.number().int(),
})
export type ScenarioListResponse = z.infer<typeof scenarioListResponseSchema>

const messageSchema = z.string().trim().max(VERSION_MESSAGE_MAX_LENGTH, `A message has at most ${VERSION_MESSAGE_MAX_LENGTH} characters`).default('')

/** POST /api/workspaces/:id/scenarios -> 201 { scenario } (version 1) */
export const createScenarioBodySchema = z.object({ content: scenarioContentSchema, message: messageSchema }).strict()
export type CreateScenarioBody = z.output<typeof createScenarioBodySchema>

/**
 * POST /api/workspaces/:id/scenarios/:scenarioId/versions -> 201 { scenario, version }
 * `baseVersion` is the version the edit started from: when someone saved in
 * between, the answer is 409 with both (see saveConflictBodySchema).
 */
export const saveScenarioBodySchema = z
  .object({ baseVersion: z.number({ error: 'baseVersion is the version number the edit started from' }).int().min(1), content: scenarioContentSchema, message: messageSchema })
  .strict()
export type SaveScenarioBody = z.output<typeof saveScenarioBodySchema>

/** POST .../duplicate -> 201 { scenario }; the title defaults to "<title> (copy)". */
export const duplicateScenarioBodySchema = z.object({ title: scenarioTitleSchema.optional() }).strict()

/** POST .../versions/:number/restore -> 201 { scenario, version }: a new version with the old content. */
export const restoreVersionBodySchema = z.object({ message: messageSchema }).strict()

export const scenarioResponseSchema = z.object({ scenario: scenarioSchema })
export const savedScenarioResponseSchema = z.object({ scenario: scenarioSchema, version: scenarioVersionSchema })
export const versionListResponseSchema = z.object({ versions: z.array(scenarioVersionSummarySchema) })
export const versionResponseSchema = z.object({ version: scenarioVersionSchema })

/** The 409 of a save that lost the race: the newest version (theirs) and the content sent (mine). */
export const saveConflictBodySchema = z.object({
  error: z.object({ code: z.literal('version_conflict'), message: z.string() }),
  conflict: z.object({ baseVersion: z.number().int(), theirs: scenarioVersionSchema, mine: scenarioContentSchema }),
})
export type SaveConflictBody = z.infer<typeof saveConflictBodySchema>

/** GET .../versions/diff?from=N&to=M */
export const versionDiffQuerySchema = z.object({ from: intParam('from', 1, 1_000_000, 1), to: intParam('to', 1, 1_000_000, 1) }).strict()

export const lineChangeSchema = z.object({
  op: z.enum(['equal', 'insert', 'delete']),
  /** 1-based first line in the old (equal, delete) or new (insert) text. */
  oldStart: z.number().int().nullable(),
  newStart: z.number().int().nullable(),
  lines: z.array(z.string()),
})
export type LineChange = z.infer<typeof lineChangeSchema>

export const versionDiffSchema = z.object({
  from: z.number().int(),
  to: z.number().int(),
  program: z.object({
    changes: z.array(lineChangeSchema),
    added: z.number().int(),
    removed: z.number().int(),
    /**
     * False when the programs differ in more lines than the server diffs line
     * by line: the changes are then the common head and tail and one replaced
     * block between them (correct, not minimal).
     */
    exact: z.boolean().default(true),
  }),
  /** Dotted machine field names whose value differs, e.g. `units.fpu.latency`. */
  machine: z.array(z.object({ field: z.string(), before: z.unknown(), after: z.unknown() })),
  /** Other content fields that differ (title, description, tags, initialData, view). */
  fields: z.array(z.object({ field: z.string(), before: z.unknown(), after: z.unknown() })),
  /** Expectations only in the newer version (added) or only in the older (removed), in words (`cycles <= 120`). */
  expectations: z.object({ added: z.array(z.string()), removed: z.array(z.string()) }).default({ added: [], removed: [] }),
  metrics: z.object({ before: runSummarySchema, after: runSummarySchema }),
})
export type VersionDiff = z.infer<typeof versionDiffSchema>
export const versionDiffResponseSchema = z.object({ diff: versionDiffSchema })
