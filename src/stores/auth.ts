import { computed, ref } from 'vue'
import { defineStore } from 'pinia'
import type { AuthResponse, ForgotBody, ResetBody, SignInBody, SignUpBody } from '@shared/schemas/auth'
import type { User } from '@shared/schemas/user'
import { ApiError, createApi } from '@/api'

/**
 * The session. The access token lives only in memory (never in storage, so a
 * script injected into the page cannot lift it from there); the httpOnly
 * refresh cookie brings it back after a reload through POST /api/auth/refresh.
 */
export const useAuthStore = defineStore('auth', () => {
  const user = ref<User | null>(null)
  const accessToken = ref<string | null>(null)
  const signedIn = computed(() => user.value !== null && accessToken.value !== null)
  const isAdmin = computed(() => user.value?.role === 'admin')
  /** Why the last session ended: the router sends an expired session back to sign in with a way back. */
  const endedBy = ref<'sign-out' | 'expiry' | null>(null)

  // The API client of this session: it asks the store for the token and for a refresh on a 401.
  const api = createApi({ auth: { accessToken: () => accessToken.value, refresh: () => refresh() } })

  function setSession(session: AuthResponse) {
    user.value = session.user
    accessToken.value = session.accessToken
    endedBy.value = null
  }

  function clearSession(reason: 'sign-out' | 'expiry') {
    endedBy.value = user.value ? reason : null
    user.value = null
    accessToken.value = null
  }

  let refreshing: Promise<boolean> | null = null

  /**
   * Trades the refresh cookie for a new access token. Concurrent callers (several
   * requests meeting a 401 at once) share one call, because the server rotates
   * the cookie and a second call with the old one would fail.
   * Resolves false, signed out, when the cookie is missing (an answer without
   * a user), or expired or revoked (a 401).
   */
  function refresh(): Promise<boolean> {
    refreshing ??= api.auth
      .refresh()
      .then(
        (session) => {
          if (session.user === null) {
            clearSession('expiry')
            return false
          }
          setSession(session)
          return true
        },
        (err: unknown) => {
          if (err instanceof ApiError && (err.status === 400 || err.status === 401)) {
            clearSession('expiry')
            return false
          }
          throw err
        },
      )
      .finally(() => {
        refreshing = null
      })
    return refreshing
  }

  let restoring: Promise<void> | null = null

  /** Restores the session once per page load; the router waits for it before its first guard. */
  function restore(): Promise<void> {
    restoring ??= refresh().then(
      () => undefined,
      // An unreachable server leaves the user signed out; the sign-in form then shows the error.
      () => clearSession('expiry'),
    )
    return restoring
  }

  async function signIn(body: SignInBody) {
    setSession(await api.auth.signIn(body))
  }

  async function signUp(body: SignUpBody) {
    setSession(await api.auth.signUp(body))
  }

  async function resetPassword(body: ResetBody) {
    setSession(await api.auth.reset(body))
  }

  function requestReset(body: ForgotBody) {
    return api.auth.forgot(body)
  }

  /** Signs out here even when the server cannot be told: the user asked to leave. */
  async function signOut() {
    try {
      await api.auth.signOut()
    } finally {
      clearSession('sign-out')
    }
  }

  return { user, accessToken, signedIn, isAdmin, endedBy, api, refresh, restore, signIn, signUp, resetPassword, requestReset, signOut }
})
