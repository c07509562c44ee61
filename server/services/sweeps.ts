/**
 * Saved sweeps of a workspace: a browser sweep is saved with its points; a
 * server sweep is queued as chunks for the worker processes (sweeps-queue.ts)
 * within the workspace's limits (sweeps at once, points a day). Points live
 * in sweep_points, one row per (sweep, index).
 */
import { Op, QueryTypes } from 'sequelize'
import {
  SWEEP_SERVER_CONCURRENT,
  SWEEP_SERVER_POINTS_PER_DAY,
  sweepPointResultSchema,
  type CreateSweepBody,
  type SweepPointResult,
  type SweepSummary,
} from '../../shared/schemas/sweep'
import { pointValues, resolveSweep } from '../../shared/sweep/resolve'
import { sweepChunks } from '../../shared/sweep/order'
import { plannedPoints } from '../../shared/sweep/runSweep'
import type { AppContext } from '../context'
import { ApiError, errors } from '../http/errors'
import { Scenario, ScenarioVersion, Sweep, type User } from '../models'
import { serverChunkSize } from './sweeps-queue'

/** Scenario version numbers by version id, for the summaries (the history lists sweeps by version). */
async function versionNumbers(ids: (string | null)[]): Promise<Map<string, number>> {
  const wanted = [...new Set(ids.filter((id): id is string => id !== null))]
  if (wanted.length === 0) return new Map()
  const rows = await ScenarioVersion.findAll({ where: { id: wanted }, attributes: ['id', 'number'] })
  return new Map(rows.map((v) => [v.id, v.number]))
}

function summary(s: Sweep, done: number, versions: Map<string, number>): SweepSummary {
  return {
    id: s.id,
    title: s.title,
    runner: s.runner,
    status: s.status,
    planned: s.planned,
    done,
    message: s.message,
    scenarioId: s.scenarioId,
    versionId: s.versionId,
    version: s.versionId ? (versions.get(s.versionId) ?? null) : null,
    parameters: s.definition.parameters,
    createdAt: s.createdAt.toISOString(),
  }
}

async function doneCounts(ctx: AppContext, ids: string[]): Promise<Map<string, number>> {
  if (ids.length === 0) return new Map()
  const rows = await ctx.sequelize.query<{ sweep_id: string; n: string }>('SELECT sweep_id, count(*) AS n FROM sweep_points WHERE sweep_id IN (:ids) GROUP BY sweep_id', {
    replacements: { ids },
    type: QueryTypes.SELECT,
  })
  return new Map(rows.map((r) => [r.sweep_id, Number(r.n)]))
}

/** Inserts points once per (sweep, index): a repeated point (a retried chunk) is ignored. */
export async function insertPoints(ctx: Pick<AppContext, 'sequelize'>, sweepId: string, points: SweepPointResult[]): Promise<void> {
  if (points.length === 0) return
  const values = points.map((_, i) => `(:sweep, :i${i}, :r${i})`).join(', ')
  const replacements: Record<string, unknown> = { sweep: sweepId }
  points.forEach((p, i) => {
    replacements[`i${i}`] = p.index
    replacements[`r${i}`] = JSON.stringify(p)
  })
  await ctx.sequelize.query(`INSERT INTO sweep_points (sweep_id, point_index, result) VALUES ${values} ON CONFLICT DO NOTHING`, { replacements })
}

