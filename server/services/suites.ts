/**
 * Suites of a workspace: create, change, list, delete, export as a bundle the
 * CLI runs, and queue runs for the suite workers (worker-suites.ts) within the
 * workspace's limits (runs at once, runs a day). A run's results are written
 * by the worker; here they are read back with the run's model version.
 */
import { literal, Op } from 'sequelize'
import type { Bundle } from '../../shared/schemas/bundle'
import {
  SUITE_HISTORY_MAX,
  SUITE_RUNS_ACTIVE_MAX,
  SUITE_RUNS_PER_DAY,
  SUITES_PER_WORKSPACE,
  type Suite as SuiteDto,
  type SuiteBody,
  type SuiteRun as SuiteRunDto,
  type SuiteRunBody,
  type SuiteRunSummary,
} from '../../shared/schemas/suite'
import type { AppContext } from '../context'
import { ApiError, errors } from '../http/errors'
import { Membership, Scenario, Suite, SuiteRun, User } from '../models'
import { exportBundle } from './scenario-bundles'
import { changedVerdicts } from './suite-runner'

export function runSummary(r: SuiteRun): SuiteRunSummary {
  return {
    id: r.id,
    suiteId: r.suiteId,
    status: r.status,
    presetId: r.presetId,
    modelVersion: r.modelVersion,
    passed: r.passed,
    failed: r.failed,
    // Lists read the count without the entries (a run of 50 scenarios holds every verdict).
    scenarios: r.entries?.length ?? Number(r.get('entryCount') ?? 0),
    message: r.message,
    startedBy: r.startedBy?.name ?? null,
    createdAt: r.createdAt.toISOString(),
    finishedAt: r.finishedAt?.toISOString() ?? null,
  }
}

async function suiteDto(s: Suite, lastRun: SuiteRun | null): Promise<SuiteDto> {
  const scenarios = await Scenario.findAll({ where: { id: s.scenarioIds, workspaceId: s.workspaceId }, attributes: ['id', 'title', 'version', 'expectations'] })
  const byId = new Map(scenarios.map((x) => [x.id, x]))
  const users = await User.findAll({ where: { id: s.watcherIds }, attributes: ['id', 'name'] })
  const names = new Map(users.map((u) => [u.id, u.name]))
  return {
    id: s.id,
    title: s.title,
    description: s.description,
    presetId: s.presetId,
    // A scenario deleted since it was added stays listed, without a title, until the suite is changed.
    scenarios: s.scenarioIds.map((id) => {
      const x = byId.get(id)
      return { id, title: x?.title ?? null, version: x?.version ?? null, expectations: x?.expectations.length ?? 0 }
    }),
    watchers: s.watcherIds.filter((id) => names.has(id)).map((id) => ({ id, name: names.get(id) as string })),
    lastRun: lastRun ? runSummary(lastRun) : null,
    createdAt: s.createdAt.toISOString(),
    updatedAt: s.updatedAt.toISOString(),
  }
}

const withStarter = { include: [{ model: User, as: 'startedBy', attributes: ['name'] }] }
/** A run's row for lists: everything but the entries, and how many there are. */
const summaryAttributes = { exclude: ['entries'], include: [[literal('jsonb_array_length("SuiteRun"."entries")'), 'entryCount']] as [ReturnType<typeof literal>, string][] }

async function lastRunOf(suiteId: string): Promise<SuiteRun | null> {
  return SuiteRun.findOne({ where: { suiteId }, order: [['createdAt', 'DESC']], attributes: summaryAttributes, ...withStarter })
}

/** Scenarios must be live scenarios of the workspace, watchers its members: a 400 naming the entry otherwise. */
async function checkBody(workspaceId: string, body: SuiteBody): Promise<void> {
  const found = new Set((await Scenario.findAll({ where: { id: body.scenarioIds, workspaceId }, attributes: ['id'] })).map((s) => s.id))
  const fields: Record<string, string> = {}
  body.scenarioIds.forEach((id, i) => {
    if (!found.has(id)) fields[`scenarioIds.${i}`] = `No scenario ${id} in this workspace`
  })
  const members = new Set((await Membership.findAll({ where: { workspaceId, userId: body.watcherIds }, attributes: ['userId'] })).map((m) => m.userId))
  body.watcherIds.forEach((id, i) => {
    if (!members.has(id)) fields[`watcherIds.${i}`] = 'A watcher is a member of the workspace'
  })
  if (Object.keys(fields).length) throw errors.validation(fields, 'Some scenarios or watchers are not in this workspace')
}

export async function listSuites(workspaceId: string): Promise<SuiteDto[]> {
  const rows = await Suite.findAll({ where: { workspaceId }, order: [['title', 'ASC']] })
  return Promise.all(rows.map(async (s) => suiteDto(s, await lastRunOf(s.id))))
}

async function findSuite(workspaceId: string, id: string): Promise<Suite> {
  const s = await Suite.findOne({ where: { id, workspaceId } })
  if (!s) throw errors.notFound('suite')
  return s
}

