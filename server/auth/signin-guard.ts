/**
 * Failed sign-ins counted per account (the e-mail address as given, normalised
 * by the schema), beside the per-address limit of the auth routes: an attacker
 * spreading guesses over many addresses still gets `perAccount` tries per
 * window. Unknown addresses are counted alike, so a lockout says nothing about
 * whether an account exists. Counting is in memory, per process; a password
 * reset through the e-mailed link clears the account's count (lifts the
 * lockout), and so does a successful sign-in.
 */
export interface SignInLimit {
  /** Failed attempts per account and window; then 429 until the window ends. */
  perAccount: number
  windowMs: number
}

interface Count {
  failures: number
  windowStart: number
}

/** Addresses tracked at most; the oldest are dropped first. */
const MAX_TRACKED = 50_000

export interface SignInGuard {
  /** Seconds until the account may try again, or 0 when it may now. */
  lockedFor(email: string): number
  failed(email: string): void
  clear(email: string): void
}

export function createSignInGuard(limit: SignInLimit): SignInGuard {
  const counts = new Map<string, Count>()
  const current = (email: string, now: number): Count | undefined => {
    const c = counts.get(email)
    if (c && now - c.windowStart >= limit.windowMs) {
      counts.delete(email)
      return undefined
    }
    return c
  }
  return {
    lockedFor(email) {
      const now = Date.now()
      const c = current(email, now)
      return c && c.failures >= limit.perAccount ? Math.max(1, Math.ceil((c.windowStart + limit.windowMs - now) / 1000)) : 0
    },
    failed(email) {
      const now = Date.now()
      const c = current(email, now)
      if (c) c.failures++
      else {
        if (counts.size >= MAX_TRACKED) counts.delete(counts.keys().next().value as string)
        counts.set(email, { failures: 1, windowStart: now })
      }
    },
    clear(email) {
      counts.delete(email)
    },
  }
}
