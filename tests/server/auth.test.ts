import request from 'supertest'
import jwt from 'jsonwebtoken'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { REFRESH_COOKIE_NAME, authResponseSchema, refreshResponseSchema } from '../../shared/schemas/auth'
import { errorBodySchema } from '../../shared/schemas/errors'
import { meResponseSchema } from '../../shared/schemas/workspace'
import { PasswordReset, RefreshToken, User } from '../../server/models'
import type { Runtime } from '../../server/runtime'
import { buildUser, cookieFrom, linkToken, startTestServer, uniqueEmail, waitForMail } from './helpers'

let runtime: Runtime
beforeAll(async () => {
  runtime = await startTestServer()
})
afterAll(async () => {
  await runtime.close()
})

const api = () => request(runtime.app)

describe('sign-up', () => {
  it('creates a member, answers 201 with the user and an access token, and sets the refresh cookie', async () => {
    const email = uniqueEmail('signup')
    const res = await api().post('/api/auth/signup').send({ email: `  ${email.toUpperCase()} `, name: ' Lane Walker ', password: 'long-enough-pw' })
    expect(res.status).toBe(201)
    const body = authResponseSchema.parse(res.body)
    expect(body.user).toMatchObject({ email, name: 'Lane Walker', role: 'member' })
    const cookie = cookieFrom(res.headers['set-cookie'], REFRESH_COOKIE_NAME)
    // Contract: httpOnly, SameSite=Strict, path /api/auth, 7 days.
    expect(cookie).toMatch(/HttpOnly/)
    expect(cookie).toMatch(/SameSite=Strict/)
    expect(cookie).toMatch(/Path=\/api\/auth/)
    expect(cookie).toMatch(/Max-Age=604800/)
    const me = await api().get('/api/me').set('Authorization', `Bearer ${body.accessToken}`)
    // Sign-up makes a personal workspace owned by the new user, so Save and Share work at once.
    expect(meResponseSchema.parse(me.body)).toEqual({ user: body.user, workspaces: [{ id: expect.any(String), name: "Lane Walker's workspace", role: 'owner', defaultPreset: 'default-8' }] })
  })

  it('stores an argon2id hash, never the password', async () => {
    const email = uniqueEmail('hash')
    await api().post('/api/auth/signup').send({ email, name: 'H', password: 'long-enough-pw' }).expect(201)
    const user = await User.findOne({ where: { email } })
    expect(user?.passwordHash).toMatch(/^\$argon2id\$/)
    expect(user?.passwordHash).not.toContain('long-enough-pw')
  })

  it('refuses an e-mail address that has an account with 409', async () => {
    const { user } = await buildUser(runtime)
    const res = await api().post('/api/auth/signup').send({ email: user.email, name: 'Again', password: 'long-enough-pw' })
    expect(res.status).toBe(409)
    expect(errorBodySchema.parse(res.body).error).toMatchObject({ code: 'conflict', fields: { email: 'This e-mail address is taken' } })
  })

  it.each([
    ['shorter than 10 characters', 'short', 'A password has at least 10 characters'],
    ['longer than 128 characters', 'x'.repeat(129), 'A password has at most 128 characters'],
    ['equal to the e-mail address', 'password-rules@example.test', 'The password must not be your e-mail address'],
    ['equal to the local part of the address', 'PASSWORD-RULES', 'The password must not be your e-mail address'],
  ])('rejects a password %s', async (_case, password, message) => {
    const res = await api().post('/api/auth/signup').send({ email: 'password-rules@example.test', name: 'P', password })
    expect(res.status).toBe(400)
    expect(res.body.error).toMatchObject({ code: 'validation_failed', fields: { password: message } })
  })
})

