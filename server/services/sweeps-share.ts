/**
 * Sweeps behind share links: which sweep a link may point at (a finished
 * sweep of the link's scenario, small enough to send whole) and what the
 * reader gets (the definition and the points, without ids).
 */
import { QueryTypes, type Sequelize } from 'sequelize'
import { SHARED_SWEEP_MAX_POINTS, sweepPointResultSchema, type SharedSweep } from '../../shared/schemas/sweep'
import { errors } from '../http/errors'
import { Scenario, ScenarioVersion, Sweep } from '../models'
import { findVersion } from './scenarios'

async function pointCount(sequelize: Sequelize, sweepId: string): Promise<number> {
  const [row] = await sequelize.query<{ n: string }>('SELECT count(*) AS n FROM sweep_points WHERE sweep_id = $1', { bind: [sweepId], type: QueryTypes.SELECT })
  return Number(row?.n ?? 0)
}

/** The sweep a new link of `scenarioId` may show: 400 naming `sweepId` when it is another scenario's, too big or unknown; 409 while it runs. */
export async function shareableSweep(scenarioId: string, sweepId: string): Promise<Sweep> {
  const sweep = await Sweep.findByPk(sweepId)
  if (!sweep || sweep.scenarioId !== scenarioId) throw errors.validation({ sweepId: 'No sweep of this scenario has this id' })
  if (sweep.status === 'queued' || sweep.status === 'running') throw errors.conflict('This sweep is still running: share it once it has finished (or cancel it)')
  const n = await pointCount(sweep.sequelize, sweep.id)
  if (n > SHARED_SWEEP_MAX_POINTS) throw errors.validation({ sweepId: `A shared sweep has at most ${SHARED_SWEEP_MAX_POINTS} points; this one has ${n}` })
  return sweep
}

/** The version a sweep link shows by default: the sweep's own, else the scenario's newest. */
export async function sweepVersion(scenario: Scenario, sweep: Sweep): Promise<ScenarioVersion> {
  const own = sweep.versionId ? await ScenarioVersion.findOne({ where: { id: sweep.versionId, scenarioId: scenario.id } }) : null
  return own ?? findVersion(scenario.id, scenario.version)
}

/** What a link's reader sees of its sweep, or null when the sweep was deleted. */
export async function sharedSweep(sequelize: Sequelize, sweepId: string): Promise<SharedSweep | null> {
  const sweep = await Sweep.findByPk(sweepId)
  if (!sweep) return null
  const rows = await sequelize.query<{ result: unknown }>('SELECT result FROM sweep_points WHERE sweep_id = $1 ORDER BY point_index', { bind: [sweepId], type: QueryTypes.SELECT })
  return {
    title: sweep.title,
    runner: sweep.runner,
    status: sweep.status,
    message: sweep.message,
    planned: sweep.planned,
    definition: sweep.definition,
    points: rows.map((r) => sweepPointResultSchema.parse(r.result)),
  }
}
