/**
 * The shared version of each share link, kept in memory. A link points at one
 * ScenarioVersion, and versions never change (the database refuses updates:
 * migration 20261202100400), so once read the body can be served again
 * without the version row, its hydration and its schema parse. What can
 * change (revocation, expiry, the scenario or workspace going away, the
 * reader's membership) is checked on every open, never cached.
 *
 * Bounded twice: by entries and by an estimate of their size.
 */
import { LRUCache } from 'lru-cache'
import type { ScenarioVersion as VersionDto } from '../../shared/schemas/scenario'

/** The part of a shared scenario that is fixed when the link is made. */
export type SharedBody = Pick<VersionDto, 'number' | 'message' | 'author' | 'createdAt' | 'content' | 'run'>

export interface ShareBodyCacheLimits {
  entries: number
  /** Sum of the bodies' JSON lengths (characters). */
  size: number
}

export const SHARE_BODY_CACHE_LIMITS: ShareBodyCacheLimits = { entries: 1000, size: 64 * 1024 * 1024 }

export type ShareBodyCache = LRUCache<string, SharedBody>

export function createShareBodyCache(limits: ShareBodyCacheLimits = SHARE_BODY_CACHE_LIMITS): ShareBodyCache {
  return new LRUCache<string, SharedBody>({
    max: limits.entries,
    maxSize: limits.size,
    sizeCalculation: (body) => Math.max(1, JSON.stringify(body).length),
  })
}
