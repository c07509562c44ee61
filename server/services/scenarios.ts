/**
 * Scenarios and their versions: list, read, create, save with optimistic
 * concurrency, duplicate, soft delete and undo, history, diff and restore.
 * Every save writes a new immutable ScenarioVersion and moves the scenario's
 * head (its content and version counter) in one transaction.
 */
import { Op, literal, type Order, type Transaction, type WhereOptions } from 'sequelize'
import { UNDO_DAYS, scenarioContentSchema, type CreateScenarioBody, type RunSummary, type SaveScenarioBody, type Scenario as ScenarioDto, type ScenarioContent, type ScenarioListQuery, type ScenarioListResponse, type ScenarioSummary, type ScenarioVersion as VersionDto, type ScenarioVersionSummary } from '../../shared/schemas/scenario'
import type { AppContext } from '../context'
import { DetailedApiError } from '../http/detailed-error'
import { ApiError, errors } from '../http/errors'
import { Scenario, ScenarioVersion, User, Workspace } from '../models'

const DAY_MS = 86_400_000
export const UNDO_MS = UNDO_DAYS * DAY_MS

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i

const iso = (d: Date | null | undefined) => (d ? d.toISOString() : null)
const purgeAt = (deletedAt: Date | null) => (deletedAt ? new Date(deletedAt.getTime() + UNDO_MS).toISOString() : null)
const person = (user: User | null | undefined, fallbackName = 'a former member') => ({ id: user?.id ?? null, name: user?.name ?? fallbackName })

/** The content columns of a scenario, in the schema's canonical key order. */
export function contentOf(s: Scenario): ScenarioContent {
  return scenarioContentSchema.parse({
    title: s.title,
    description: s.description,
    tags: s.tags,
    program: s.program,
    machine: s.machine,
    initialData: s.initialData,
    view: s.view,
    expectations: s.expectations,
    walkthroughs: s.walkthroughs,
  })
}

export function scenarioDto(s: Scenario): ScenarioDto {
  return {
    id: s.id,
    workspaceId: s.workspaceId,
    version: s.version,
    content: contentOf(s),
    run: s.run,
    author: person(s.author),
    createdAt: s.createdAt.toISOString(),
    updatedAt: s.updatedAt.toISOString(),
    deletedAt: iso(s.deletedAt),
    purgeAt: purgeAt(s.deletedAt),
  }
}

export function summaryDto(s: Scenario): ScenarioSummary {
  return {
    id: s.id,
    title: s.title,
    tags: s.tags,
    version: s.version,
    author: person(s.author),
    cycles: s.run.status === 'ok' ? s.run.cycles : null,
    createdAt: s.createdAt.toISOString(),
    updatedAt: s.updatedAt.toISOString(),
    deletedAt: iso(s.deletedAt),
    purgeAt: purgeAt(s.deletedAt),
  }
}

const originally = (v: ScenarioVersion) => (v.originalAuthorName !== null && v.originalCreatedAt ? { author: v.originalAuthorName, createdAt: v.originalCreatedAt.toISOString() } : null)

export function versionDto(v: ScenarioVersion): VersionDto {
  return {
    number: v.number,
    message: v.message,
    author: { id: v.authorId, name: v.authorName },
    createdAt: v.createdAt.toISOString(),
    content: scenarioContentSchema.parse(v.content),
    run: v.run,
    originally: originally(v),
  }
}

function versionSummaryDto(v: ScenarioVersion): ScenarioVersionSummary {
  const walkthroughs = (v.get('walkthroughList') as ScenarioVersionSummary['walkthroughs'] | null) ?? []
  return { number: v.number, message: v.message, author: { id: v.authorId, name: v.authorName }, createdAt: v.createdAt.toISOString(), run: v.run, originally: originally(v), walkthroughs }
}

/** Each version's walkthroughs as {title, steps}, read inside PostgreSQL: a history list never loads whole contents. */
const WALKTHROUGH_LIST = literal(
  `(SELECT coalesce(jsonb_agg(jsonb_build_object('title', w->'title', 'steps', jsonb_array_length(w->'steps')) ORDER BY i), '[]'::jsonb)
    FROM jsonb_array_elements(coalesce("ScenarioVersion"."content"->'walkthroughs', '[]'::jsonb)) WITH ORDINALITY AS t(w, i))`,
)

/** `%`, `_` and `\` are ILIKE wildcards; a search for them means the characters. */
const likePattern = (q: string) => `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`

/**
 * Removes for good what was deleted more than 30 days ago (scenarios and
 * workspaces; versions, links and uploads go with them by ON DELETE CASCADE).
 * Run lazily, before anything that shows the trash or undoes a delete.
 */
export async function purgeExpired(): Promise<void> {
  const cutoff = new Date(Date.now() - UNDO_MS)
  await Scenario.destroy({ where: { deletedAt: { [Op.lt]: cutoff } } })
  await Workspace.destroy({ where: { deletedAt: { [Op.lt]: cutoff } }, force: true })
}

