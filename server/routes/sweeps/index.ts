import { createSweepBodySchema, sweepListQuerySchema, type CreateSweepBody } from '../../../shared/schemas/sweep'
import { ALL_WORKSPACE_ROLES, access, currentMembership, currentUser } from '../../auth/access'
import type { AppContext } from '../../context'
import type { SecureRouter } from '../../http/secure-router'
import * as sweeps from '../../services/sweeps'
import { parseQuery } from '../scenarios/query'

/** Who may do what with sweeps: members read, owners and editors run, save and cancel. */
export const sweepPermissions = {
  read: ALL_WORKSPACE_ROLES,
  write: ['owner', 'editor'],
} as const

const base = '/workspaces/:id/sweeps'

export function sweepRoutes(ctx: AppContext, r: SecureRouter): void {
  const read = { access: access.workspace(sweepPermissions.read) }
  const write = access.workspace(sweepPermissions.write)
  const ws = (req: Parameters<typeof currentMembership>[0]) => currentMembership(req).workspaceId

  r.get(base, read, async (req, res) => {
    res.json({ sweeps: await sweeps.listSweeps(ctx, ws(req), parseQuery(sweepListQuerySchema, req).scenarioId) })
  })
  r.post(base, { access: write, body: createSweepBodySchema }, async (req, res) => {
    res.status(201).json({ sweep: await sweeps.createSweep(ctx, currentUser(req), ws(req), req.body as CreateSweepBody) })
  })
  r.get(`${base}/:sweepId`, read, async (req, res) => {
    res.json({ sweep: await sweeps.getSweep(ctx, ws(req), String(req.params.sweepId)) })
  })
  r.post(`${base}/:sweepId/cancel`, { access: write }, async (req, res) => {
    res.json({ sweep: await sweeps.cancelSweep(ctx, ws(req), String(req.params.sweepId)) })
  })
}
