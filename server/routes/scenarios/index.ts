import { exportBodySchema } from '../../../shared/schemas/bundle'
import {
  createScenarioBodySchema,
  duplicateScenarioBodySchema,
  restoreVersionBodySchema,
  saveScenarioBodySchema,
  scenarioListQuerySchema,
  versionDiffQuerySchema,
  type CreateScenarioBody,
  type SaveScenarioBody,
} from '../../../shared/schemas/scenario'
import { copyShareBodySchema } from '../../../shared/schemas/share-link'
import { ALL_WORKSPACE_ROLES, access, currentMembership, currentUser } from '../../auth/access'
import type { AppContext } from '../../context'
import type { SecureRouter } from '../../http/secure-router'
import { exportBundle } from '../../services/scenario-bundles'
import * as scenarios from '../../services/scenarios'
import { copyFromShare } from '../../services/share-links'
import { parseQuery } from './query'

/** Who may do what with scenarios; the role-matrix test writes its own table from the roles' definitions. */
export const scenarioPermissions = {
  read: ALL_WORKSPACE_ROLES,
  write: ['owner', 'editor'],
  delete: ['owner'],
} as const

const base = '/workspaces/:id/scenarios'
const one = `${base}/:scenarioId`

export function scenarioRoutes(ctx: AppContext, r: SecureRouter): void {
  const read = { access: access.workspace(scenarioPermissions.read) }
  const write = access.workspace(scenarioPermissions.write)
  const own = { access: access.workspace(scenarioPermissions.delete) }
  const ws = (req: Parameters<typeof currentMembership>[0]) => currentMembership(req).workspaceId
  const sid = (req: Parameters<typeof currentMembership>[0]) => String(req.params.scenarioId)

  r.get(base, read, async (req, res) => {
    res.json(await scenarios.listScenarios(ws(req), parseQuery(scenarioListQuerySchema, req)))
  })

  r.post(base, { access: write, body: createScenarioBodySchema }, async (req, res) => {
    const s = await scenarios.createScenario(ctx, currentUser(req), ws(req), req.body as CreateScenarioBody)
    res.status(201).json({ scenario: scenarios.scenarioDto(s) })
  })

  // Bulk export as one bundle; a POST because the id list can be long.
  r.post(`${base}/export`, { access: access.workspace(scenarioPermissions.read), body: exportBodySchema }, async (req, res) => {
    const bundle = await exportBundle(ws(req), (req.body as { scenarioIds: string[] }).scenarioIds)
    res.setHeader('Content-Disposition', `attachment; filename="chimeline-scenarios-${bundle.exportedAt.slice(0, 10)}.json"`)
    res.json(bundle)
  })

  r.post(`${base}/copy-from-share`, { access: write, body: copyShareBodySchema }, async (req, res) => {
    const { token, title } = req.body as { token: string; title?: string }
    const s = await copyFromShare(ctx, currentUser(req), ws(req), token, title)
    res.status(201).json({ scenario: scenarios.scenarioDto(s) })
  })

  r.get(one, read, async (req, res) => {
    res.json({ scenario: scenarios.scenarioDto(await scenarios.findScenario(ws(req), sid(req))) })
  })

  r.post(`${one}/versions`, { access: write, body: saveScenarioBodySchema }, async (req, res) => {
    const { scenario, version } = await scenarios.saveScenario(ctx, currentUser(req), ws(req), sid(req), req.body as SaveScenarioBody)
    res.status(201).json({ scenario: scenarios.scenarioDto(scenario), version: scenarios.versionDto(version) })
  })

  r.post(`${one}/duplicate`, { access: write, body: duplicateScenarioBodySchema }, async (req, res) => {
    const s = await scenarios.duplicateScenario(ctx, currentUser(req), ws(req), sid(req), (req.body as { title?: string }).title)
    res.status(201).json({ scenario: scenarios.scenarioDto(s) })
  })

  r.delete(one, own, async (req, res) => {
    res.json({ scenario: scenarios.scenarioDto(await scenarios.softDeleteScenario(ws(req), sid(req))) })
  })

  r.post(`${one}/undo-delete`, own, async (req, res) => {
    res.json({ scenario: scenarios.scenarioDto(await scenarios.undoDeleteScenario(ws(req), sid(req))) })
  })

  r.get(`${one}/versions`, read, async (req, res) => {
    res.json({ versions: await scenarios.listVersions(ws(req), sid(req)) })
  })

  // Declared before `versions/:number` so that "diff" is not read as a number.
  r.get(`${one}/versions/diff`, read, async (req, res) => {
    const q = parseQuery(versionDiffQuerySchema, req)
    const [from, to] = await Promise.all([scenarios.getVersion(ws(req), sid(req), q.from), scenarios.getVersion(ws(req), sid(req), q.to)])
    res.json({ diff: await ctx.work.run('diff', { from, to }, ws(req), currentUser(req).id) })
  })

  r.get(`${one}/versions/:number`, read, async (req, res) => {
    res.json({ version: await scenarios.getVersion(ws(req), sid(req), scenarios.versionNumberParam(req.params.number)) })
  })

  r.post(`${one}/versions/:number/restore`, { access: write, body: restoreVersionBodySchema }, async (req, res) => {
    const n = scenarios.versionNumberParam(req.params.number)
    const { scenario, version } = await scenarios.restoreVersion(ctx, currentUser(req), ws(req), sid(req), n, (req.body as { message: string }).message)
    res.status(201).json({ scenario: scenarios.scenarioDto(scenario), version: scenarios.versionDto(version) })
  })
}
