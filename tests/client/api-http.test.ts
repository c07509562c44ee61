// @vitest-environment happy-dom
import { afterEach, describe, expect, it, vi } from 'vitest'
import { z } from 'zod'
import { meResponseSchema } from '@shared/schemas/workspace'
import { ApiError } from '@/api'
import { createHttp, type AuthHooks } from '@/api/http'
import { apiError, editor, installFakeServer, json, vectorLab } from './fakeServer'

afterEach(() => {
  vi.unstubAllGlobals()
})

function hooks(tokens: string[]): AuthHooks & { refreshes: number } {
  let current = tokens[0] ?? null
  const h = {
    refreshes: 0,
    accessToken: () => current,
    refresh: async () => {
      h.refreshes += 1
      current = tokens[h.refreshes] ?? null
      return current !== null
    },
  }
  return h
}

describe('the typed HTTP client', () => {
  it('returns the answer parsed with the shared schema', async () => {
    installFakeServer({ 'GET /api/me': () => json(200, { user: editor, workspaces: [vectorLab] }) })
    const me = await createHttp().request('/api/me', { schema: meResponseSchema })
    expect(me.workspaces[0]?.name).toBe('Vector Lab')
  })

  it('sends a JSON body with its content type and the bearer token', async () => {
    const server = installFakeServer({ 'POST /api/things': () => json(204) })
    await createHttp({ auth: hooks(['t1']) }).request('/api/things', { method: 'POST', body: { name: 'x' } })
    expect(server.requests[0]).toMatchObject({
      body: { name: 'x' },
      headers: { 'Content-Type': 'application/json', Authorization: 'Bearer t1' },
    })
  })

  it('rejects an answer of the wrong shape with bad_response, naming the path of the first problem', async () => {
    installFakeServer({ 'GET /api/me': () => json(200, { user: { ...editor, id: 'not-a-uuid' }, workspaces: [] }) })
    const err = await createHttp().request('/api/me', { schema: meResponseSchema }).catch((e: unknown) => e)
    expect(err).toBeInstanceOf(ApiError)
    expect(err).toMatchObject({ code: 'bad_response', status: 200 })
    expect((err as ApiError).message).toContain('GET /api/me')
    expect((err as ApiError).message).toContain('user.id')
  })

  it('turns the error body of the contract into an ApiError with code, message and fields', async () => {
    installFakeServer({
      'POST /api/auth/signup': () =>
        apiError(400, 'validation_failed', 'Check the highlighted fields', { password: 'A password has at least 10 characters' }),
    })
    const err = await createHttp()
      .request('/api/auth/signup', { method: 'POST', body: {}, auth: false })
      .catch((e: unknown) => e)
    expect(err).toMatchObject({
      status: 400,
      code: 'validation_failed',
      message: 'Check the highlighted fields',
      fields: { password: 'A password has at least 10 characters' },
    })
  })

  it.each([
    [413, 'payload_too_large'],
    [429, 'rate_limited'],
    [502, 'internal'],
  ])('gives an error answer without our JSON body (status %i) the code %s', async (status, code) => {
    vi.stubGlobal('fetch', vi.fn(async () => new Response('<html>proxy</html>', { status, statusText: 'Nope' })))
    const err = await createHttp().request('/api/x').catch((e: unknown) => e)
    expect(err).toMatchObject({ status, code, fields: {} })
    expect((err as ApiError).message).toBe(`The server answered ${status} Nope to GET /api/x.`)
  })

  it('reports an unreachable server as a network error with status 0', async () => {
    vi.stubGlobal('fetch', vi.fn(async () => Promise.reject(new TypeError('Failed to fetch'))))
    const err = await createHttp().request('/api/x').catch((e: unknown) => e)
    expect(err).toMatchObject({ status: 0, code: 'network' })
  })

  it('passes an abort through untouched, so callers can tell cancelling from failing', async () => {
    vi.stubGlobal('fetch', vi.fn(async () => Promise.reject(new DOMException('aborted', 'AbortError'))))
    const err = await createHttp().request('/api/x').catch((e: unknown) => e)
    expect(err).toBeInstanceOf(DOMException)
  })

  it('on a 401 refreshes once and retries with the new token', async () => {
    const server = installFakeServer({
      'GET /api/me': (req) =>
        req.headers.Authorization === 'Bearer fresh'
          ? json(200, { user: editor, workspaces: [] })
          : apiError(401, 'unauthenticated', 'Sign in again'),
    })
    const auth = hooks(['stale', 'fresh'])
    const me = await createHttp({ auth }).request('/api/me', { schema: meResponseSchema })
    expect(me.user.email).toBe(editor.email)
    expect(auth.refreshes).toBe(1)
    expect(server.requests.map((r) => r.headers.Authorization)).toEqual(['Bearer stale', 'Bearer fresh'])
  })

  it('does not refresh a second time when the retry is refused too', async () => {
    const server = installFakeServer({ 'GET /api/me': () => apiError(401, 'unauthenticated', 'Sign in again') })
    const auth = hooks(['a', 'b', 'c'])
    const err = await createHttp({ auth }).request('/api/me').catch((e: unknown) => e)
    expect(err).toMatchObject({ status: 401, code: 'unauthenticated' })
    expect(auth.refreshes).toBe(1)
    expect(server.requests).toHaveLength(2)
  })

  it('gives up with the 401 when the session cannot be refreshed', async () => {
    const server = installFakeServer({ 'GET /api/me': () => apiError(401, 'unauthenticated', 'Sign in again') })
    const err = await createHttp({ auth: hooks(['old']) }).request('/api/me').catch((e: unknown) => e)
    expect(err).toMatchObject({ status: 401, message: 'Sign in again' })
    expect(server.requests).toHaveLength(1)
  })

  it('sends no token and never refreshes for calls marked auth: false', async () => {
    const server = installFakeServer({ 'POST /api/auth/signin': () => apiError(401, 'invalid_credentials', 'Wrong e-mail or password') })
    const auth = hooks(['t1', 't2'])
    const err = await createHttp({ auth })
      .request('/api/auth/signin', { method: 'POST', body: {}, schema: z.object({}), auth: false })
      .catch((e: unknown) => e)
    expect(err).toMatchObject({ code: 'invalid_credentials' })
    expect(auth.refreshes).toBe(0)
    expect(server.requests[0]?.headers.Authorization).toBeUndefined()
  })
})
