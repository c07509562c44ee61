/**
 * Credentials stay out of the request log (issue 9, hardening 1): a refresh
 * cookie or share token copied from a log must grant nothing. The server logs
 * at `info` into a file here, every share open included, and the test greps
 * the file for every token it handled.
 */
import fs from 'node:fs'
import os from 'node:os'
import path from 'node:path'
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { hashToken } from '../../server/auth/tokens'
import { createLogger } from '../../server/http/request-log'
import type { Runtime } from '../../server/runtime'
import { REFRESH_COOKIE_NAME } from '../../shared/schemas/auth'
import { cookieFrom, linkToken, startTestServer, waitForMail } from './helpers'
import { buildScenario, buildTeam, type Team } from './scenario-helpers'

const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'chimeline-log-'))
const logFile = path.join(dir, 'logs', 'app.log')
const clientDir = path.join(dir, 'dist')
fs.mkdirSync(clientDir)
fs.writeFileSync(path.join(clientDir, 'index.html'), '<!doctype html><title>Chimeline shell</title>')
// A log file left readable by everyone (say, by an older version) is closed to others on start.
fs.mkdirSync(path.dirname(logFile))
fs.writeFileSync(logFile, '', { mode: 0o644 })
fs.chmodSync(logFile, 0o644)

let runtime: Runtime
let team: Team
beforeAll(async () => {
  runtime = await startTestServer({ logLevel: 'info', logFile, shareOpenLogEvery: 1, clientDir })
  team = await buildTeam(runtime, 'Log lab')
})
afterAll(async () => {
  await runtime.close()
  fs.rmSync(dir, { recursive: true, force: true })
})

/**
 * The log once it holds `last`: a request's line is written when its answer
 * has gone out, which may be just after the client has it; then the
 * asynchronous writer is flushed.
 */
const logWith = async (last: string) => {
  for (let i = 0; ; i++) {
    await new Promise<void>((resolve, reject) => runtime.ctx.logger.flush((err) => (err ? reject(err) : resolve())))
    const text = fs.readFileSync(logFile, 'utf8')
    if (text.includes(last) || i === 100) return text
    await new Promise((resolve) => setTimeout(resolve, 50))
  }
}
const cookieValue = (setCookie: string[] | string | undefined) => (cookieFrom(setCookie, REFRESH_COOKIE_NAME) as string).split(';')[0]?.split('=')[1] as string

describe('the request log', () => {
  it('holds no access token, refresh cookie, share, reset or invitation token, only short hash prefixes of URL tokens', async () => {
    const api = () => request(runtime.app)
    const secrets: string[] = []
    const { user, password } = team.viewer

    // Sign in, use the access token, refresh with the cookie.
    const signIn = await api().post('/api/auth/signin').send({ email: user.email, password }).expect(200)
    const access = signIn.body.accessToken as string
    const refresh = cookieValue(signIn.headers['set-cookie'])
    secrets.push(access, refresh)
    await api().get('/api/me').set('Authorization', `Bearer ${access}`).expect(200)
    const refreshed = await api().post('/api/auth/refresh').set('Cookie', `${REFRESH_COOKIE_NAME}=${refresh}`).expect(200)
    secrets.push(refreshed.body.accessToken as string, cookieValue(refreshed.headers['set-cookie']))

    // A share link: its page, its API call (with the page as Referer), through the app and the fast path.
    const s = await buildScenario(runtime, team)
    const made = await api().post(`/api/workspaces/${team.workspace.id}/scenarios/${s.id}/share-links`).set(team.editor.auth).send({}).expect(201)
    const share = made.body.token as string
    secrets.push(share)
    await api().get(`/s/${share}`).expect(200)
    await api().get(`/api/shares/${share}`).set('Referer', `http://127.0.0.1:3100/s/${share}`).expect(200)
    await request(runtime.handler).get(`/api/shares/${share}`).expect(200)

    // A reset link: the page, then the reset itself.
    const since = new Date()
    await api().post('/api/auth/forgot').send({ email: user.email }).expect(202)
    const reset = linkToken((await waitForMail(user.email, since)).text, '/reset')
    secrets.push(reset)
    await api().get(`/reset?token=${reset}`).expect(200)
    const afterReset = await api().post('/api/auth/reset').send({ token: reset, password: 'a-brand-new-secret' }).expect(200)
    secrets.push(afterReset.body.accessToken as string, cookieValue(afterReset.headers['set-cookie']))

    // An invitation link's page.
    const invite = 'x'.repeat(20) + 'InviteTokenValue'
    secrets.push(invite)
    await api().get(`/invite?token=${invite}&from=mail`).expect(200)

    const log = await logWith('"url":"/invite?token=')
    for (const secret of secrets) {
      expect(secret.length).toBeGreaterThan(20)
      expect(log).not.toContain(secret)
    }
    // The lines are there, with the token replaced by the first 8 hex digits of its SHA-256 (what the database keys).
    const tag = `~${hashToken(share).slice(0, 8)}`
    expect(log).toContain(`"url":"/s/${tag}"`)
    expect(log).toContain(`"url":"/api/shares/${tag}"`)
    expect(log).toContain(`"referer":"http://127.0.0.1:3100/s/${tag}"`)
    expect(log).toContain(`"url":"/reset?token=~${hashToken(reset).slice(0, 8)}"`)
    expect(log).toContain(`"url":"/invite?token=~${hashToken(invite).slice(0, 8)}&from=mail"`)
    expect(log).toContain('"authorization":"[Redacted]"')
    expect(log).toContain('"cookie":"[Redacted]"')
    expect(log).toContain('"set-cookie":"[Redacted]"')
  })

  it('is a file only its owner can read or write; a folder made for it only its owner can enter', () => {
    // The folder above existed already (it could be /var/log): left as it was.
    expect(fs.statSync(logFile).mode & 0o777).toBe(0o600)
    const fresh = path.join(dir, 'new', 'deeper', 'app.log')
    const logger = createLogger({ logLevel: 'info', logFile: fresh })
    logger.info('hello')
    expect(fs.statSync(fresh).mode & 0o777).toBe(0o600)
    expect(fs.statSync(path.dirname(fresh)).mode & 0o777).toBe(0o700)
  })
})
