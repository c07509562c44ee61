import { createShareLinkBodySchema, emailShareLinkBodySchema, type CreateShareLinkBody, type EmailShareLinkBody } from '../../../shared/schemas/share-link'
import { access, currentMembership, currentUser } from '../../auth/access'
import type { AppContext } from '../../context'
import type { SecureRouter } from '../../http/secure-router'
import * as links from '../../services/share-links'

/**
 * Editors share what they found (create, list, e-mail); revoking is for the
 * owner, or for the editor who made the link (checked in the service).
 */
export const shareLinkPermissions = {
  create: ['owner', 'editor'],
  list: ['owner', 'editor'],
  email: ['owner', 'editor'],
  revoke: ['owner', 'editor'],
} as const

export function shareLinkRoutes(ctx: AppContext, r: SecureRouter): void {
  const scenarioLinks = '/workspaces/:id/scenarios/:scenarioId/share-links'
  r.post(scenarioLinks, { access: access.workspace(shareLinkPermissions.create), body: createShareLinkBodySchema }, async (req, res) => {
    const m = currentMembership(req)
    res.status(201).json(await links.createShareLink(ctx, currentUser(req), m.workspaceId, String(req.params.scenarioId), req.body as CreateShareLinkBody))
  })

  r.get(scenarioLinks, { access: access.workspace(shareLinkPermissions.list) }, async (req, res) => {
    res.json({ links: await links.listShareLinks(currentMembership(req).workspaceId, String(req.params.scenarioId)) })
  })

  r.post('/workspaces/:id/share-links/:linkId/revoke', { access: access.workspace(shareLinkPermissions.revoke) }, async (req, res) => {
    res.json({ link: await links.revokeShareLink(ctx, currentUser(req), currentMembership(req), String(req.params.linkId)) })
  })

  r.post('/workspaces/:id/share-links/:linkId/email', { access: access.workspace(shareLinkPermissions.email), body: emailShareLinkBodySchema }, async (req, res) => {
    const sent = await links.emailShareLink(ctx, currentUser(req), currentMembership(req).workspaceId, String(req.params.linkId), req.body as EmailShareLinkBody)
    res.status(202).json({ sent })
  })
}