describe('sign-in', () => {
  it('signs in with the right password, case-insensitively on the e-mail', async () => {
    const { user, password } = await buildUser(runtime)
    const res = await api().post('/api/auth/signin').send({ email: user.email.toUpperCase(), password })
    expect(res.status).toBe(200)
    expect(authResponseSchema.parse(res.body).user.id).toBe(user.id)
    expect(cookieFrom(res.headers['set-cookie'], REFRESH_COOKIE_NAME)).toBeDefined()
  })

  it('answers a wrong password and an unknown e-mail with the same generic 401', async () => {
    const { user } = await buildUser(runtime)
    const wrong = await api().post('/api/auth/signin').send({ email: user.email, password: 'not-the-password' })
    const unknown = await api().post('/api/auth/signin').send({ email: uniqueEmail('nobody'), password: 'not-the-password' })
    expect(wrong.status).toBe(401)
    expect(unknown.status).toBe(401)
    expect(wrong.body).toEqual(unknown.body)
    expect(wrong.body.error).toEqual({ code: 'invalid_credentials', message: 'The e-mail address or password is not correct' })
    expect(cookieFrom(wrong.headers['set-cookie'], REFRESH_COOKIE_NAME)).toBeUndefined()
  })

  it.each([
    ['no token', undefined],
    ['a token signed with another secret', jwt.sign({}, 'another-secret-another-secret-another', { subject: crypto.randomUUID(), issuer: 'chimeline', audience: 'chimeline-api' })],
    ['garbage', 'not.a.jwt'],
  ])('refuses /api/me with %s', async (_case, token) => {
    const req = api().get('/api/me')
    const res = await (token ? req.set('Authorization', `Bearer ${token}`) : req)
    expect(res.status).toBe(401)
    expect(res.body.error.code).toBe('unauthenticated')
  })

  it('refuses an access token older than its 15 minutes', async () => {
    const { user } = await buildUser(runtime)
    const expired = jwt.sign({ exp: Math.floor(Date.now() / 1000) - 1 }, runtime.ctx.config.jwtSecret, {
      subject: user.id,
      issuer: 'chimeline',
      audience: 'chimeline-api',
    })
    const res = await api().get('/api/me').set('Authorization', `Bearer ${expired}`)
    expect(res.status).toBe(401)
  })

  it('issues access tokens that expire after 15 minutes (the contract)', async () => {
    const { user, password } = await buildUser(runtime)
    const res = await api().post('/api/auth/signin').send({ email: user.email, password })
    const claims = jwt.decode(res.body.accessToken) as { iat: number; exp: number }
    expect(claims.exp - claims.iat).toBe(15 * 60)
  })
})

describe('lock-out by rate limit', () => {
  it('answers 429 after the allowed attempts, even with the right password', async () => {
    const strict = await startTestServer({ authRateLimit: { max: 3, windowMs: 60_000 } }, runtime)
    try {
      const { user, password } = await buildUser(strict)
      for (let i = 0; i < 3; i++) {
        await request(strict.app).post('/api/auth/signin').send({ email: user.email, password: 'wrong-password' }).expect(401)
      }
      const locked = await request(strict.app).post('/api/auth/signin').send({ email: user.email, password })
      expect(locked.status).toBe(429)
      expect(locked.body.error.code).toBe('rate_limited')
      expect(locked.body.error.message).toMatch(/Too many attempts; try again in 1 minute/)
      expect(locked.headers['ratelimit-policy']).toBeDefined()
    } finally {
      await strict.close()
    }
  })

  it.each(['/api/auth/signup', '/api/auth/forgot', '/api/auth/reset'])('limits %s too', async (path) => {
    const strict = await startTestServer({ authRateLimit: { max: 1, windowMs: 60_000 } }, runtime)
    try {
      await request(strict.app).post(path).send({})
      const res = await request(strict.app).post(path).send({})
      expect(res.status).toBe(429)
    } finally {
      await strict.close()
    }
  })
})

describe('refresh and sign-out', () => {
  async function signIn() {
    const { user, password } = await buildUser(runtime)
    const res = await api().post('/api/auth/signin').send({ email: user.email, password }).expect(200)
    const cookie = cookieFrom(res.headers['set-cookie'], REFRESH_COOKIE_NAME) as string
    return { user, cookie: cookie.split(';')[0] as string }
  }

  it('rotates the refresh cookie and answers with a new access token', async () => {
    const { user, cookie } = await signIn()
    const res = await api().post('/api/auth/refresh').set('Cookie', cookie)
    expect(res.status).toBe(200)
    expect(authResponseSchema.parse(res.body).user.id).toBe(user.id)
    const next = (cookieFrom(res.headers['set-cookie'], REFRESH_COOKIE_NAME) as string).split(';')[0]
    expect(next).not.toBe(cookie)
    await api().get('/api/me').set('Authorization', `Bearer ${res.body.accessToken}`).expect(200)
    await api().post('/api/auth/refresh').set('Cookie', next as string).expect(200)
  })

  it('treats a reused refresh token as stolen and ends the whole session', async () => {
    const { cookie } = await signIn()
    const first = await api().post('/api/auth/refresh').set('Cookie', cookie).expect(200)
    const next = (cookieFrom(first.headers['set-cookie'], REFRESH_COOKIE_NAME) as string).split(';')[0] as string
    await api().post('/api/auth/refresh').set('Cookie', cookie).expect(401)
    // The legitimate successor is revoked with its family.
    await api().post('/api/auth/refresh').set('Cookie', next).expect(401)
  })

  it('answers a refresh without any cookie with 200 and no user (signed out is no error), setting no cookie', async () => {
    const res = await api().post('/api/auth/refresh')
    expect(res.status).toBe(200)
    expect(refreshResponseSchema.parse(res.body)).toEqual({ user: null })
    expect(cookieFrom(res.headers['set-cookie'], REFRESH_COOKIE_NAME)).toBeUndefined()
  })

  it.each([
    ['an unknown token', `${REFRESH_COOKIE_NAME}=not-a-token-we-issued`],
    ['an empty value', `${REFRESH_COOKIE_NAME}=`],
  ])('still refuses a refresh cookie that is present but invalid (%s) with 401', async (_what, cookie) => {
    const res = await api().post('/api/auth/refresh').set('Cookie', cookie)
    expect(res.status).toBe(401)
    expect(res.body.error.code).toBe('unauthenticated')
  })

  it('refuses an expired refresh cookie with 401', async () => {
    const { user, cookie } = await signIn()
    await RefreshToken.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { userId: user.id } })
    await api().post('/api/auth/refresh').set('Cookie', cookie).expect(401)
  })

  it('signs out with 204, clears the cookie and revokes the refresh token', async () => {
    const { user, cookie } = await signIn()
    const res = await api().post('/api/auth/signout').set('Cookie', cookie)
    expect(res.status).toBe(204)
    expect(cookieFrom(res.headers['set-cookie'], REFRESH_COOKIE_NAME)).toMatch(/Expires=Thu, 01 Jan 1970/)
    await api().post('/api/auth/refresh').set('Cookie', cookie).expect(401)
    expect(await RefreshToken.count({ where: { userId: user.id, revokedAt: null } })).toBe(0)
  })
})

