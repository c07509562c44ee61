import type { MeResponse } from '../../../shared/schemas/workspace'
import { access, currentUser } from '../../auth/access'
import type { SecureRouter } from '../../http/secure-router'
import { listWorkspaces } from '../../services/workspaces'

export function meRoutes(r: SecureRouter): void {
  r.get('/me', { access: access.signedIn }, async (req, res) => {
    const user = currentUser(req)
    const body: MeResponse = { user: user.toDto(), workspaces: await listWorkspaces(user.id) }
    res.json(body)
  })
}