export async function getSuite(workspaceId: string, id: string): Promise<SuiteDto> {
  const s = await findSuite(workspaceId, id)
  return suiteDto(s, await lastRunOf(s.id))
}

export async function createSuite(user: User, workspaceId: string, body: SuiteBody): Promise<SuiteDto> {
  if ((await Suite.count({ where: { workspaceId } })) >= SUITES_PER_WORKSPACE) {
    throw errors.conflict(`This workspace has ${SUITES_PER_WORKSPACE} suites, its limit; delete one first`)
  }
  await checkBody(workspaceId, body)
  const s = await Suite.create({ workspaceId, title: body.title, description: body.description, scenarioIds: body.scenarioIds, presetId: body.presetId, watcherIds: body.watcherIds, createdById: user.id })
  return suiteDto(s, null)
}

export async function updateSuite(workspaceId: string, id: string, body: SuiteBody): Promise<SuiteDto> {
  const s = await findSuite(workspaceId, id)
  await checkBody(workspaceId, body)
  await s.update({ title: body.title, description: body.description, scenarioIds: body.scenarioIds, presetId: body.presetId, watcherIds: body.watcherIds })
  return suiteDto(s, await lastRunOf(s.id))
}

export async function deleteSuite(workspaceId: string, id: string): Promise<void> {
  const s = await findSuite(workspaceId, id)
  await s.destroy()
}

/** The suite's scenarios as a bundle, with the suite's name and preset for `chimeline check`. */
export async function exportSuite(workspaceId: string, id: string): Promise<Bundle> {
  const s = await findSuite(workspaceId, id)
  const live = new Set((await Scenario.findAll({ where: { id: s.scenarioIds, workspaceId }, attributes: ['id'] })).map((x) => x.id))
  const ids = s.scenarioIds.filter((x) => live.has(x))
  if (!ids.length) throw errors.validation({ scenarioIds: 'Every scenario of this suite has been deleted' }, 'Nothing to export')
  const bundle = await exportBundle(workspaceId, ids)
  return { ...bundle, suite: { title: s.title, presetId: s.presetId } }
}

/**
 * Queues a run of the suite (on `body.presetId` when given, else the suite's
 * preset) within the workspace's limits, and keeps the history to
 * SUITE_HISTORY_MAX runs.
 */
export async function startRun(ctx: AppContext, user: User, workspaceId: string, id: string, body: SuiteRunBody): Promise<SuiteRunSummary> {
  const s = await findSuite(workspaceId, id)
  const active = await SuiteRun.count({ where: { workspaceId, status: { [Op.in]: ['queued', 'running'] } } })
  if (active >= SUITE_RUNS_ACTIVE_MAX) {
    throw new ApiError(429, 'rate_limited', `This workspace has ${active} suite runs queued or running, its limit; wait for one to finish`, undefined, 30)
  }
  const today = await SuiteRun.count({ where: { workspaceId, createdAt: { [Op.gte]: new Date(Date.now() - 24 * 3600_000) } } })
  if (today >= SUITE_RUNS_PER_DAY) {
    throw new ApiError(429, 'rate_limited', `This workspace started ${today} suite runs in the last 24 hours, its limit of ${SUITE_RUNS_PER_DAY}`, undefined, 3600)
  }
  const presetId = body.presetId === undefined ? s.presetId : body.presetId
  const run = await SuiteRun.create({ suiteId: s.id, workspaceId, status: 'queued', presetId, modelVersion: null, message: null, startedById: user.id, finishedAt: null })
  const old = await SuiteRun.findAll({ where: { suiteId: s.id }, order: [['createdAt', 'DESC']], offset: SUITE_HISTORY_MAX, attributes: ['id'] })
  if (old.length) await SuiteRun.destroy({ where: { id: old.map((r) => r.id) } })
  await ctx.suites.enqueue(run.id)
  run.startedBy = user
  return runSummary(run)
}

export async function listRuns(workspaceId: string, id: string): Promise<SuiteRunSummary[]> {
  const s = await findSuite(workspaceId, id)
  const rows = await SuiteRun.findAll({ where: { suiteId: s.id }, order: [['createdAt', 'DESC']], limit: SUITE_HISTORY_MAX, attributes: summaryAttributes, ...withStarter })
  return rows.map(runSummary)
}

export async function getRun(workspaceId: string, id: string, runId: string): Promise<SuiteRunDto> {
  const s = await findSuite(workspaceId, id)
  const r = await SuiteRun.findOne({ where: { id: runId, suiteId: s.id }, ...withStarter })
  if (!r) throw errors.notFound('suite run')
  const before = await SuiteRun.findOne({ where: { suiteId: s.id, createdAt: { [Op.lt]: r.createdAt }, status: { [Op.in]: ['passed', 'failed'] } }, order: [['createdAt', 'DESC']] })
  const previous = before ? { id: before.id, modelVersion: before.modelVersion, presetId: before.presetId, changed: changedVerdicts(before.entries, r.entries) } : null
  return { ...runSummary(r), suiteTitle: s.title, entries: r.entries, previous }
}
