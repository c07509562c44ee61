/**
 * Issue 9, hardening items 7 and 9: sign-out and a password reset end the
 * access token too (its `sid` names a session that is checked per request),
 * and sign-in attempts are limited per account as well as per client
 * address, a lockout the reset e-mail's link lifts. Limiting failed attempts
 * per account is common practice (OWASP Authentication Cheat Sheet, "Account
 * lockout", from memory).
 */
import jwt from 'jsonwebtoken'
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { REFRESH_COOKIE_NAME, authResponseSchema } from '../../shared/schemas/auth'
import type { Runtime } from '../../server/runtime'
import { buildUser, cookieFrom, linkToken, startTestServer, waitForMail, type BuiltUser } from './helpers'

let runtime: Runtime
beforeAll(async () => {
  runtime = await startTestServer({ signInLimit: { perAccount: 3, windowMs: 15 * 60 * 1000 } })
})
afterAll(async () => {
  await runtime.close()
})

const api = () => request(runtime.app)

async function signIn(who: BuiltUser, password = who.password) {
  const res = await api().post('/api/auth/signin').send({ email: who.user.email, password })
  expect(res.status).toBe(200)
  return { access: { Authorization: `Bearer ${authResponseSchema.parse(res.body).accessToken}` }, cookie: (cookieFrom(res.headers['set-cookie'], REFRESH_COOKIE_NAME) as string).split(';')[0] as string }
}

async function resetPassword(who: BuiltUser, password: string) {
  const since = new Date()
  await api().post('/api/auth/forgot').send({ email: who.user.email }).expect(202)
  const token = linkToken((await waitForMail(who.user.email, since)).text, '/reset')
  return api().post('/api/auth/reset').send({ token, password })
}

describe('access tokens end with their session (item 7)', () => {
  it('after sign-out, the access token of that session is refused at once; another session of the same user goes on', async () => {
    const who = await buildUser(runtime)
    const laptop = await signIn(who)
    const phone = await signIn(who)
    await api().get('/api/me').set(laptop.access).expect(200)
    await api().post('/api/auth/signout').set('Cookie', laptop.cookie).expect(204)
    const refused = await api().get('/api/me').set(laptop.access)
    expect(refused.status).toBe(401)
    expect(refused.body.error.code).toBe('unauthenticated')
    await api().get('/api/me').set(phone.access).expect(200)
  })

  it('a refreshed session keeps its sid: the old and the new access token both work until sign-out', async () => {
    const who = await buildUser(runtime)
    const s = await signIn(who)
    const refreshed = await api().post('/api/auth/refresh').set('Cookie', s.cookie).expect(200)
    const newAccess = { Authorization: `Bearer ${refreshed.body.accessToken}` }
    expect((jwt.decode(refreshed.body.accessToken) as { sid: string }).sid).toBe((jwt.decode(s.access.Authorization.slice(7)) as { sid: string }).sid)
    await api().get('/api/me').set(s.access).expect(200)
    const next = (cookieFrom(refreshed.headers['set-cookie'], REFRESH_COOKIE_NAME) as string).split(';')[0] as string
    await api().post('/api/auth/signout').set('Cookie', next).expect(204)
    await api().get('/api/me').set(newAccess).expect(401)
    await api().get('/api/me').set(s.access).expect(401)
  })

  it('a password reset ends every access token of the account', async () => {
    const who = await buildUser(runtime)
    const a = await signIn(who)
    const b = await signIn(who)
    const reset = await resetPassword(who, 'a-brand-new-secret')
    expect(reset.status).toBe(200)
    await api().get('/api/me').set(a.access).expect(401)
    await api().get('/api/me').set(b.access).expect(401)
    await api().get('/api/me').set('Authorization', `Bearer ${reset.body.accessToken}`).expect(200)
  })

  it('a validly signed token without a session id is refused', async () => {
    const who = await buildUser(runtime)
    const token = jwt.sign({}, runtime.ctx.config.jwtSecret, { algorithm: 'HS256', subject: who.user.id, issuer: 'chimeline', audience: 'chimeline-api', expiresIn: 900 })
    await api().get('/api/me').set('Authorization', `Bearer ${token}`).expect(401)
  })
})

describe('sign-in attempts per account (item 9)', () => {
  // The per-address limit is 1,000 in these tests, so every 429 here is the account's.
  it('after the limit of failures, the account answers 429 with Retry-After, even with the right password', async () => {
    const who = await buildUser(runtime)
    for (let i = 0; i < 3; i++) {
      const res = await api().post('/api/auth/signin').send({ email: who.user.email, password: 'wrong-password-here' })
      expect(res.status).toBe(401)
    }
    const locked = await api().post('/api/auth/signin').send({ email: who.user.email, password: who.password })
    expect(locked.status).toBe(429)
    expect(locked.body.error.code).toBe('rate_limited')
    expect(Number(locked.headers['retry-after'])).toBeGreaterThan(0)
    // Another account is not affected.
    await signIn(await buildUser(runtime))
  })

  it('the address in any letter case counts as the same account', async () => {
    const who = await buildUser(runtime)
    for (const email of [who.user.email.toUpperCase(), who.user.email, ` ${who.user.email}`]) {
      await api().post('/api/auth/signin').send({ email, password: 'wrong-password-here' }).expect(401)
    }
    await api().post('/api/auth/signin').send({ email: who.user.email, password: who.password }).expect(429)
  })

  it("the reset e-mail's link lifts the lockout: the new password signs in at once", async () => {
    const who = await buildUser(runtime)
    for (let i = 0; i < 3; i++) await api().post('/api/auth/signin').send({ email: who.user.email, password: 'wrong-password-here' }).expect(401)
    await api().post('/api/auth/signin').send({ email: who.user.email, password: who.password }).expect(429)
    expect((await resetPassword(who, 'a-brand-new-secret')).status).toBe(200)
    await api().post('/api/auth/signin').send({ email: who.user.email, password: 'a-brand-new-secret' }).expect(200)
  })

  it('a successful sign-in clears the failures counted so far', async () => {
    const who = await buildUser(runtime)
    for (let i = 0; i < 2; i++) await api().post('/api/auth/signin').send({ email: who.user.email, password: 'wrong-password-here' }).expect(401)
    await signIn(who)
    for (let i = 0; i < 2; i++) await api().post('/api/auth/signin').send({ email: who.user.email, password: 'wrong-password-here' }).expect(401)
    await signIn(who)
  })
})
