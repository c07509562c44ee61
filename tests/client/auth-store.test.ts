// @vitest-environment happy-dom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { createPinia, setActivePinia } from 'pinia'
import { useAuthStore } from '@/stores/auth'
import { apiError, editor, installFakeServer, json, vectorLab } from './fakeServer'

beforeEach(() => {
  setActivePinia(createPinia())
  localStorage.clear()
  sessionStorage.clear()
})

afterEach(() => {
  vi.unstubAllGlobals()
})

const session = (token: string) => json(200, { user: editor, accessToken: token })
// The server's answer to a refresh without any cookie (tests/server/auth.test.ts checks it).
const noCookie = () => json(200, { user: null })

describe('the auth store', () => {
  it('restores the session on load from the refresh cookie', async () => {
    const server = installFakeServer({ 'POST /api/auth/refresh': () => session('t1') })
    const auth = useAuthStore()
    await auth.restore()
    expect(auth.signedIn).toBe(true)
    expect(auth.user?.email).toBe('editor@vector-lab.test')
    expect(server.count('POST /api/auth/refresh')).toBe(1)
  })

  it('stays signed out after load when there is no refresh cookie', async () => {
    installFakeServer({ 'POST /api/auth/refresh': noCookie })
    const auth = useAuthStore()
    await auth.restore()
    expect(auth.signedIn).toBe(false)
    expect(auth.endedBy).toBeNull()
  })

  it('stays signed out after load when the refresh cookie is present but refused with 401', async () => {
    installFakeServer({ 'POST /api/auth/refresh': () => apiError(401, 'unauthenticated', 'Your session has ended; sign in again') })
    const auth = useAuthStore()
    await auth.restore()
    expect(auth.signedIn).toBe(false)
    expect(auth.endedBy).toBeNull()
  })

  it('ends a session, marked as expired, when a refresh finds the cookie gone', async () => {
    installFakeServer({
      'POST /api/auth/signin': () => session('t1'),
      'POST /api/auth/refresh': noCookie,
      'GET /api/me': () => apiError(401, 'unauthenticated', 'expired'),
    })
    const auth = useAuthStore()
    await auth.signIn({ email: editor.email, password: 'chimeline-demo-2026' })
    await expect(auth.api.workspaces.me()).rejects.toMatchObject({ status: 401 })
    expect(auth.signedIn).toBe(false)
    expect(auth.endedBy).toBe('expiry')
  })

  it('restores only once however many navigations wait for it', async () => {
    const server = installFakeServer({ 'POST /api/auth/refresh': () => session('t1') })
    const auth = useAuthStore()
    await Promise.all([auth.restore(), auth.restore(), auth.restore()])
    expect(server.count('POST /api/auth/refresh')).toBe(1)
  })

  it('stays signed out, without throwing, when the server cannot be reached on load', async () => {
    vi.stubGlobal('fetch', vi.fn(async () => Promise.reject(new TypeError('Failed to fetch'))))
    const auth = useAuthStore()
    await expect(auth.restore()).resolves.toBeUndefined()
    expect(auth.signedIn).toBe(false)
  })

  it('keeps the access token in memory only, never in web storage', async () => {
    installFakeServer({ 'POST /api/auth/signin': () => session('secret-token') })
    const auth = useAuthStore()
    await auth.signIn({ email: editor.email, password: 'chimeline-demo-2026' })
    expect(auth.accessToken).toBe('secret-token')
    const stored = [...Object.values(localStorage), ...Object.values(sessionStorage)].join(' ')
    expect(stored).not.toContain('secret-token')
  })

  it('refreshes on a 401 and retries the call with the new token', async () => {
    let issued = 0
    const server = installFakeServer({
      'POST /api/auth/signin': () => session('expired'),
      'POST /api/auth/refresh': () => session(`fresh-${++issued}`),
      'GET /api/me': (req) =>
        req.headers.Authorization === 'Bearer fresh-1'
          ? json(200, { user: editor, workspaces: [vectorLab] })
          : apiError(401, 'unauthenticated', 'The access token has expired'),
    })
    const auth = useAuthStore()
    await auth.signIn({ email: editor.email, password: 'chimeline-demo-2026' })
    const me = await auth.api.workspaces.me()
    expect(me.workspaces.map((w) => w.name)).toEqual(['Vector Lab'])
    expect(auth.accessToken).toBe('fresh-1')
    expect(server.count('GET /api/me')).toBe(2)
  })

  it('shares one refresh among calls that meet a 401 at the same time (the cookie rotates)', async () => {
    const server = installFakeServer({
      'POST /api/auth/signin': () => session('expired'),
      'POST /api/auth/refresh': () => session('fresh'),
      'GET /api/me': (req) =>
        req.headers.Authorization === 'Bearer fresh'
          ? json(200, { user: editor, workspaces: [] })
          : apiError(401, 'unauthenticated', 'expired'),
    })
    const auth = useAuthStore()
    await auth.signIn({ email: editor.email, password: 'chimeline-demo-2026' })
    await Promise.all([auth.api.workspaces.me(), auth.api.workspaces.me(), auth.api.workspaces.me()])
    expect(server.count('POST /api/auth/refresh')).toBe(1)
  })

  it('ends the session, marked as expired, when the refresh cookie is refused', async () => {
    installFakeServer({
      'POST /api/auth/signin': () => session('t1'),
      'POST /api/auth/refresh': () => apiError(400, 'invalid_token', 'The session has ended'),
      'GET /api/me': () => apiError(401, 'unauthenticated', 'expired'),
    })
    const auth = useAuthStore()
    await auth.signIn({ email: editor.email, password: 'chimeline-demo-2026' })
    await expect(auth.api.workspaces.me()).rejects.toMatchObject({ status: 401 })
    expect(auth.signedIn).toBe(false)
    expect(auth.endedBy).toBe('expiry')
  })

  it('leaves the user signed out with the generic message on a wrong password', async () => {
    installFakeServer({ 'POST /api/auth/signin': () => apiError(401, 'invalid_credentials', 'Wrong e-mail or password') })
    const auth = useAuthStore()
    await expect(auth.signIn({ email: editor.email, password: 'wrong-password' })).rejects.toMatchObject({
      code: 'invalid_credentials',
      message: 'Wrong e-mail or password',
    })
    expect(auth.signedIn).toBe(false)
  })

  it('signs out on the server and here', async () => {
    const server = installFakeServer({ 'POST /api/auth/signin': () => session('t1'), 'POST /api/auth/signout': () => json(204) })
    const auth = useAuthStore()
    await auth.signIn({ email: editor.email, password: 'chimeline-demo-2026' })
    await auth.signOut()
    expect(server.count('POST /api/auth/signout')).toBe(1)
    expect(auth.signedIn).toBe(false)
    expect(auth.endedBy).toBe('sign-out')
  })

  it('signs out here even when the server cannot be told', async () => {
    installFakeServer({ 'POST /api/auth/signin': () => session('t1') })
    const auth = useAuthStore()
    await auth.signIn({ email: editor.email, password: 'chimeline-demo-2026' })
    vi.stubGlobal('fetch', vi.fn(async () => Promise.reject(new TypeError('Failed to fetch'))))
    await expect(auth.signOut()).rejects.toMatchObject({ code: 'network' })
    expect(auth.signedIn).toBe(false)
    expect(auth.accessToken).toBeNull()
  })

  it('signs in with the new password after a reset', async () => {
    const server = installFakeServer({ 'POST /api/auth/reset': () => session('after-reset') })
    const auth = useAuthStore()
    await auth.resetPassword({ token: 'one-time', password: 'a-new-password-1' })
    expect(server.requests[0]?.body).toEqual({ token: 'one-time', password: 'a-new-password-1' })
    expect(auth.accessToken).toBe('after-reset')
  })
})
