/**
 * Issue 9, hardening item 6: every malformed request seen as a 500 on
 * loopback is a 4xx that names what is wrong and where (the field, the
 * header, the path parameter), and nothing of it is stored.
 * PostgreSQL refuses NUL in text (its documentation, "Character Types": the
 * character with code zero cannot be stored), and a lone UTF-16 surrogate is
 * not a Unicode scalar value (The Unicode Standard, D76), so neither can be
 * written as UTF-8: both are refused at the door.
 */
import http from 'node:http'
import type { AddressInfo } from 'node:net'
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { Scenario } from '../../server/models'
import type { Runtime } from '../../server/runtime'
import { SCENARIO_PROGRAM_MAX_LENGTH } from '../../shared/schemas/scenario'
import { errorBodySchema } from '../../shared/schemas/errors'
import { startTestServer } from './helpers'
import { buildScenario, buildTeam, content, type Team } from './scenario-helpers'

let runtime: Runtime
let team: Team
beforeAll(async () => {
  runtime = await startTestServer()
  team = await buildTeam(runtime, 'Bad input lab')
})
afterAll(async () => {
  await runtime.close()
})

const api = () => request(runtime.app)
const scenarios = () => `/api/workspaces/${team.workspace.id}/scenarios`

describe('NUL and lone surrogates in text are refused, naming the field', () => {
  it.each([
    ['NUL in a title', { content: content({ title: 'Saxpy\u0000tail' }) }, 'content.title'],
    ['NUL in a description', { content: content({ description: 'see\u0000here' }) }, 'content.description'],
    ['NUL in a program', { content: content({ program: '  nop\u0000\n' }) }, 'content.program'],
    ['NUL in a version message', { content: content(), message: 'first\u0000' }, 'message'],
    ['a lone high surrogate in a title', { content: content({ title: 'lane \ud800 chart' }) }, 'content.title'],
    ['a lone low surrogate in a description', { content: content({ description: '\udc00' }) }, 'content.description'],
    ['a lone surrogate in a tag', { content: content({ tags: ['ok', 'x\ud83d'] }) }, 'content.tags.1'],
  ])('%s: 400 naming that field, nothing stored', async (_case, body, field) => {
    const before = await Scenario.count({ where: { workspaceId: team.workspace.id } })
    const res = await api().post(scenarios()).set(team.editor.auth).send(body)
    expect(res.status).toBe(400)
    const { error } = errorBodySchema.parse(res.body)
    expect(error.code).toBe('validation_failed')
    expect(Object.keys(error.fields ?? {})).toEqual([field])
    expect(await Scenario.count({ where: { workspaceId: team.workspace.id } })).toBe(before)
  })

  it('NUL in a short text column (a workspace name) is refused, not stored as the two characters \\0', async () => {
    const res = await api().patch(`/api/workspaces/${team.workspace.id}`).set(team.owner.auth).send({ name: 'Lab\u0000' })
    expect(res.status).toBe(400)
    expect(res.body.error.fields).toEqual({ name: expect.stringContaining('NUL') })
    const read = await api().get(`/api/workspaces/${team.workspace.id}`).set(team.owner.auth).expect(200)
    expect(read.body.workspace.name).toBe('Bad input lab')
  })

  it('a well-formed surrogate pair (an emoji) is accepted', async () => {
    const res = await api().post(scenarios()).set(team.editor.auth).send({ content: content({ title: 'Lanes \ud83d\ude80' }) })
    expect(res.status).toBe(201)
    expect(res.body.scenario.content.title).toBe('Lanes \u{1F680}')
  })

  it('NUL in a query parameter is refused, naming it', async () => {
    const res = await api().get(`${scenarios()}?q=${encodeURIComponent('a\u0000b')}`).set(team.viewer.auth)
    expect(res.status).toBe(400)
    expect(Object.keys(res.body.error.fields)).toEqual(['q'])
  })
})

describe('bodies the server cannot read are 4xx naming the header', () => {
  it('JSON in charset=latin1: 415 naming Content-Type (RFC 8259 section 8.1: JSON is UTF-8)', async () => {
    const res = await api().post('/api/auth/signin').set('Content-Type', 'application/json; charset=latin1').send('{"email":"a@example.test","password":"x"}')
    expect(res.status).toBe(415)
    expect(res.body.error.code).toBe('unsupported_media_type')
    expect(res.body.error.fields).toEqual({ 'Content-Type': expect.stringContaining('utf-8') })
  })

  it('Content-Encoding: compress: 415 naming Content-Encoding', async () => {
    const res = await api().post('/api/auth/signin').set('Content-Type', 'application/json').set('Content-Encoding', 'compress').send('{"email":"a@example.test"}')
    expect(res.status).toBe(415)
    expect(res.body.error.code).toBe('unsupported_media_type')
    expect(res.body.error.fields).toEqual({ 'Content-Encoding': expect.stringContaining('compress') })
  })

  it('multipart without a boundary: 400 naming Content-Type', async () => {
    const res = await api().post(`/api/workspaces/${team.workspace.id}/uploads`).set(team.editor.auth).set('Content-Type', 'multipart/form-data').send('--x\r\n')
    expect(res.status).toBe(400)
    expect(res.body.error.code).toBe('validation_failed')
    expect(Object.keys(res.body.error.fields)).toEqual(['Content-Type'])
  })

  it('a truncated multipart body: 400 naming the file field, nothing stored', async () => {
    const boundary = 'chimeline-boundary'
    const body = `--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="k.s"\r\nContent-Type: text/plain\r\n\r\n  nop\n  no`
    const before = await Scenario.count({ where: { workspaceId: team.workspace.id } })
    const res = await api().post(`/api/workspaces/${team.workspace.id}/uploads`).set(team.editor.auth).set('Content-Type', `multipart/form-data; boundary=${boundary}`).send(body)
    expect(res.status).toBe(400)
    expect(Object.keys(res.body.error.fields)).toEqual(['file'])
    expect(await Scenario.count({ where: { workspaceId: team.workspace.id } })).toBe(before)
  })
})

