/**
 * Bundles (shared/schemas/bundle.ts): export scenarios with their whole
 * history, and import them back. A bundle is not trusted: import keeps each
 * version's number, message and content, but its run summary is computed
 * again on the run pool, and its author and date are the importer and the
 * import time; the author name and date the file claimed are kept only as
 * `originally` metadata.
 */
import type { Transaction } from 'sequelize'
import { BUNDLE_FORMAT, BUNDLE_FORMAT_VERSION, type Bundle } from '../../shared/schemas/bundle'
import type { RunSummary } from '../../shared/schemas/scenario'
import type { AppContext } from '../context'
import { DetailedApiError } from '../http/detailed-error'
import { ApiError, errors } from '../http/errors'
import { Scenario, ScenarioVersion, type User } from '../models'
import { findScenario, versionDto } from './scenarios'

/** Distinct programs (program, machine, initial data) one import may run; a bigger bundle is split by its sender. */
export const BUNDLE_IMPORT_MAX_RUNS = 200

export async function exportBundle(workspaceId: string, scenarioIds: string[]): Promise<Bundle> {
  const scenarios: Bundle['scenarios'] = []
  for (const id of [...new Set(scenarioIds)]) {
    const scenario = await findScenario(workspaceId, id).catch(() => {
      throw errors.notFound(`scenario ${id} in this workspace`)
    })
    const rows = await ScenarioVersion.findAll({ where: { scenarioId: scenario.id }, order: [['number', 'ASC']] })
    scenarios.push({
      versions: rows.map((row) => {
        const v = versionDto(row)
        return { number: v.number, message: v.message, author: v.author.name, createdAt: v.createdAt, content: v.content, run: v.run }
      }),
    })
  }
  return { format: BUNDLE_FORMAT, formatVersion: BUNDLE_FORMAT_VERSION, exportedAt: new Date().toISOString(), scenarios }
}

/**
 * The run summary of every version of a bundle, computed on the run pool one
 * at a time (so one import takes one place of its workspace's share), each
 * distinct content once. Initial data that does not fit is a 400 naming the
 * version in the file.
 */
export async function summarizeBundle(ctx: AppContext, user: User, workspaceId: string, bundle: Bundle, fileName: string): Promise<RunSummary[][]> {
  const keyOf = (c: Bundle['scenarios'][number]['versions'][number]['content']) => JSON.stringify([c.program, c.machine, c.initialData])
  const distinct = new Set(bundle.scenarios.flatMap((item) => item.versions.map((v) => keyOf(v.content))))
  if (distinct.size > BUNDLE_IMPORT_MAX_RUNS) {
    throw new DetailedApiError(400, 'invalid_file', `${fileName} holds ${distinct.size} distinct programs; one import runs at most ${BUNDLE_IMPORT_MAX_RUNS} (split the bundle)`, { diagnostics: [] }, { scenarios: `At most ${BUNDLE_IMPORT_MAX_RUNS} distinct programs per import` })
  }
  const byContent = new Map<string, RunSummary>()
  const out: RunSummary[][] = []
  for (const [i, item] of bundle.scenarios.entries()) {
    const runs: RunSummary[] = []
    for (const [j, v] of item.versions.entries()) {
      const key = keyOf(v.content)
      let run = byContent.get(key)
      if (!run) {
        try {
          run = await ctx.runs.summarize(v.content, workspaceId, user.id)
        } catch (err) {
          if (err instanceof ApiError && err.code === 'validation_failed' && err.fields) {
            const fields = Object.fromEntries(Object.entries(err.fields).map(([k, m]) => [`scenarios.${i}.versions.${j}.${k}`, m]))
            throw new DetailedApiError(400, 'invalid_file', `${fileName}: scenario ${i + 1}, version ${v.number}: ${err.message}`, { diagnostics: [] }, fields)
          }
          throw err
        }
        byContent.set(key, run)
      }
      runs.push(run)
    }
    out.push(runs)
  }
  return out
}

/**
 * Creates every scenario of a validated bundle inside the caller's
 * transaction, with the run summaries computed for it (summarizeBundle). The
 * importer is the author of every version, written now.
 */
export async function importBundle(user: User, workspaceId: string, bundle: Bundle, runs: RunSummary[][], options: { uploadId?: string; transaction: Transaction }): Promise<Scenario[]> {
  const { transaction } = options
  const made: Scenario[] = []
  for (const [i, item] of bundle.scenarios.entries()) {
    const head = item.versions[item.versions.length - 1] as Bundle['scenarios'][number]['versions'][number]
    const headRun = runs[i]?.[item.versions.length - 1] as RunSummary
    const scenario = await Scenario.create(
      { workspaceId, ...head.content, run: headRun, authorId: user.id, version: head.number, uploadId: options.uploadId ?? null },
      { transaction },
    )
    await ScenarioVersion.bulkCreate(
      item.versions.map((v, j) => ({
        scenarioId: scenario.id,
        number: v.number,
        authorId: user.id,
        authorName: user.name,
        message: v.message,
        content: v.content,
        run: runs[i]?.[j] as RunSummary,
        originalAuthorName: v.author,
        originalCreatedAt: new Date(v.createdAt),
      })),
      { transaction },
    )
    scenario.author = user
    made.push(scenario)
  }
  return made
}
