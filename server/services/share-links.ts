/**
 * Share links. The token is 256 random bits (base64url), returned once; the
 * table keeps its SHA-256. Opening a link hashes the presented token and looks
 * the hash up through its unique index: the same work whether the token is
 * close to a real one or not, so guessing learns nothing from timing, and an
 * unknown token is a plain 404.
 */
import type { Request } from 'express'
import type { ScenarioView } from '../../shared/schemas/scenario'
import type { CreateShareLinkBody, EmailShareLinkBody, ShareLink as ShareLinkDto, SharedScenario } from '../../shared/schemas/share-link'
import { hashToken, randomToken } from '../auth/tokens'
import type { AppContext } from '../context'
import { ApiError, errors } from '../http/errors'
import { Membership, Scenario, ScenarioVersion, ShareLink, User, Workspace } from '../models'
import { shareLinkMail } from './share-link-mail'
import { createScenario, findScenario, findVersion, versionDto } from './scenarios'

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
  const version = await findVersion(scenario.id, body.version ?? scenario.version)
  const view: ScenarioView = body.view ?? versionDto(version).content.view
  const token = randomToken()
  const link = await ShareLink.create({
    scenarioId: scenario.id,
    versionId: version.id,
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
export async function revokeShareLink(user: User, membership: Membership, linkId: string): Promise<ShareLinkDto> {
  const link = await findLink(membership.workspaceId, linkId)
  if (membership.role !== 'owner' && link.createdById !== user.id) throw errors.forbidden('Only the workspace owner or the link\'s creator may revoke it')
  if (!link.revokedAt) await link.update({ revokedAt: new Date() })
  return linkDto(link)
}

/** Sends the link to each address; the token in the body proves the sender holds the link. */
export async function emailShareLink(ctx: AppContext, user: User, workspaceId: string, linkId: string, body: EmailShareLinkBody): Promise<string[]> {
  const link = await findLink(workspaceId, linkId)
  if (hashToken(body.token) !== link.tokenHash) throw errors.validation({ token: 'This is not the token of this share link' })
  if (status(link) !== 'active') throw errors.conflict(`This link is ${status(link)}; make a new one to send`)
  const scenario = await Scenario.findByPk(link.scenarioId, { attributes: ['id', 'title'] })
  const url = shareUrl(ctx, body.token)
  const sent: string[] = []
  for (const to of [...new Set(body.to)]) {
    await ctx.mailer.send(shareLinkMail({ to, sender: user.name, title: scenario?.title ?? 'a scenario', version: (link.version as ScenarioVersion).number, note: body.note, url, accessMode: link.accessMode, expiresAt: link.expiresAt }))
    sent.push(to)
  }
  return sent
}

/**
 * Resolves a token for a reader. Unknown: 404; revoked (or its scenario or
 * workspace deleted): 410 share_revoked; past its expiry: 410 share_expired;
 * workspace-only and the reader is not a member: 401 (not signed in) or 404.
 * Each successful open is counted.
 */
export async function openShare(token: string, reader: User | null): Promise<SharedScenario> {
  const tokenHash = hashToken(token)
  // One query (joins) for the link, its version, scenario and live workspace: the endpoint is the hot path of every shared URL.
  const link = (await ShareLink.findOne({
    where: { tokenHash },
    include: [
      { model: ScenarioVersion, as: 'version', required: true },
      { model: Scenario, as: 'scenario', required: false, attributes: ['id', 'deletedAt', 'workspaceId'], include: [{ model: Workspace, as: 'workspace', required: false, attributes: ['id', 'name'] }] },
    ],
  })) as (ShareLink & { scenario?: (Scenario & { workspace?: Workspace | null }) | null }) | null
  if (!link) throw errors.notFound('share link')
  const scenario = link.scenario
  const workspace = scenario?.workspace
  if (link.revokedAt || !scenario || scenario.deletedAt || !workspace) {
    throw new ApiError(410, 'share_revoked', 'This share link was revoked; ask its sender for a new one')
  }
  if (link.expiresAt && link.expiresAt <= new Date()) {
    throw new ApiError(410, 'share_expired', `This share link expired on ${link.expiresAt.toISOString()}; ask its sender for a new one`)
  }
  if (link.accessMode === 'workspace') {
    if (!reader) throw errors.unauthenticated('This share link is for members of its workspace: sign in to open it')
    const member = await Membership.count({ where: { workspaceId: workspace.id, userId: reader.id } })
    if (!member) throw errors.notFound('share link')
  }
  await ShareLink.update(
    { openCount: ShareLink.sequelize!.literal('open_count + 1') as unknown as number, lastOpenedAt: new Date() },
    { where: { id: link.id } },
  )
  const v = versionDto(link.version as ScenarioVersion)
  return {
    scenarioId: scenario.id,
    workspace: { id: workspace.id, name: workspace.name },
    version: v.number,
    message: v.message,
    author: v.author,
    savedAt: v.createdAt,
    content: v.content,
    run: v.run,
    view: link.view,
    accessMode: link.accessMode,
    expiresAt: link.expiresAt?.toISOString() ?? null,
  }
}

/** The signed-in reader of an optional-auth route, if any. */
export function optionalUser(req: Request): User | null {
  return (req.user as User | undefined) ?? null
}

/** "Copy to my workspace": a new scenario (version 1) with the shared version's content. */
export async function copyFromShare(ctx: AppContext, user: User, workspaceId: string, token: string, title?: string) {
  const share = await openShare(token, user)
  const content = { ...share.content, view: share.view, title: title ?? share.content.title }
  return createScenario(ctx, user, workspaceId, { content, message: `Copied from a share link of "${share.content.title}" version ${share.version} (${share.workspace.name})` }, { run: share.run })
}
