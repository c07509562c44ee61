/**
 * Opening share links: the hot path of GET /api/shares/:token.
 *
 * Each link's state and its answer are kept in memory, keyed by the SHA-256
 * of the token (the token itself is never kept). A warm open is one hash of
 * the token, one cache look-up, a clock check for the expiry and a count in
 * memory (share-links-counts.ts); the answer is a body serialised once per
 * link, with its ETag, the same for every reader (it names no user,
 * workspace or scenario id). Only a `workspace` link reads the database per
 * open: whether the signed-in reader is a member now.
 *
 * Entries are dropped when PostgreSQL notifies a change (share-links-notify.ts
 * listens; triggers of migration 20261203183000 send), so a revoke, an expiry
 * moved or a deleted scenario takes effect in every process at once. While
 * that listener is not connected, nothing is cached and every open reads the
 * database.
 */
import crypto from 'node:crypto'
import { LRUCache } from 'lru-cache'
import { QueryTypes, type Sequelize } from 'sequelize'
import type { ScenarioView } from '../../shared/schemas/scenario'
import type { SharedScenario, ShareAccessMode } from '../../shared/schemas/share-link'
import { hashToken } from '../auth/tokens'
import { ApiError, errors } from '../http/errors'
import { ScenarioVersion, type User } from '../models'
import type { OpenCounter } from './share-links-counts'
import { versionDto } from './scenarios'
import { sharedSweep } from './sweeps-share'

/** A link that opens: its answer, ready to send. */
export interface OpenLink {
  kind: 'open'
  linkId: string
  scenarioId: string
  workspaceId: string
  accessMode: ShareAccessMode
  /** ms since the epoch; null: never expires. */
  expiresAt: number | null
  /** `{"share": ...}` as JSON. */
  body: Buffer
  etag: string
}

/** A revoked link, or one whose scenario or workspace was deleted: 410 without reading the database again. */
interface ClosedLink {
  kind: 'revoked'
  linkId: string
  scenarioId: string
  workspaceId: string
}

type Entry = OpenLink | ClosedLink

export interface ShareCacheLimits {
  entries: number
  /** Sum of the cached bodies' lengths in bytes. */
  size: number
}

export const SHARE_CACHE_LIMITS: ShareCacheLimits = { entries: 1000, size: 64 * 1024 * 1024 }

/** A link's state with its scenario and workspace, by the token hash's unique index. */
const LINK_SQL = `
SELECT sl.id, sl.version_id, sl.sweep_id, sl.view, sl.access_mode, sl.expires_at, sl.scenario_id, s.workspace_id, w.name AS workspace_name,
       sl.revoked_at IS NOT NULL OR s.deleted_at IS NOT NULL OR w.deleted_at IS NOT NULL AS revoked
FROM share_links sl
JOIN scenarios s ON s.id = sl.scenario_id
JOIN workspaces w ON w.id = s.workspace_id
WHERE sl.token_hash = $1`

interface LinkRow {
  id: string
  version_id: string
  sweep_id: string | null
  view: ScenarioView
  access_mode: ShareAccessMode
  expires_at: Date | null
  scenario_id: string
  workspace_id: string
  workspace_name: string
  revoked: boolean
}

const revokedError = () => new ApiError(410, 'share_revoked', 'This share link was revoked; ask its sender for a new one')

export class ShareOpens {
  private readonly cache: LRUCache<string, Entry>
  /** Reads in flight by token hash, so a crowd opening a cold link reads it once. */
  private readonly reading = new Map<string, Promise<Entry | null>>()
  /** Bumped by every invalidation: a read that started before one must not fill the cache. */
  private generation = 0
  private listening = false
  /** Callers of noticed(), by notice. */
  private readonly awaited = new Map<string, (() => void)[]>()

  constructor(
    private readonly sequelize: Sequelize,
    readonly counts: OpenCounter,
    limits: ShareCacheLimits = SHARE_CACHE_LIMITS,
  ) {
    this.cache = new LRUCache<string, Entry>({
      max: limits.entries,
      maxSize: limits.size,
      sizeCalculation: (e) => (e.kind === 'open' ? Math.max(1, e.body.length) : 1),
    })
  }

  /**
   * Resolves a token for a reader and counts the open. Unknown: 404; revoked
   * (or its scenario or workspace deleted): 410 share_revoked; past its
   * expiry: 410 share_expired; workspace-only and the reader is not a member:
   * 401 (not signed in) or 404.
   */
  async open(token: string, reader: User | null): Promise<OpenLink> {
    const hash = hashToken(token)
    const entry = this.cache.get(hash) ?? (await this.read(hash))
    if (!entry) throw errors.notFound('share link')
    if (entry.kind === 'revoked') throw revokedError()
    if (entry.expiresAt !== null && entry.expiresAt <= Date.now()) {
      throw new ApiError(410, 'share_expired', `This share link expired on ${new Date(entry.expiresAt).toISOString()}; ask its sender for a new one`)
    }
    if (entry.accessMode === 'workspace') {
      if (!reader) throw errors.unauthenticated('This share link is for members of its workspace: sign in to open it')
      if (!(await this.isMember(entry.workspaceId, reader.id))) throw errors.notFound('share link')
    }
    this.counts.record(entry.linkId)
    return entry
  }

