/**
 * Issue 9, hardening 10: no cache keeps an answer that carries a token
 * (RFC 9111 5.2.2.5 no-store); no HSTS header over plain http (RFC 6797 7.2:
 * a host must not send it over non-secure transport).
 */
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Runtime } from '../../server/runtime'
import { REFRESH_COOKIE_NAME } from '../../shared/schemas/auth'
import { cookieFrom, startTestServer } from './helpers'
import { buildScenario, buildTeam, type Team } from './scenario-helpers'

let runtime: Runtime
let overHttps: Runtime
let team: Team
beforeAll(async () => {
  runtime = await startTestServer()
  overHttps = await startTestServer({ publicUrl: 'https://chimeline.example.org' }, runtime)
  team = await buildTeam(runtime, 'Header lab')
})
afterAll(async () => {
  await overHttps.close()
  await runtime.close()
})

describe('answers that carry a token', () => {
  it('sign-in, refresh, a new share link and every other API answer are Cache-Control: no-store', async () => {
    const api = () => request(runtime.app)
    const signIn = await api().post('/api/auth/signin').send({ email: team.owner.user.email, password: team.owner.password }).expect(200)
    expect(signIn.headers['cache-control']).toBe('no-store')
    const cookie = (cookieFrom(signIn.headers['set-cookie'], REFRESH_COOKIE_NAME) as string).split(';')[0] as string
    const refreshed = await api().post('/api/auth/refresh').set('Cookie', cookie).expect(200)
    expect(refreshed.headers['cache-control']).toBe('no-store')
    const s = await buildScenario(runtime, team)
    const link = await api().post(`/api/workspaces/${team.workspace.id}/scenarios/${s.id}/share-links`).set(team.owner.auth).send({}).expect(201)
    expect(link.body.token).toBeTruthy()
    expect(link.headers['cache-control']).toBe('no-store')
    for (const res of [await api().get('/api/me').set(team.owner.auth), await api().get('/api/no-such-route'), await api().post('/api/auth/signin').send({})]) {
      expect(res.headers['cache-control']).toBe('no-store')
    }
  })
})

describe('Strict-Transport-Security', () => {
  it('is not sent when the app is served over plain http', async () => {
    const res = await request(runtime.app).get('/api/health')
    expect(res.headers['strict-transport-security']).toBeUndefined()
  })

  it('is sent when PUBLIC_URL is https', async () => {
    const res = await request(overHttps.app).get('/api/health')
    expect(res.headers['strict-transport-security']).toMatch(/^max-age=\d+/)
  })
})