describe('path parameters', () => {
  /** supertest would re-encode the path: send it raw. */
  async function rawGet(path: string, headers: Record<string, string>): Promise<{ status: number; body: { error: { code: string; message: string; fields?: Record<string, string> } } }> {
    const server = runtime.app.listen(0, '127.0.0.1')
    await new Promise((resolve) => server.once('listening', resolve))
    try {
      const port = (server.address() as AddressInfo).port
      return await new Promise((resolve, reject) => {
        http
          .get({ host: '127.0.0.1', port, path, headers }, (res) => {
            let text = ''
            res.on('data', (c: Buffer) => (text += c.toString('utf8')))
            res.on('end', () => resolve({ status: res.statusCode ?? 0, body: JSON.parse(text) }))
          })
          .on('error', reject)
      })
    } finally {
      server.close()
    }
  }

  it('malformed percent-encoding in a path parameter: 400 naming the path and the bad part (RFC 3986 section 2.1)', async () => {
    const res = await rawGet(`/api/workspaces/${team.workspace.id}/scenarios/%E0%A4%A`, team.viewer.auth)
    expect(res.status).toBe(400)
    expect(res.body.error.code).toBe('validation_failed')
    expect(res.body.error.fields).toEqual({ path: expect.stringContaining('%E0%A4%A') })
  })

  it('malformed percent-encoding in a share token: 400, not a URIError 500', async () => {
    const res = await rawGet('/api/shares/abc%zz', {})
    expect(res.status).toBe(400)
    expect(res.body.error.fields).toEqual({ path: expect.stringContaining('abc%zz') })
  })

  it.each([
    ['a member id', 'patch', (t: Team) => `/api/workspaces/${t.workspace.id}/members/not-a-uuid`, { role: 'viewer' }, 'No such member'],
    ['a member id to remove', 'delete', (t: Team) => `/api/workspaces/${t.workspace.id}/members/1234`, undefined, 'No such member'],
    ['a share link id', 'post', (t: Team) => `/api/workspaces/${t.workspace.id}/share-links/zzz/revoke`, undefined, 'No such share link'],
    ['a scenario id', 'get', (t: Team) => `/api/workspaces/${t.workspace.id}/scenarios/12-34/versions`, undefined, 'No such scenario'],
  ] as const)('a malformed UUID as %s is a 404 naming what was not found', async (_case, method, path, body, message) => {
    const req = api()[method](path(team)).set(team.owner.auth)
    const res = await (body ? req.send(body) : req)
    expect(res.status).toBe(404)
    expect(res.body.error).toEqual({ code: 'not_found', message })
  })
})

describe('imports whose generated program is over the program limit', () => {
  it(`a 40,000-line .s of nop (over ${SCENARIO_PROGRAM_MAX_LENGTH.toLocaleString('en')} characters) is a 400 naming the limit, nothing stored`, async () => {
    const text = '  nop\n'.repeat(40_000)
    const before = await Scenario.count({ where: { workspaceId: team.workspace.id } })
    const tasks = runtime.ctx.work.started
    const res = await api().post(`/api/workspaces/${team.workspace.id}/uploads`).set(team.editor.auth).attach('file', Buffer.from(text), 'many-nops.s')
    // Assembling 40,000 lines is read on the work pool, not on the request thread.
    expect(runtime.ctx.work.started).toBe(tasks + 1)
    expect(res.status).toBe(400)
    expect(res.body.error.code).toBe('invalid_file')
    expect(res.body.error.message).toContain(`${SCENARIO_PROGRAM_MAX_LENGTH.toLocaleString('en')} characters`)
    expect(res.body.error.fields).toEqual({ program: expect.stringContaining('at most') })
    expect(await Scenario.count({ where: { workspaceId: team.workspace.id } })).toBe(before)
  })

  it('a bundle whose text fields carry NUL (as the JSON escape \\u0000) is refused naming the field', async () => {
    const s = await buildScenario(runtime, team)
    const bundle = (await api().post(`${scenarios()}/export`).set(team.viewer.auth).send({ scenarioIds: [s.id] }).expect(200)).body
    bundle.scenarios[0].versions[0].content.title = 'evil\u0000'
    const res = await api().post(`/api/workspaces/${team.workspace.id}/uploads`).set(team.editor.auth).attach('file', Buffer.from(JSON.stringify(bundle)), 'b.json')
    expect(res.status).toBe(400)
    expect(res.body.error.code).toBe('invalid_file')
    expect(Object.keys(res.body.error.fields)).toEqual(['scenarios.0.versions.0.content.title'])
  })
})