export async function listScenarios(workspaceId: string, q: ScenarioListQuery): Promise<ScenarioListResponse> {
  if (q.trash) await purgeExpired()
  const where: WhereOptions = { workspaceId, deletedAt: q.trash ? { [Op.ne]: null } : null }
  const and: WhereOptions[] = []
  if (q.tag.length) and.push({ tags: { [Op.contains]: q.tag } })
  if (q.author) and.push({ authorId: q.author })
  if (q.q) and.push({ [Op.or]: [{ title: { [Op.iLike]: likePattern(q.q) } }, { description: { [Op.iLike]: likePattern(q.q) } }] })
  const dir = q.order === 'asc' ? 'ASC' : 'DESC'
  const order: Order =
    q.sort === 'author'
      ? [[{ model: User, as: 'author' }, 'name', dir], ['id', 'ASC']]
      : [[q.sort, dir], ['id', 'ASC']]
  const { rows, count } = await Scenario.findAndCountAll({
    where: { ...where, ...(and.length ? { [Op.and]: and } : {}) },
    include: [{ model: User, as: 'author', required: false }],
    order,
    limit: q.pageSize,
    offset: (q.page - 1) * q.pageSize,
    // The list never needs the program or machine: keep rows small.
    attributes: ['id', 'title', 'tags', 'version', 'run', 'authorId', 'createdAt', 'updatedAt', 'deletedAt', 'workspaceId'],
  })
  return { scenarios: rows.map(summaryDto), page: q.page, pageSize: q.pageSize, total: count }
}

/** A scenario of this workspace (live, or also in the trash), or 404. */
export async function findScenario(workspaceId: string, scenarioId: string, options: { trashed?: boolean; transaction?: Transaction; lock?: boolean } = {}): Promise<Scenario> {
  if (!UUID.test(scenarioId)) throw errors.notFound('scenario')
  const scenario = await Scenario.findOne({
    where: { id: scenarioId, workspaceId, ...(options.trashed ? {} : { deletedAt: null }) },
    include: options.lock ? [] : [{ model: User, as: 'author', required: false }],
    transaction: options.transaction,
    lock: options.lock ? true : undefined,
  })
  if (!scenario) throw errors.notFound('scenario')
  return scenario
}

async function withAuthor(s: Scenario, transaction?: Transaction): Promise<Scenario> {
  s.author = s.authorId ? await User.findByPk(s.authorId, { transaction }) : null
  return s
}

export interface NewScenarioOptions {
  uploadId?: string
  transaction?: Transaction
  /** Already computed (imports keep the recorded summary). */
  run?: RunSummary
}

/** Creates a scenario with its version 1. */
export async function createScenario(ctx: AppContext, user: User, workspaceId: string, body: CreateScenarioBody, options: NewScenarioOptions = {}): Promise<Scenario> {
  const run = options.run ?? (await ctx.runs.summarize(body.content, workspaceId, user.id))
  const work = async (transaction: Transaction) => {
    const c = body.content
    const scenario = await Scenario.create(
      { workspaceId, ...c, run, authorId: user.id, version: 1, uploadId: options.uploadId ?? null },
      { transaction },
    )
    await ScenarioVersion.create({ scenarioId: scenario.id, number: 1, authorId: user.id, authorName: user.name, message: body.message, content: c, run }, { transaction })
    scenario.author = user
    return scenario
  }
  return options.transaction ? work(options.transaction) : ctx.sequelize.transaction(work)
}

async function latestVersion(scenarioId: string, transaction?: Transaction): Promise<ScenarioVersion> {
  const v = await ScenarioVersion.findOne({ where: { scenarioId }, order: [['number', 'DESC']], transaction })
  if (!v) throw new Error(`scenario ${scenarioId} has no version`)
  return v
}

/**
 * Saves a new version. The save names the version it started from; when the
 * head has moved since (someone else saved), nothing is written and the
 * answer is 409 with their newest version and the content sent, so the
 * client can offer "keep mine as a new version" or "reload theirs".
 */
export async function saveScenario(ctx: AppContext, user: User, workspaceId: string, scenarioId: string, body: SaveScenarioBody): Promise<{ scenario: Scenario; version: ScenarioVersion }> {
  // A save that is stale already is answered before its run: a stale save costs
  // one read, not a simulation (and cannot crowd the run pool).
  const current = await findScenario(workspaceId, scenarioId)
  if (current.version !== body.baseVersion) await conflict(current.id, body)
  // The run is CPU work on a worker thread: do it before taking the row lock,
  // and check the version again under the lock, since someone may have saved meanwhile.
  const run = await ctx.runs.summarize(body.content, workspaceId, user.id)
  return ctx.sequelize.transaction(async (transaction) => {
    const scenario = await findScenario(workspaceId, scenarioId, { transaction, lock: true })
    if (scenario.version !== body.baseVersion) await conflict(scenario.id, body, transaction)
    return writeVersion(scenario, user, body.content, body.message, run, transaction)
  })
}

