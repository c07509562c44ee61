/**
 * A class invited at once (issue 14 "Classroom"): the teacher pastes the
 * students' addresses and each new one gets the ordinary workspace invitation
 * (services/workspaces.ts `invite` does one). What the list holds decides
 * what happens, all before anything is sent:
 * - a bad address fails the whole request (400, one field per line, with the
 *   column), since a typo is better fixed than skipped;
 * - more than BULK_INVITE_MAX_ADDRESSES distinct addresses is a 400;
 * - repeats are invited once, members and pending invitees are skipped, and
 *   all three are reported;
 * - the e-mails come out of the inviter's budget all or none
 *   (mail-limits.ts `reserveMailBatch`): over it, nothing is sent (429 with
 *   Retry-After, or 400 when the list could never fit in one hour or day).
 * A message the mail server refuses withdraws its invitation and is reported,
 * so pasting the same list again retries exactly those.
 */
import { Op } from 'sequelize'
import { BULK_INVITE_MAX_ADDRESSES, type BulkInvitationResult } from '../../shared/schemas/classroom'
import { INVITATION_TTL_SECONDS, type Invitation as InvitationDto, type WorkspaceRole } from '../../shared/schemas/workspace'
import { parseAddressList } from '../../shared/classroom/address-list'
import { hashToken, randomToken } from '../auth/tokens'
import type { AppContext } from '../context'
import { errors } from '../http/errors'
import { Invitation, Membership, User, Workspace } from '../models'
import { invitationMail } from './emails'
import { reserveMailBatch } from './mail-limits'

/** Messages handed to the mail server at once: enough to overlap its round trips, few enough not to flood it. */
const SEND_CONCURRENCY = 4

export async function inviteClass(ctx: AppContext, inviter: User, workspaceId: string, text: string, role: WorkspaceRole): Promise<BulkInvitationResult> {
  const list = parseAddressList(text)
  if (list.errors.length > 0) {
    const fields: Record<string, string> = {}
    for (const e of list.errors) {
      const key = `addresses.line.${e.line}`
      fields[key] = fields[key] ? `${fields[key]}; ${e.message}` : e.message
    }
    const n = list.errors.length
    throw errors.validation(fields, `${n} entr${n === 1 ? 'y is' : 'ies are'} not e-mail addresses (first on line ${list.errors[0]?.line}); nothing was sent`)
  }
  if (list.addresses.length === 0) throw errors.validation({ addresses: 'Paste at least one e-mail address' }, 'The list is empty')
  if (list.addresses.length > BULK_INVITE_MAX_ADDRESSES) {
    throw errors.validation(
      { addresses: `At most ${BULK_INVITE_MAX_ADDRESSES} addresses per list; this one has ${list.addresses.length}: send it in parts` },
      'The list is too long; nothing was sent',
    )
  }
  const workspace = await Workspace.findByPk(workspaceId)
  if (!workspace) throw errors.notFound('workspace')

  const emails = list.addresses.map((a) => a.email)
  const [memberRows, pendingRows] = await Promise.all([
    Membership.findAll({ where: { workspaceId }, include: [{ model: User, as: 'user', required: true, where: { email: { [Op.in]: emails } } }] }),
    Invitation.findAll({ where: { workspaceId, email: { [Op.in]: emails }, acceptedAt: null, expiresAt: { [Op.gt]: new Date() } } }),
  ])
  const memberEmails = new Set(memberRows.map((m) => (m.user as User).email))
  const pendingEmails = new Set(pendingRows.map((i) => i.email))
  const fresh = list.addresses.filter((a) => !memberEmails.has(a.email) && !pendingEmails.has(a.email))

  await reserveMailBatch(ctx, inviter, 'invitation', fresh.length, 'addresses')

  const tokens = new Map<string, string>()
  const created = await ctx.sequelize.transaction(async (transaction) => {
    // Expired invitations of these addresses give way, as they do to a single invite.
    await Invitation.destroy({ where: { workspaceId, email: { [Op.in]: fresh.map((a) => a.email) }, acceptedAt: null }, transaction })
    const expiresAt = new Date(Date.now() + INVITATION_TTL_SECONDS * 1000)
    const rows = fresh.map((a) => {
      const token = randomToken()
      tokens.set(a.email, token)
      return { workspaceId, email: a.email, role, tokenHash: hashToken(token), invitedById: inviter.id, expiresAt }
    })
    return Invitation.bulkCreate(rows, { transaction, returning: true })
  })

  const invited: InvitationDto[] = []
  const failed: BulkInvitationResult['failed'] = []
  const queue = [...created]
  const sendNext = async (): Promise<void> => {
    for (let inv = queue.shift(); inv; inv = queue.shift()) {
      const link = `${ctx.config.publicUrl}/invite?token=${encodeURIComponent(tokens.get(inv.email) ?? '')}`
      try {
        await ctx.mailer.send(invitationMail(inv.email, inviter.name, workspace.name, role, link))
        invited.push({ id: inv.id, email: inv.email, role: inv.role, invitedBy: inviter.name, createdAt: inv.createdAt.toISOString(), expiresAt: inv.expiresAt.toISOString() })
      } catch {
        await Invitation.destroy({ where: { id: inv.id } })
        failed.push({ email: inv.email, line: lineOf(inv.email), message: 'The mail server did not take the message; paste the list again to retry' })
      }
    }
  }
  const lineOf = (email: string) => list.addresses.find((a) => a.email === email)?.line ?? 0
  await Promise.all(Array.from({ length: Math.min(SEND_CONCURRENCY, created.length) }, sendNext))

  const order = (a: { email: string }, b: { email: string }) => lineOf(a.email) - lineOf(b.email)
  return {
    invited: invited.sort(order),
    duplicates: list.duplicates,
    members: list.addresses.filter((a) => memberEmails.has(a.email)),
    pending: list.addresses.filter((a) => pendingEmails.has(a.email)),
    failed: failed.sort(order),
  }
}
