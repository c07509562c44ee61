/**
 * Whether a session is live, asked on every authenticated request. A small
 * cache keeps that from being a database query per request: an answer is kept
 * for SESSION_CACHE_MS, and this process forgets a session the moment it ends
 * one (sign-out, reset), so here the end takes effect at once; another
 * process sharing the database sees it within SESSION_CACHE_MS.
 */
import { UserSession } from '../models'

export const SESSION_CACHE_MS = 10_000
const MAX_ENTRIES = 10_000

interface Entry {
  userId: string | null
  checkedAt: number
}

const cache = new Map<string, Entry>()

/** True when the session exists, has not ended and belongs to this user. */
export async function sessionIsLive(sessionId: string, userId: string): Promise<boolean> {
  const now = Date.now()
  let entry = cache.get(sessionId)
  if (!entry || now - entry.checkedAt > SESSION_CACHE_MS) {
    const row = await UserSession.findByPk(sessionId, { attributes: ['userId', 'endedAt'] })
    entry = { userId: row && !row.endedAt ? row.userId : null, checkedAt: now }
    // Oldest first out: a Map iterates in insertion order.
    if (cache.size >= MAX_ENTRIES) cache.delete(cache.keys().next().value as string)
    cache.delete(sessionId)
    cache.set(sessionId, entry)
  }
  return entry.userId === userId
}

/** Called when sessions end, so this process refuses their tokens from now on. */
export function forgetSessions(sessionIds: string[]): void {
  for (const id of sessionIds) cache.delete(id)
}