  /**
   * The fast path's look-up (routes/shares/fast-open.ts): a cached `anyone`
   * link that opens now (the caller counts the open if it answers); null for
   * anything else, which the full route then answers. No database, no await.
   */
  warmAnyone(token: string): OpenLink | null {
    const e = this.cache.get(hashToken(token))
    if (!e || e.kind !== 'open' || e.accessMode !== 'anyone' || (e.expiresAt !== null && e.expiresAt <= Date.now())) return null
    return e
  }

  /** The shared scenario of an open link, as the answer's body holds it. */
  static shared(link: OpenLink): SharedScenario {
    return (JSON.parse(link.body.toString('utf8')) as { share: SharedScenario }).share
  }

  /** Whether change notices arrive, so links are cached (tests). */
  isListening(): boolean {
    return this.listening
  }

  /** Whether a link's state is cached (tests). */
  cached(token: string): boolean {
    return this.cache.has(hashToken(token))
  }

  /**
   * Drops what a change notice names: "link:<token hash>",
   * "scenario:<id>" or "workspace:<id>"; anything else empties the cache.
   */
  invalidate(notice: string): void {
    this.generation++
    this.reading.clear()
    const waiting = this.awaited.get(notice)
    if (waiting) {
      this.awaited.delete(notice)
      for (const resolve of waiting) resolve()
    }
    const [what, id] = notice.split(':', 2)
    if (what === 'link' && id) {
      this.cache.delete(id)
      return
    }
    const field = what === 'scenario' ? 'scenarioId' : what === 'workspace' ? 'workspaceId' : null
    if (!field || !id) {
      this.cache.clear()
      return
    }
    const stale: string[] = []
    for (const [hash, e] of this.cache.entries()) if (e[field] === id) stale.push(hash)
    for (const hash of stale) this.cache.delete(hash)
  }

  /**
   * Resolves when this process receives the notice (at most `timeoutMs`
   * later; at once when not listening). PostgreSQL hands a commit's notices
   * to every listening connection together, so a change that waits for its
   * own notice before answering is known to all processes by then.
   */
  noticed(notice: string, timeoutMs = 2000): Promise<void> {
    if (!this.listening) return Promise.resolve()
    return new Promise((resolve) => {
      const list = this.awaited.get(notice) ?? []
      this.awaited.set(notice, list)
      list.push(resolve)
      setTimeout(() => {
        const i = list.indexOf(resolve)
        if (i >= 0) list.splice(i, 1)
        if (list.length === 0 && this.awaited.get(notice) === list) this.awaited.delete(notice)
        resolve()
      }, timeoutMs).unref()
    })
  }

  /**
   * Called by the listener: caching is allowed only while change notices
   * arrive. Either way the cache starts empty, since notices may have been
   * missed while not listening.
   */
  setListening(listening: boolean): void {
    this.listening = listening
    this.invalidate('*')
  }

  private read(hash: string): Promise<Entry | null> {
    const inFlight = this.reading.get(hash)
    if (inFlight) return inFlight
    const generation = this.generation
    const p = readEntry(this.sequelize, hash).then((entry) => {
      if (entry && this.listening && generation === this.generation) this.cache.set(hash, entry)
      return entry
    })
    this.reading.set(hash, p)
    const forget = () => {
      if (this.reading.get(hash) === p) this.reading.delete(hash)
    }
    p.then(forget, forget)
    return p
  }

  private async isMember(workspaceId: string, userId: string): Promise<boolean> {
    const rows = await this.sequelize.query('SELECT 1 FROM memberships WHERE workspace_id = $1 AND user_id = $2', {
      bind: [workspaceId, userId],
      type: QueryTypes.SELECT,
    })
    return rows.length > 0
  }
}

async function readEntry(sequelize: Sequelize, hash: string): Promise<Entry | null> {
  const [row] = await sequelize.query<LinkRow>(LINK_SQL, { bind: [hash], type: QueryTypes.SELECT })
  if (!row) return null
  const ids = { linkId: row.id, scenarioId: row.scenario_id, workspaceId: row.workspace_id }
  if (row.revoked) return { kind: 'revoked', ...ids }
  const version = await ScenarioVersion.findByPk(row.version_id)
  if (!version) return null
  const v = versionDto(version)
  // No ids of people, workspaces or scenarios: the answer goes to readers outside the workspace.
  const share: SharedScenario = {
    workspace: { name: row.workspace_name },
    version: v.number,
    message: v.message,
    author: { name: v.author.name },
    savedAt: v.createdAt,
    content: v.content,
    run: v.run,
    view: row.view,
    accessMode: row.access_mode,
    expiresAt: row.expires_at?.toISOString() ?? null,
    // Only finished sweeps are shared (sweeps-share.ts), so the cached answer does not go stale.
    sweep: row.sweep_id ? await sharedSweep(sequelize, row.sweep_id) : null,
  }
  const body = Buffer.from(JSON.stringify({ share }))
  const etag = `"${crypto.createHash('sha256').update(body).digest('base64url').slice(0, 27)}"`
  return { kind: 'open', ...ids, accessMode: row.access_mode, expiresAt: row.expires_at?.getTime() ?? null, body, etag }
}
