import { acceptInvitationBodySchema, type AcceptInvitationBody } from '../../../shared/schemas/workspace'
import { access, currentUser } from '../../auth/access'
import type { AppContext } from '../../context'
import type { SecureRouter } from '../../http/secure-router'
import { acceptInvitation } from '../../services/workspaces'

export function invitationRoutes(ctx: AppContext, r: SecureRouter): void {
  r.post('/invitations/accept', { access: access.signedIn, body: acceptInvitationBodySchema }, async (req, res) => {
    res.json({ workspace: await acceptInvitation(ctx, currentUser(req), (req.body as AcceptInvitationBody).token) })
  })
}