describe('password reset by e-mail', () => {
  it('e-mails a one-time link; following it sets the new password and ends old sessions', async () => {
    const { user, password } = await buildUser(runtime, { name: 'Rita Reset' })
    const old = await api().post('/api/auth/signin').send({ email: user.email, password }).expect(200)
    const oldCookie = (cookieFrom(old.headers['set-cookie'], REFRESH_COOKIE_NAME) as string).split(';')[0] as string

    const since = new Date()
    await api().post('/api/auth/forgot').send({ email: user.email }).expect(202)
    const mail = await waitForMail(user.email, since)
    expect(mail.subject).toBe('Reset your Chimeline password')
    expect(mail.text).toContain('Hello Rita Reset')
    expect(mail.html).toContain('/reset?token=')
    const token = linkToken(mail.text, '/reset')
    // Only the hash is stored.
    expect(await PasswordReset.count({ where: { tokenHash: token } })).toBe(0)

    const reset = await api().post('/api/auth/reset').send({ token, password: 'a-brand-new-secret' })
    expect(reset.status).toBe(200)
    expect(authResponseSchema.parse(reset.body).user.id).toBe(user.id)

    await api().post('/api/auth/signin').send({ email: user.email, password }).expect(401)
    await api().post('/api/auth/signin').send({ email: user.email, password: 'a-brand-new-secret' }).expect(200)
    await api().post('/api/auth/refresh').set('Cookie', oldCookie).expect(401)

    const again = await api().post('/api/auth/reset').send({ token, password: 'yet-another-secret' })
    expect(again.status).toBe(400)
    expect(again.body.error).toEqual({ code: 'invalid_token', message: 'This password reset link is invalid or has expired' })
  })

  it('answers 202 for an unknown address and sends nothing', async () => {
    const email = uniqueEmail('ghost')
    const since = new Date()
    const res = await api().post('/api/auth/forgot').send({ email })
    expect(res.status).toBe(202)
    await expect(waitForMail(email, since, 500)).rejects.toThrow(/no e-mail/)
  })

  it('refuses an expired link', async () => {
    const { user } = await buildUser(runtime)
    const since = new Date()
    await api().post('/api/auth/forgot').send({ email: user.email }).expect(202)
    const token = linkToken((await waitForMail(user.email, since)).text, '/reset')
    await PasswordReset.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { userId: user.id } })
    await api().post('/api/auth/reset').send({ token, password: 'a-brand-new-secret' }).expect(400)
  })

  it('refuses the e-mail address as the new password and keeps the link usable', async () => {
    const { user } = await buildUser(runtime)
    const since = new Date()
    await api().post('/api/auth/forgot').send({ email: user.email }).expect(202)
    const token = linkToken((await waitForMail(user.email, since)).text, '/reset')
    const res = await api().post('/api/auth/reset').send({ token, password: user.email })
    expect(res.status).toBe(400)
    expect(res.body.error.fields).toEqual({ password: 'The password must not be your e-mail address' })
    await api().post('/api/auth/reset').send({ token, password: 'a-brand-new-secret' }).expect(200)
  })
})
