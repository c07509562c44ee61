import { Op, type Transaction } from 'sequelize'
import {
  INVITATION_TTL_SECONDS,
  type Invitation as InvitationDto,
  type InvitationBody,
  type Member,
  type MembersResponse,
  type WorkspacePatch,
  type WorkspaceRole,
  type WorkspaceSummary,
} from '../../shared/schemas/workspace'
import { hashToken, randomToken } from '../auth/tokens'
import type { AppContext } from '../context'
import { errors } from '../http/errors'
import { Invitation, Membership, User, Workspace } from '../models'
import { invitationMail } from './emails'
import { reserveMail } from './mail-limits'

export async function listWorkspaces(userId: string): Promise<WorkspaceSummary[]> {
  const memberships = await Membership.findAll({
    where: { userId },
    include: [{ model: Workspace, as: 'workspace', required: true }],
  })
  return memberships
    .map((m) => summaryOf(m.workspace as Workspace, m.role))
    .sort((a, b) => a.name.localeCompare(b.name))
}

function summaryOf(workspace: Workspace, role: WorkspaceRole): WorkspaceSummary {
  return { id: workspace.id, name: workspace.name, role, defaultPreset: workspace.defaultPreset }
}

/** A workspace owned by `user`; inside the caller's transaction when given (sign-up's personal workspace). */
export async function createWorkspace(ctx: AppContext, user: User, name: string, outer?: Transaction): Promise<WorkspaceSummary> {
  const work = async (transaction: Transaction) => {
    const workspace = await Workspace.create({ name }, { transaction })
    await Membership.create({ workspaceId: workspace.id, userId: user.id, role: 'owner' }, { transaction })
    return summaryOf(workspace, 'owner')
  }
  return outer ? work(outer) : ctx.sequelize.transaction(work)
}

export async function getWorkspace(membership: Membership): Promise<WorkspaceSummary> {
  const workspace = await Workspace.findByPk(membership.workspaceId)
  if (!workspace) throw errors.notFound('workspace')
  return summaryOf(workspace, membership.role)
}

export async function updateWorkspace(membership: Membership, patch: WorkspacePatch): Promise<WorkspaceSummary> {
  await Workspace.update(patch, { where: { id: membership.workspaceId } })
  return getWorkspace(membership)
}

export async function deleteWorkspace(membership: Membership): Promise<void> {
  await Workspace.destroy({ where: { id: membership.workspaceId } })
}

function memberDto(m: Membership): Member {
  const user = m.user as User
  return { userId: m.userId, email: user.email, name: user.name, role: m.role }
}

function invitationDto(i: Invitation): InvitationDto {
  return {
    id: i.id,
    email: i.email,
    role: i.role,
    invitedBy: i.invitedBy?.name ?? '',
    createdAt: i.createdAt.toISOString(),
    expiresAt: i.expiresAt.toISOString(),
  }
}

export async function listMembers(workspaceId: string): Promise<MembersResponse> {
  const [members, invitations] = await Promise.all([
    Membership.findAll({ where: { workspaceId }, include: [{ model: User, as: 'user', required: true }] }),
    Invitation.findAll({
      where: { workspaceId, acceptedAt: null, expiresAt: { [Op.gt]: new Date() } },
      include: [{ model: User, as: 'invitedBy' }],
      order: [['createdAt', 'DESC']],
    }),
  ])
  const rank: Record<WorkspaceRole, number> = { owner: 0, editor: 1, viewer: 2 }
  return {
    members: members.map(memberDto).sort((a, b) => rank[a.role] - rank[b.role] || a.name.localeCompare(b.name)),
    invitations: invitations.map(invitationDto),
  }
}

/** Invites by e-mail; a newer invitation of the same address replaces a pending one. */
export async function invite(ctx: AppContext, inviter: User, workspaceId: string, body: InvitationBody): Promise<InvitationDto> {
  const workspace = await Workspace.findByPk(workspaceId)
  if (!workspace) throw errors.notFound('workspace')
  const existing = await Membership.findOne({
    where: { workspaceId },
    include: [{ model: User, as: 'user', required: true, where: { email: body.email } }],
  })
  if (existing) throw errors.conflict('This person is a member already', { email: 'Already a member of this workspace' })
  await reserveMail(ctx, inviter, 'invitation', 1)
  const token = randomToken()
  const invitation = await ctx.sequelize.transaction(async (transaction) => {
    await Invitation.destroy({ where: { workspaceId, email: body.email, acceptedAt: null }, transaction })
    return Invitation.create(
      {
        workspaceId,
        email: body.email,
        role: body.role,
        tokenHash: hashToken(token),
        invitedById: inviter.id,
        expiresAt: new Date(Date.now() + INVITATION_TTL_SECONDS * 1000),
      },
      { transaction },
    )
  })
  const link = `${ctx.config.publicUrl}/invite?token=${encodeURIComponent(token)}`
  await ctx.mailer.send(invitationMail(body.email, inviter.name, workspace.name, body.role, link))
  invitation.invitedBy = inviter
  return invitationDto(invitation)
}

/**
 * The e-mailed token, used once, by the account of the address it was sent
 * to: a forwarded or leaked link lets nobody else in (and stays usable by the
 * invitee). A member already keeps their role.
 */
export async function acceptInvitation(ctx: AppContext, user: User, token: string): Promise<WorkspaceSummary> {
  return ctx.sequelize.transaction(async (transaction) => {
    const invitation = await Invitation.findOne({
      where: { tokenHash: hashToken(token), acceptedAt: null, expiresAt: { [Op.gt]: new Date() } },
      transaction,
      lock: transaction.LOCK.UPDATE,
    })
    if (!invitation) throw errors.invalidToken('invitation')
    // Both addresses are stored lower-cased by the e-mail schema.
    if (invitation.email !== user.email) {
      throw errors.forbidden('This invitation was sent to another e-mail address: sign in with the address it was sent to, or ask for an invitation to yours')
    }
    const workspace = await Workspace.findByPk(invitation.workspaceId, { transaction })
    if (!workspace) throw errors.invalidToken('invitation')
    await invitation.update({ acceptedAt: new Date(), acceptedById: user.id }, { transaction })
    const [membership] = await Membership.findOrCreate({
      where: { workspaceId: workspace.id, userId: user.id },
      defaults: { workspaceId: workspace.id, userId: user.id, role: invitation.role },
      transaction,
    })
    return summaryOf(workspace, membership.role)
  })
}

async function assertAnotherOwner(workspaceId: string, userId: string): Promise<void> {
  const owners = await Membership.count({ where: { workspaceId, role: 'owner', userId: { [Op.ne]: userId } } })
  if (owners === 0) throw errors.conflict('A workspace needs an owner: make someone else owner first')
}

export async function changeMemberRole(workspaceId: string, userId: string, role: WorkspaceRole): Promise<Member> {
  const membership = await Membership.findOne({ where: { workspaceId, userId }, include: [{ model: User, as: 'user', required: true }] })
  if (!membership) throw errors.notFound('member')
  if (membership.role === 'owner' && role !== 'owner') await assertAnotherOwner(workspaceId, userId)
  await membership.update({ role })
  return memberDto(membership)
}

export async function removeMember(workspaceId: string, userId: string): Promise<void> {
  const membership = await Membership.findOne({ where: { workspaceId, userId } })
  if (!membership) throw errors.notFound('member')
  if (membership.role === 'owner') await assertAnotherOwner(workspaceId, userId)
  await membership.destroy()
}