/** The 409 of a save that started from an older version: theirs (the newest) and mine. */
async function conflict(scenarioId: string, body: SaveScenarioBody, transaction?: Transaction): Promise<never> {
  const theirs = await latestVersion(scenarioId, transaction)
  throw new DetailedApiError(
    409,
    'version_conflict',
    `${theirs.authorName} saved version ${theirs.number} after version ${body.baseVersion}, which your edit started from`,
    { conflict: { baseVersion: body.baseVersion, theirs: versionDto(theirs), mine: body.content } },
  )
}

async function writeVersion(scenario: Scenario, user: User, content: ScenarioContent, message: string, run: RunSummary, transaction: Transaction) {
  const number = scenario.version + 1
  const version = await ScenarioVersion.create({ scenarioId: scenario.id, number, authorId: user.id, authorName: user.name, message, content, run }, { transaction })
  await scenario.update({ ...content, run, version: number }, { transaction })
  return { scenario: await withAuthor(scenario, transaction), version }
}

/** A new version whose content is that of an old one: history only grows. */
export async function restoreVersion(ctx: AppContext, user: User, workspaceId: string, scenarioId: string, number: number, message: string) {
  const old = await getVersion(workspaceId, scenarioId, number)
  return ctx.sequelize.transaction(async (transaction) => {
    const scenario = await findScenario(workspaceId, scenarioId, { transaction, lock: true })
    return writeVersion(scenario, user, old.content, message || `Restored version ${number}`, old.run, transaction)
  })
}

export async function duplicateScenario(ctx: AppContext, user: User, workspaceId: string, scenarioId: string, title?: string): Promise<Scenario> {
  const source = await findScenario(workspaceId, scenarioId)
  const content = contentOf(source)
  const newTitle = title ?? `${content.title} (copy)`.slice(0, 200)
  return createScenario(ctx, user, workspaceId, { content: { ...content, title: newTitle }, message: `Duplicated from "${content.title}" version ${source.version}` }, { run: source.run })
}

export async function softDeleteScenario(workspaceId: string, scenarioId: string): Promise<Scenario> {
  const scenario = await findScenario(workspaceId, scenarioId)
  await scenario.update({ deletedAt: new Date() })
  return scenario
}

/** Brings a scenario back from the trash within 30 days; after that, 410. */
export async function undoDeleteScenario(workspaceId: string, scenarioId: string): Promise<Scenario> {
  const scenario = await findScenario(workspaceId, scenarioId, { trashed: true })
  if (!scenario.deletedAt) throw errors.conflict('This scenario is not deleted')
  if (Date.now() - scenario.deletedAt.getTime() > UNDO_MS) {
    throw new ApiError(410, 'undo_expired', `This scenario was deleted more than ${UNDO_DAYS} days ago and can no longer be restored`)
  }
  await scenario.update({ deletedAt: null })
  return scenario
}

/** Brings a soft-deleted workspace back within 30 days; after that, 410. */
export async function undoDeleteWorkspace(workspaceId: string): Promise<Workspace> {
  const workspace = await Workspace.findByPk(workspaceId, { paranoid: false })
  if (!workspace) throw errors.notFound('workspace')
  if (!workspace.deletedAt) throw errors.conflict('This workspace is not deleted')
  if (Date.now() - workspace.deletedAt.getTime() > UNDO_MS) {
    throw new ApiError(410, 'undo_expired', `This workspace was deleted more than ${UNDO_DAYS} days ago and can no longer be restored`)
  }
  await workspace.restore()
  return workspace
}

export async function listVersions(workspaceId: string, scenarioId: string): Promise<ScenarioVersionSummary[]> {
  const scenario = await findScenario(workspaceId, scenarioId)
  const rows = await ScenarioVersion.findAll({
    where: { scenarioId: scenario.id },
    order: [['number', 'DESC']],
    attributes: { exclude: ['content'], include: [[WALKTHROUGH_LIST, 'walkthroughList']] },
  })
  return rows.map(versionSummaryDto)
}

export async function findVersion(scenarioId: string, number: number, transaction?: Transaction): Promise<ScenarioVersion> {
  const v = Number.isInteger(number) && number >= 1 ? await ScenarioVersion.findOne({ where: { scenarioId, number }, transaction }) : null
  if (!v) throw errors.notFound(`version ${number}`)
  return v
}

export async function getVersion(workspaceId: string, scenarioId: string, number: number): Promise<VersionDto> {
  const scenario = await findScenario(workspaceId, scenarioId)
  return versionDto(await findVersion(scenario.id, number))
}

/** Parses a `:number` route parameter; anything but a positive integer is a version that does not exist. */
export function versionNumberParam(raw: unknown): number {
  const s = String(raw)
  if (!/^\d{1,9}$/.test(s)) throw errors.notFound(`version ${s}`)
  return Number(s)
}