export async function createSweep(ctx: AppContext, user: User, workspaceId: string, body: CreateSweepBody): Promise<SweepSummary> {
  const resolved = resolveSweep(body.definition)
  if (!resolved.ok) throw errors.validation(Object.fromEntries(resolved.issues.map((i) => [`definition.${i.field}`, i.message])), 'The sweep definition is not valid')
  const planned = plannedPoints(resolved.sweep)
  // A sweep belongs to a scenario version: the one named, else the scenario's newest.
  let versionId = body.versionId
  if (body.scenarioId) {
    const scenario = await Scenario.findOne({ where: { id: body.scenarioId, workspaceId } })
    if (!scenario) throw errors.notFound('scenario')
    const version = await ScenarioVersion.findOne({ where: versionId ? { id: versionId, scenarioId: scenario.id } : { scenarioId: scenario.id, number: scenario.version } })
    if (!version) throw errors.notFound('scenario version')
    versionId = version.id
  } else if (versionId) throw errors.validation({ versionId: 'A version needs its scenarioId' })

  if (body.runner === 'browser') {
    body.points.forEach((p, i) => {
      const expected = pointValues(resolved.sweep, p.index)
      if (p.index >= planned || JSON.stringify(expected) !== JSON.stringify(p.values)) {
        throw errors.validation({ [`points.${i}`]: `point ${p.index} does not belong to this sweep (its values are ${JSON.stringify(expected)})` })
      }
    })
    const s = await Sweep.create({ workspaceId, scenarioId: body.scenarioId, versionId, title: body.title, definition: body.definition, runner: 'browser', status: body.status, planned, message: body.message, createdById: user.id })
    await insertPoints(ctx, s.id, body.points)
    return summary(s, new Set(body.points.map((p) => p.index)).size, await versionNumbers([versionId]))
  }

  const active = await Sweep.count({ where: { workspaceId, runner: 'server', status: { [Op.in]: ['queued', 'running'] } } })
  if (active >= SWEEP_SERVER_CONCURRENT) throw new ApiError(429, 'rate_limited', `This workspace has ${active} server sweeps queued or running, its limit; wait for one to finish or cancel one`, undefined, 30)
  const since = new Date(Date.now() - 24 * 3600_000)
  const today = (await Sweep.sum('planned', { where: { workspaceId, runner: 'server', createdAt: { [Op.gte]: since } } })) ?? 0
  if (today + planned > SWEEP_SERVER_POINTS_PER_DAY) {
    throw new ApiError(429, 'rate_limited', `This sweep's ${planned} points would take the workspace past its ${SWEEP_SERVER_POINTS_PER_DAY} server points a day (${today} used in the last 24 hours)`, undefined, 3600)
  }
  const s = await Sweep.create({ workspaceId, scenarioId: body.scenarioId, versionId, title: body.title, definition: body.definition, runner: 'server', status: 'queued', planned, message: null, createdById: user.id })
  await ctx.sweeps.enqueue(s.id, sweepChunks(resolved.sweep, planned, serverChunkSize(planned)))
  return summary(s, 0, await versionNumbers([versionId]))
}

/** A workspace's newest 200 sweeps, or one scenario's (all versions). */
export async function listSweeps(ctx: AppContext, workspaceId: string, scenarioId?: string): Promise<SweepSummary[]> {
  const rows = await Sweep.findAll({ where: scenarioId ? { workspaceId, scenarioId } : { workspaceId }, order: [['createdAt', 'DESC']], limit: 200 })
  const [done, versions] = await Promise.all([doneCounts(ctx, rows.map((r) => r.id)), versionNumbers(rows.map((r) => r.versionId))])
  return rows.map((r) => summary(r, done.get(r.id) ?? 0, versions))
}

async function findSweep(workspaceId: string, id: string): Promise<Sweep> {
  const s = await Sweep.findOne({ where: { id, workspaceId } })
  if (!s) throw errors.notFound('sweep')
  return s
}

export async function getSweep(ctx: AppContext, workspaceId: string, id: string) {
  const s = await findSweep(workspaceId, id)
  const rows = await ctx.sequelize.query<{ result: unknown }>('SELECT result FROM sweep_points WHERE sweep_id = :id ORDER BY point_index', { replacements: { id: s.id }, type: QueryTypes.SELECT })
  const points = rows.map((r) => sweepPointResultSchema.parse(r.result))
  return { ...summary(s, points.length, await versionNumbers([s.versionId])), definition: s.definition, points }
}

export async function cancelSweep(ctx: AppContext, workspaceId: string, id: string): Promise<SweepSummary> {
  const s = await findSweep(workspaceId, id)
  if (s.status === 'queued' || s.status === 'running') await s.update({ status: 'cancelled', message: 'cancelled; the points done are kept' })
  return summary(s, (await doneCounts(ctx, [s.id])).get(s.id) ?? 0, await versionNumbers([s.versionId]))
}
