// @vitest-environment happy-dom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { nextTick } from 'vue'
import { createPinia, setActivePinia } from 'pinia'
import { createMemoryHistory } from 'vue-router'
import { createAppRouter, installGuards, safeRedirect } from '@/router'
import { useAuthStore } from '@/stores/auth'
import { admin, apiError, editor, installFakeServer, json } from './fakeServer'

function appWith(user: typeof editor | typeof admin | null) {
  installFakeServer({
    'POST /api/auth/refresh': () => (user ? json(200, { user, accessToken: 't' }) : apiError(401, 'unauthenticated', 'No session')),
    'POST /api/auth/signout': () => json(204),
  })
  const router = createAppRouter(createMemoryHistory())
  const auth = useAuthStore()
  installGuards(router, auth)
  return { router, auth }
}

beforeEach(() => {
  setActivePinia(createPinia())
})

afterEach(() => {
  vi.unstubAllGlobals()
})

describe('route guards', () => {
  it('sends a signed-out user to sign in, with the way back', async () => {
    const { router } = appWith(null)
    await router.push('/scenarios?tag=reductions')
    expect(router.currentRoute.value.name).toBe('signin')
    expect(router.currentRoute.value.query.redirect).toBe('/scenarios?tag=reductions')
  })

  it('makes the Bench the home page once signed in', async () => {
    const { router } = appWith(editor)
    await router.push('/')
    expect(router.currentRoute.value.name).toBe('bench')
  })

  it('sends a signed-in user from the sign-in page on to where they were going', async () => {
    const { router } = appWith(editor)
    await router.push('/signin?redirect=/sweeps')
    expect(router.currentRoute.value.fullPath).toBe('/sweeps')
  })

  it.each([
    ['a member', 'not-found', editor],
    ['a site admin', 'outbox', admin],
  ])('shows the Outbox only to site admins: %s lands on %s', async (_who, expected, user) => {
    const { router } = appWith(user)
    await router.push('/admin/outbox')
    expect(router.currentRoute.value.name).toBe(expected)
  })

  it('lets anyone open the reset and invitation links', async () => {
    const { router } = appWith(null)
    await router.push('/reset?token=abc')
    expect(router.currentRoute.value.name).toBe('reset')
    await router.push('/invite?token=abc')
    expect(router.currentRoute.value.name).toBe('invite')
  })

  it('leaves a page that needs a session when the user signs out', async () => {
    const { router, auth } = appWith(editor)
    await router.push('/learn')
    await auth.signOut()
    await nextTick()
    await router.isReady()
    await vi.waitFor(() => expect(router.currentRoute.value.name).toBe('signin'))
    expect(router.currentRoute.value.query.redirect).toBeUndefined()
  })
})

describe('a session that expires on an open page', () => {
  it('sends the user to sign in with the way back to that page', async () => {
    let refreshes = 0
    installFakeServer({
      // The first refresh restores the session on load; the next one finds the cookie expired.
      'POST /api/auth/refresh': () =>
        ++refreshes === 1 ? json(200, { user: editor, accessToken: 't' }) : apiError(401, 'unauthenticated', 'Your session has ended'),
      'GET /api/me': () => apiError(401, 'unauthenticated', 'The access token has expired'),
    })
    const router = createAppRouter(createMemoryHistory())
    const auth = useAuthStore()
    installGuards(router, auth)
    await router.push('/sweeps?range=lanes')
    await expect(auth.api.workspaces.me()).rejects.toMatchObject({ status: 401 })
    await vi.waitFor(() => expect(router.currentRoute.value.name).toBe('signin'))
    expect(router.currentRoute.value.query.redirect).toBe('/sweeps?range=lanes')
  })
})

describe('safeRedirect', () => {
  it.each([
    ['/scenarios?tag=x', '/scenarios?tag=x'],
    ['//evil.test/phish', '/bench'],
    ['/\\evil.test', '/bench'],
    ['https://evil.test', '/bench'],
    ['javascript:alert(1)', '/bench'],
    [undefined, '/bench'],
    [['/a', '/b'], '/bench'],
  ])('follows %j to %s', (value, expected) => {
    expect(safeRedirect(value)).toBe(expected)
  })
})
