/**
 * Share links. The token is 256 random bits (base64url), returned once; the
 * table keeps its SHA-256. Opening a link (share-links-open.ts) hashes the
 * presented token and looks the hash up: a near miss of a real token hashes to
 * an unrelated value, so guessing learns nothing, and an unknown token is a
 * plain 404.
 */
import type { Request } from 'express'
import type { ScenarioView } from '../../shared/schemas/scenario'
import type { CreateShareLinkBody, EmailShareLinkBody, ShareLink as ShareLinkDto } from '../../shared/schemas/share-link'
import { hashToken, randomToken } from '../auth/tokens'
import type { AppContext } from '../context'
import { errors } from '../http/errors'
import { Membership, Scenario, ScenarioVersion, ShareLink, User } from '../models'
import { ShareOpens } from './share-links-open'
import { reserveMail } from './mail-limits'
import { shareLinkMail } from './share-link-mail'
import { createScenario, findScenario, findVersion, versionDto } from './scenarios'
import { shareableSweep, sweepVersion } from './sweeps-share'

export function shareUrl(ctx: AppContext, token: string): string {
  return `${ctx.config.publicUrl}/s/${encodeURIComponent(token)}`
}

function status(link: ShareLink, now = new Date()): ShareLinkDto['status'] {
  if (link.revokedAt) return 'revoked'
  if (link.expiresAt && link.expiresAt <= now) return 'expired'
  return 'active'
}

function linkDto(link: ShareLink): ShareLinkDto {
  return {
    id: link.id,
    scenarioId: link.scenarioId,
    version: (link.version as ScenarioVersion).number,
    view: link.view,
    sweepId: link.sweepId ?? null,
    accessMode: link.accessMode,
    status: status(link),
    expiresAt: link.expiresAt?.toISOString() ?? null,
    revokedAt: link.revokedAt?.toISOString() ?? null,
    createdBy: { id: link.createdById, name: link.createdBy?.name ?? 'a former member' },
    createdAt: link.createdAt.toISOString(),
    lastOpenedAt: link.lastOpenedAt?.toISOString() ?? null,
    openCount: link.openCount,
  }
}

const linkIncludes = [
  { model: ScenarioVersion, as: 'version', required: true, attributes: ['id', 'number'] },
  { model: User, as: 'createdBy', required: false },
]

export async function createShareLink(ctx: AppContext, user: User, workspaceId: string, scenarioId: string, body: CreateShareLinkBody) {
  const scenario = await findScenario(workspaceId, scenarioId)
  const sweep = body.sweepId ? await shareableSweep(scenario.id, body.sweepId) : null
  const version = sweep && body.version === undefined ? await sweepVersion(scenario, sweep) : await findVersion(scenario.id, body.version ?? scenario.version)
  const view: ScenarioView = body.view ?? versionDto(version).content.view
  const token = randomToken()
  const link = await ShareLink.create({
    scenarioId: scenario.id,
    versionId: version.id,
    sweepId: sweep?.id ?? null,
    view,
    tokenHash: hashToken(token),
    accessMode: body.accessMode,
    expiresAt: body.expiresAt ? new Date(body.expiresAt) : null,
    createdById: user.id,
  })
  link.version = version
  link.createdBy = user
  return { link: linkDto(link), token, url: shareUrl(ctx, token) }
}

export async function listShareLinks(workspaceId: string, scenarioId: string): Promise<ShareLinkDto[]> {
  const scenario = await findScenario(workspaceId, scenarioId)
  const rows = await ShareLink.findAll({ where: { scenarioId: scenario.id }, include: linkIncludes, order: [['createdAt', 'DESC']] })
  return rows.map(linkDto)
}

/** A link of a live scenario of this workspace, or 404. */
async function findLink(workspaceId: string, linkId: string): Promise<ShareLink> {
  const link = /^[0-9a-f-]{36}$/i.test(linkId)
    ? await ShareLink.findByPk(linkId, {
        include: [...linkIncludes, { model: Scenario, as: 'scenario', required: true, where: { workspaceId, deletedAt: null }, attributes: ['id'] }],
      })
    : null
  if (!link) throw errors.notFound('share link')
  return link
}

/**
 * Revokes a link: the workspace owner may revoke any, an editor the ones they
 * made. Revoking twice keeps the first time.
 */
export async function revokeShareLink(ctx: AppContext, user: User, membership: Membership, linkId: string): Promise<ShareLinkDto> {
  const link = await findLink(membership.workspaceId, linkId)
  if (membership.role !== 'owner' && link.createdById !== user.id) throw errors.forbidden('Only the workspace owner or the link\'s creator may revoke it')
  if (!link.revokedAt) {
    // The trigger's notice drops the link from every process's cache; the
    // answer waits for it, so the next open anywhere sees the revoke.
    const notice = `link:${link.tokenHash}`
    const noticed = ctx.shares.noticed(notice)
    await link.update({ revokedAt: new Date() })
    await noticed
    ctx.shares.invalidate(notice)
  }
  return linkDto(link)
}

/** Sends the link to each address; the token in the body proves the sender holds the link. */
export async function emailShareLink(ctx: AppContext, user: User, workspaceId: string, linkId: string, body: EmailShareLinkBody): Promise<string[]> {
  const link = await findLink(workspaceId, linkId)
  if (hashToken(body.token) !== link.tokenHash) throw errors.validation({ token: 'This is not the token of this share link' })
  if (status(link) !== 'active') throw errors.conflict(`This link is ${status(link)}; make a new one to send`)
  const recipients = [...new Set(body.to)]
  await reserveMail(ctx, user, 'share', recipients.length)
  const scenario = await Scenario.findByPk(link.scenarioId, { attributes: ['id', 'title'] })
  const url = shareUrl(ctx, body.token)
  const sent: string[] = []
  for (const to of recipients) {
    await ctx.mailer.send(shareLinkMail({ to, sender: user.name, title: scenario?.title ?? 'a scenario', version: (link.version as ScenarioVersion).number, note: body.note, url, accessMode: link.accessMode, expiresAt: link.expiresAt }))
    sent.push(to)
  }
  return sent
}

/** The signed-in reader of an optional-auth route, if any. */
export function optionalUser(req: Request): User | null {
  return (req.user as User | undefined) ?? null
}

/** "Copy to my workspace": a new scenario (version 1) with the shared version's content. */
export async function copyFromShare(ctx: AppContext, user: User, workspaceId: string, token: string, title?: string) {
  const share = ShareOpens.shared(await ctx.shares.open(token, user))
  const content = { ...share.content, view: share.view, title: title ?? share.content.title }
  return createScenario(ctx, user, workspaceId, { content, message: `Copied from a share link of "${share.content.title}" version ${share.version} (${share.workspace.name})` }, { run: share.run })
}
