/**
 * Share links. The token is 256 random bits (base64url), returned once; the
 * table keeps its SHA-256. Opening a link hashes the presented token and looks
 * the hash up through its unique index: the same work whether the token is
 * close to a real one or not, so guessing learns nothing from timing, and an
 * unknown token is a plain 404. The shared version's body is cached per link
 * (share-bodies.ts); the link's state is read on every open.
 */
import type { Request } from 'express'
import { QueryTypes } from 'sequelize'
import type { ScenarioView } from '../../shared/schemas/scenario'
import type { CreateShareLinkBody, EmailShareLinkBody, ShareLink as ShareLinkDto, SharedScenario } from '../../shared/schemas/share-link'
import { hashToken, randomToken } from '../auth/tokens'
import type { AppContext } from '../context'
import { ApiError, errors } from '../http/errors'
import { Membership, Scenario, ScenarioVersion, ShareLink, User } from '../models'
import type { SharedBody } from './share-bodies'
import { reserveMail } from './mail-limits'
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
export async function revokeShareLink(ctx: AppContext, user: User, membership: Membership, linkId: string): Promise<ShareLinkDto> {
  const link = await findLink(membership.workspaceId, linkId)
  if (membership.role !== 'owner' && link.createdById !== user.id) throw errors.forbidden('Only the workspace owner or the link\'s creator may revoke it')
  if (!link.revokedAt) await link.update({ revokedAt: new Date() })
  // Opens check revocation in the database anyway; this only frees the memory.
  ctx.shareBodies.delete(link.id)
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

/** What one open reads per request: the link's state, its scenario and live workspace, and the reader's membership. */
interface LinkState {
  id: string
  version_id: string
  view: ScenarioView
  access_mode: ShareLink['accessMode']
  expires_at: Date | null
  expired: boolean
  revoked: boolean
  scenario_id: string | null
  workspace_id: string | null
  workspace_name: string | null
  member: boolean
}

/**
 * One statement, by the token hash's unique index and primary keys: reads the
 * link's state, and counts the open in the same round trip when the open is
 * allowed (not revoked, scenario and workspace live, not expired, and an
 * `anyone` link or a member). The WITH's SELECT sees the row as it was before
 * the count, which is all the checks need.
 */
const OPEN_LINK_SQL = `
WITH l AS (
  SELECT sl.id, sl.version_id, sl.view, sl.access_mode, sl.expires_at,
         sl.expires_at IS NOT NULL AND sl.expires_at <= now() AS expired,
         sl.revoked_at IS NOT NULL OR s.id IS NULL OR w.id IS NULL AS revoked,
         s.id AS scenario_id, w.id AS workspace_id, w.name AS workspace_name,
         EXISTS (SELECT 1 FROM memberships m WHERE m.workspace_id = w.id AND m.user_id = $2::uuid) AS member
  FROM share_links sl
  LEFT JOIN scenarios s ON s.id = sl.scenario_id AND s.deleted_at IS NULL
  LEFT JOIN workspaces w ON w.id = s.workspace_id AND w.deleted_at IS NULL
  WHERE sl.token_hash = $1
), opened AS (
  UPDATE share_links SET open_count = open_count + 1, last_opened_at = now()
  FROM l
  WHERE share_links.id = l.id AND NOT l.revoked AND NOT l.expired AND (l.access_mode = 'anyone' OR l.member)
  RETURNING share_links.id
)
SELECT * FROM l`

/** The immutable body of a link's version: from the cache, or read once and kept. */
async function sharedBody(ctx: AppContext, linkId: string, versionId: string): Promise<SharedBody> {
  const cached = ctx.shareBodies.get(linkId)
  if (cached) return cached
  const version = await ScenarioVersion.findByPk(versionId)
  if (!version) throw errors.notFound('share link')
  const { number, message, author, createdAt, content, run } = versionDto(version)
  const body: SharedBody = { number, message, author, createdAt, content, run }
  ctx.shareBodies.set(linkId, body)
  return body
}

/**
 * Resolves a token for a reader. Unknown: 404; revoked (or its scenario or
 * workspace deleted): 410 share_revoked; past its expiry: 410 share_expired;
 * workspace-only and the reader is not a member: 401 (not signed in) or 404.
 * Each successful open is counted.
 */
export async function openShare(ctx: AppContext, token: string, reader: User | null): Promise<SharedScenario> {
  const rows = await ctx.sequelize.query<LinkState>(OPEN_LINK_SQL, { bind: [hashToken(token), reader?.id ?? null], type: QueryTypes.SELECT })
  const link = rows[0]
  if (!link) throw errors.notFound('share link')
  if (link.revoked || !link.scenario_id || !link.workspace_id) {
    throw new ApiError(410, 'share_revoked', 'This share link was revoked; ask its sender for a new one')
  }
  if (link.expired) {
    throw new ApiError(410, 'share_expired', `This share link expired on ${link.expires_at?.toISOString()}; ask its sender for a new one`)
  }
  if (link.access_mode === 'workspace' && !link.member) {
    if (!reader) throw errors.unauthenticated('This share link is for members of its workspace: sign in to open it')
    throw errors.notFound('share link')
  }
  const v = await sharedBody(ctx, link.id, link.version_id)
  return {
    scenarioId: link.scenario_id,
    workspace: { id: link.workspace_id, name: link.workspace_name ?? '' },
    version: v.number,
    message: v.message,
    author: v.author,
    savedAt: v.createdAt,
    content: v.content,
    run: v.run,
    view: link.view,
    accessMode: link.access_mode,
    expiresAt: link.expires_at?.toISOString() ?? null,
  }
}

/** The signed-in reader of an optional-auth route, if any. */
export function optionalUser(req: Request): User | null {
  return (req.user as User | undefined) ?? null
}

/** "Copy to my workspace": a new scenario (version 1) with the shared version's content. */
export async function copyFromShare(ctx: AppContext, user: User, workspaceId: string, token: string, title?: string) {
  const share = await openShare(ctx, token, user)
  const content = { ...share.content, view: share.view, title: title ?? share.content.title }
  return createScenario(ctx, user, workspaceId, { content, message: `Copied from a share link of "${share.content.title}" version ${share.version} (${share.workspace.name})` }, { run: share.run })
}
