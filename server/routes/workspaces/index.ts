import {
  invitationBodySchema,
  memberRoleBodySchema,
  workspaceBodySchema,
  workspacePatchSchema,
  type InvitationBody,
  type MemberRoleBody,
  type WorkspaceBody,
  type WorkspacePatch,
  type WorkspaceRole,
} from '../../../shared/schemas/workspace'
import { bulkInvitationBodySchema } from '../../../shared/schemas/classroom'
import { ALL_WORKSPACE_ROLES, access, currentMembership, currentUser } from '../../auth/access'
import type { AppContext } from '../../context'
import type { SecureRouter } from '../../http/secure-router'
import { inviteClass } from '../../services/classroom'
import * as workspaces from '../../services/workspaces'

/** Who may do what in a workspace; the role-matrix test reads the same table. */
export const workspacePermissions = {
  read: ALL_WORKSPACE_ROLES,
  rename: ['owner'],
  delete: ['owner'],
  listMembers: ALL_WORKSPACE_ROLES,
  invite: ['owner'],
  inviteClass: ['owner'],
  changeRole: ['owner'],
  removeMember: ['owner'],
} as const

export function workspaceRoutes(ctx: AppContext, r: SecureRouter): void {
  r.get('/workspaces', { access: access.signedIn }, async (req, res) => {
    res.json({ workspaces: await workspaces.listWorkspaces(currentUser(req).id) })
  })

  r.post('/workspaces', { access: access.signedIn, body: workspaceBodySchema }, async (req, res) => {
    const workspace = await workspaces.createWorkspace(ctx, currentUser(req), (req.body as WorkspaceBody).name)
    res.status(201).json({ workspace })
  })

  r.get('/workspaces/:id', { access: access.workspace(workspacePermissions.read) }, async (req, res) => {
    res.json({ workspace: await workspaces.getWorkspace(currentMembership(req)) })
  })

  r.patch('/workspaces/:id', { access: access.workspace(workspacePermissions.rename), body: workspacePatchSchema }, async (req, res) => {
    res.json({ workspace: await workspaces.updateWorkspace(currentMembership(req), req.body as WorkspacePatch) })
  })

  r.delete('/workspaces/:id', { access: access.workspace(workspacePermissions.delete) }, async (req, res) => {
    await workspaces.deleteWorkspace(currentMembership(req))
    res.status(204).end()
  })

  r.get('/workspaces/:id/members', { access: access.workspace(workspacePermissions.listMembers) }, async (req, res) => {
    res.json(await workspaces.listMembers(currentMembership(req).workspaceId))
  })

  r.post(
    '/workspaces/:id/invitations',
    { access: access.workspace(workspacePermissions.invite), body: invitationBodySchema },
    async (req, res) => {
      const invitation = await workspaces.invite(ctx, currentUser(req), currentMembership(req).workspaceId, req.body as InvitationBody)
      res.status(201).json({ invitation })
    },
  )

  // A class at once: a pasted list of addresses (services/classroom.ts says what happens to each).
  r.post(
    '/workspaces/:id/invitations/bulk',
    { access: access.workspace(workspacePermissions.inviteClass), body: bulkInvitationBodySchema },
    async (req, res) => {
      const body = req.body as { addresses: string; role: WorkspaceRole }
      res.status(201).json(await inviteClass(ctx, currentUser(req), currentMembership(req).workspaceId, body.addresses, body.role))
    },
  )

  r.patch(
    '/workspaces/:id/members/:userId',
    { access: access.workspace(workspacePermissions.changeRole), body: memberRoleBodySchema },
    async (req, res) => {
      const member = await workspaces.changeMemberRole(currentMembership(req).workspaceId, String(req.params.userId), (req.body as MemberRoleBody).role)
      res.json({ member })
    },
  )

  // Owners remove anyone; every member may remove themselves (leave).
  r.delete(
    '/workspaces/:id/members/:userId',
    { access: access.workspace(workspacePermissions.removeMember, { orSelf: 'userId' }) },
    async (req, res) => {
      await workspaces.removeMember(currentMembership(req).workspaceId, String(req.params.userId))
      res.status(204).end()
    },
  )
}
