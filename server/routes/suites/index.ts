import { suiteBodySchema, suiteRunBodySchema, type SuiteBody, type SuiteRunBody } from '../../../shared/schemas/suite'
import { ALL_WORKSPACE_ROLES, access, currentMembership, currentUser } from '../../auth/access'
import type { AppContext } from '../../context'
import type { SecureRouter } from '../../http/secure-router'
import * as suites from '../../services/suites'

/** Who may do what with suites: members read and export, owners and editors change and run them. */
export const suitePermissions = {
  read: ALL_WORKSPACE_ROLES,
  write: ['owner', 'editor'],
} as const

const base = '/workspaces/:id/suites'

export function suiteRoutes(ctx: AppContext, r: SecureRouter): void {
  const read = { access: access.workspace(suitePermissions.read) }
  const write = access.workspace(suitePermissions.write)
  const ws = (req: Parameters<typeof currentMembership>[0]) => currentMembership(req).workspaceId
  const sid = (req: { params: Record<string, unknown> }) => String(req.params.suiteId)

  r.get(base, read, async (req, res) => {
    res.json({ suites: await suites.listSuites(ws(req)) })
  })
  r.post(base, { access: write, body: suiteBodySchema }, async (req, res) => {
    res.status(201).json({ suite: await suites.createSuite(currentUser(req), ws(req), req.body as SuiteBody) })
  })
  r.get(`${base}/:suiteId`, read, async (req, res) => {
    res.json({ suite: await suites.getSuite(ws(req), sid(req)) })
  })
  r.patch(`${base}/:suiteId`, { access: write, body: suiteBodySchema }, async (req, res) => {
    res.json({ suite: await suites.updateSuite(ws(req), sid(req), req.body as SuiteBody) })
  })
  r.delete(`${base}/:suiteId`, { access: write }, async (req, res) => {
    await suites.deleteSuite(ws(req), sid(req))
    res.status(204).end()
  })
  r.get(`${base}/:suiteId/export`, read, async (req, res) => {
    const bundle = await suites.exportSuite(ws(req), sid(req))
    const name = (bundle.suite?.title ?? 'suite').replace(/[^\p{L}\p{N}._-]+/gu, '-').slice(0, 80) || 'suite'
    res.setHeader('Content-Disposition', `attachment; filename="${encodeURIComponent(name)}.chimeline.json"`)
    res.json(bundle)
  })
  r.post(`${base}/:suiteId/runs`, { access: write, body: suiteRunBodySchema }, async (req, res) => {
    res.status(201).json({ run: await suites.startRun(ctx, currentUser(req), ws(req), sid(req), req.body as SuiteRunBody) })
  })
  r.get(`${base}/:suiteId/runs`, read, async (req, res) => {
    res.json({ runs: await suites.listRuns(ws(req), sid(req)) })
  })
  r.get(`${base}/:suiteId/runs/:runId`, read, async (req, res) => {
    res.json({ run: await suites.getRun(ws(req), sid(req), String(req.params.runId)) })
  })
}
