/**
 * Bundles (shared/schemas/bundle.ts): export scenarios with their whole
 * history, and import them back. Import keeps each version's number, message,
 * author name, time, content and recorded run summary, so exporting the
 * imported scenarios gives the same bundle (apart from `exportedAt`).
 */
import type { Transaction } from 'sequelize'
import { BUNDLE_FORMAT, BUNDLE_FORMAT_VERSION, type Bundle } from '../../shared/schemas/bundle'
import { errors } from '../http/errors'
import { Scenario, ScenarioVersion, type User } from '../models'
import { findScenario, versionDto } from './scenarios'

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

/** Creates every scenario of a validated bundle inside the caller's transaction; the importer becomes each one's author. */
export async function importBundle(user: User, workspaceId: string, bundle: Bundle, options: { uploadId?: string; transaction: Transaction }): Promise<Scenario[]> {
  const { transaction } = options
  const made: Scenario[] = []
  for (const item of bundle.scenarios) {
    const head = item.versions[item.versions.length - 1] as Bundle['scenarios'][number]['versions'][number]
    const scenario = await Scenario.create(
      {
        workspaceId,
        ...head.content,
        run: head.run,
        authorId: user.id,
        version: head.number,
        uploadId: options.uploadId ?? null,
        createdAt: new Date(item.versions[0]?.createdAt ?? head.createdAt),
      },
      { transaction },
    )
    await ScenarioVersion.bulkCreate(
      item.versions.map((v) => ({
        scenarioId: scenario.id,
        number: v.number,
        authorId: null,
        authorName: v.author,
        message: v.message,
        content: v.content,
        run: v.run,
        createdAt: new Date(v.createdAt),
      })),
      { transaction },
    )
    scenario.author = user
    made.push(scenario)
  }
  return made
}
