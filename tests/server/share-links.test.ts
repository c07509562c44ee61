import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { ShareLink } from '../../server/models'
import type { Runtime } from '../../server/runtime'
import { createShareLinkResponseSchema, shareLinkListResponseSchema, sharedScenarioResponseSchema } from '../../shared/schemas/share-link'
import { scenarioResponseSchema } from '../../shared/schemas/scenario'
import { buildUser, startTestServer, waitForMail } from './helpers'
import { createShareBodyCache, type SharedBody } from '../../server/services/share-bodies'
import { buildScenario, buildTeam, content, type Team } from './scenario-helpers'

let runtime: Runtime
let team: Team
beforeAll(async () => {
  runtime = await startTestServer()
  team = await buildTeam(runtime, 'Share lab')
})
afterAll(async () => {
  await runtime.close()
})

const api = () => request(runtime.app)

async function makeLink(body: object = {}, by = team.editor) {
  const s = await buildScenario(runtime, team, { view: { cursor: 12, window: { start: 0, end: 40 }, selected: 3 } })
  const res = await api().post(`/api/workspaces/${team.workspace.id}/scenarios/${s.id}/share-links`).set(by.auth).send(body)
  if (res.status !== 201) throw new Error(JSON.stringify(res.body))
  return { scenario: s, ...createShareLinkResponseSchema.parse(res.body) }
}

describe('share links', () => {
  it('a link carries at least 128 random bits, is shown once, and only its SHA-256 is stored', async () => {
    const { token, url, link } = await makeLink()
    // 32 random bytes as base64url: 43 characters, 256 bits (OWASP asks for at least 128).
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/)
    expect(url).toBe(`http://127.0.0.1:3100/s/${token}`)
    const row = await ShareLink.findByPk(link.id)
    const { createHash } = await import('node:crypto')
    expect(row?.tokenHash).toBe(createHash('sha256').update(token).digest('hex'))
    expect(JSON.stringify(row?.toJSON())).not.toContain(token)
    const list = shareLinkListResponseSchema.parse((await api().get(`/api/workspaces/${team.workspace.id}/scenarios/${link.scenarioId}/share-links`).set(team.owner.auth).expect(200)).body)
    expect(JSON.stringify(list)).not.toContain(token)
  })

  it('an anyone-link opens without signing in at the shared version and view, and counts the opens', async () => {
    const { token, link, scenario } = await makeLink({ view: { cursor: 31, window: { start: 10, end: 60 }, selected: 5 } })
    // A later save does not change what the link shows.
    await api().post(`/api/workspaces/${team.workspace.id}/scenarios/${scenario.id}/versions`).set(team.editor.auth).send({ baseVersion: 1, content: content({ title: 'Later' }) }).expect(201)
    const res = await api().get(`/api/shares/${token}`).expect(200)
    const { share } = sharedScenarioResponseSchema.parse(res.body)
    expect(share).toMatchObject({ version: 1, view: { cursor: 31, window: { start: 10, end: 60 }, selected: 5 }, accessMode: 'anyone', workspace: { name: 'Share lab' }, author: { name: 'Eddie Editor' } })
    expect(share.content).toEqual(scenario.content)
    expect(res.headers['cache-control']).toBe('no-store')
    await api().get(`/api/shares/${token}`).expect(200)
    const row = await ShareLink.findByPk(link.id)
    expect(row?.openCount).toBe(2)
    expect(row?.lastOpenedAt).not.toBeNull()
  })

  it('without a view the link takes the version\'s own view', async () => {
    const { token } = await makeLink()
    const { share } = sharedScenarioResponseSchema.parse((await api().get(`/api/shares/${token}`)).body)
    expect(share.view).toEqual({ cursor: 12, window: { start: 0, end: 40 }, selected: 3 })
  })

  it('a workspace-only link asks strangers to sign in, hides itself from non-members, and opens for members', async () => {
    const { token } = await makeLink({ accessMode: 'workspace' })
    const anon = await api().get(`/api/shares/${token}`)
    expect(anon.status).toBe(401)
    expect(anon.body.error.message).toBe('This share link is for members of its workspace: sign in to open it')
    expect((await api().get(`/api/shares/${token}`).set(team.outsider.auth)).status).toBe(404)
    await api().get(`/api/shares/${token}`).set(team.viewer.auth).expect(200)
  })

  it('an expired link answers 410 share_expired', async () => {
    const { token, link } = await makeLink({ expiresAt: new Date(Date.now() + 60_000).toISOString() })
    await api().get(`/api/shares/${token}`).expect(200)
    await ShareLink.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { id: link.id } })
    const res = await api().get(`/api/shares/${token}`)
    expect(res.status).toBe(410)
    expect(res.body.error.code).toBe('share_expired')
  })

  it('an expiry in the past is refused when making the link', async () => {
    const s = await buildScenario(runtime, team)
    const res = await api().post(`/api/workspaces/${team.workspace.id}/scenarios/${s.id}/share-links`).set(team.editor.auth).send({ expiresAt: '2020-01-01T00:00:00Z' })
    expect(res.status).toBe(400)
    expect(res.body.error.fields.expiresAt).toBe('expiresAt must be in the future')
  })

  it('a revoked link answers 410 share_revoked at once; so does one whose scenario was deleted', async () => {
    const { token, link } = await makeLink()
    await api().get(`/api/shares/${token}`).expect(200)
    const revoked = await api().post(`/api/workspaces/${team.workspace.id}/share-links/${link.id}/revoke`).set(team.owner.auth).expect(200)
    expect(revoked.body.link.status).toBe('revoked')
    const res = await api().get(`/api/shares/${token}`)
    expect(res.status).toBe(410)
    expect(res.body.error).toEqual({ code: 'share_revoked', message: 'This share link was revoked; ask its sender for a new one' })

    const other = await makeLink()
    await api().delete(`/api/workspaces/${team.workspace.id}/scenarios/${other.scenario.id}`).set(team.owner.auth).expect(200)
    expect((await api().get(`/api/shares/${other.token}`)).body.error.code).toBe('share_revoked')
  })

  it('an editor may revoke the links they made, not the ones of others', async () => {
    const byOwner = await makeLink({}, team.owner)
    const denied = await api().post(`/api/workspaces/${team.workspace.id}/share-links/${byOwner.link.id}/revoke`).set(team.editor.auth)
    expect(denied.status).toBe(403)
    const byEditor = await makeLink()
    await api().post(`/api/workspaces/${team.workspace.id}/share-links/${byEditor.link.id}/revoke`).set(team.editor.auth).expect(200)
  })

  it('e-mails the link with a note to several addresses, in plain text and HTML, with a working link', async () => {
    const { token, link } = await makeLink()
    const since = new Date()
    const to = [`reader-a-${link.id}@example.test`, `reader-b-${link.id}@example.test`]
    const res = await api().post(`/api/workspaces/${team.workspace.id}/share-links/${link.id}/email`).set(team.editor.auth).send({ token, to, note: 'Look at cycle 12: <b>bank</b> conflicts.' })
    expect(res.status).toBe(202)
    expect(res.body.sent).toEqual(to)
    for (const address of to) {
      const mail = await waitForMail(address, since)
      expect(mail.subject).toBe('Eddie Editor shared "Saxpy, ragged tail" on Chimeline')
      expect(mail.text).toContain('Look at cycle 12: <b>bank</b> conflicts.')
      expect(mail.html).toContain('Look at cycle 12: &lt;b&gt;bank&lt;/b&gt; conflicts.')
      const sent = /https?:\/\/\S+\/s\/([A-Za-z0-9_-]+)/.exec(mail.text)?.[1]
      expect(sent).toBe(token)
      expect(mail.html).toContain(`/s/${token}`)
      await api().get(`/api/shares/${sent}`).expect(200)
    }
    const wrong = await api().post(`/api/workspaces/${team.workspace.id}/share-links/${link.id}/email`).set(team.editor.auth).send({ token: 'x'.repeat(43), to })
    expect(wrong.status).toBe(400)
    expect(wrong.body.error.fields.token).toBe('This is not the token of this share link')
  })

  it('a signed-in reader copies a shared scenario into their own workspace', async () => {
    const { token, scenario } = await makeLink({ view: { cursor: 7, window: null, selected: null } })
    const reader = await buildUser(runtime, { name: 'Rita Reader' })
    const own = (await api().post('/api/workspaces').set(reader.auth).send({ name: 'Rita lab' }).expect(201)).body.workspace
    const copied = scenarioResponseSchema.parse((await api().post(`/api/workspaces/${own.id}/scenarios/copy-from-share`).set(reader.auth).send({ token }).expect(201)).body).scenario
    expect(copied.workspaceId).toBe(own.id)
    expect(copied.content).toEqual({ ...scenario.content, view: { cursor: 7, window: null, selected: null } })
    expect(copied.author.name).toBe('Rita Reader')
  })
})

describe('the cache of shared versions', () => {
  it('keeps a link\'s version body after the first open and serves the same body from it', async () => {
    const { token, link } = await makeLink()
    expect(runtime.ctx.shareBodies.has(link.id)).toBe(false)
    const first = sharedScenarioResponseSchema.parse((await api().get(`/api/shares/${token}`).expect(200)).body).share
    expect(runtime.ctx.shareBodies.get(link.id)?.content).toEqual(first.content)
    const second = sharedScenarioResponseSchema.parse((await api().get(`/api/shares/${token}`).expect(200)).body).share
    expect(second).toEqual(first)
  })

  it('a revoke takes effect at once for a cached link, through the API and from another process alike', async () => {
    const byApi = await makeLink()
    await api().get(`/api/shares/${byApi.token}`).expect(200)
    await api().post(`/api/workspaces/${team.workspace.id}/share-links/${byApi.link.id}/revoke`).set(team.owner.auth).expect(200)
    expect((await api().get(`/api/shares/${byApi.token}`)).body.error.code).toBe('share_revoked')
    expect(runtime.ctx.shareBodies.has(byApi.link.id)).toBe(false)

    // Another server process revoking writes only the row: this process checks it on every open.
    const elsewhere = await makeLink()
    await api().get(`/api/shares/${elsewhere.token}`).expect(200)
    expect(runtime.ctx.shareBodies.has(elsewhere.link.id)).toBe(true)
    await ShareLink.update({ revokedAt: new Date() }, { where: { id: elsewhere.link.id } })
    expect((await api().get(`/api/shares/${elsewhere.token}`)).body.error.code).toBe('share_revoked')
  })

  it('counts only the opens it allows', async () => {
    const { token, link } = await makeLink({ accessMode: 'workspace' })
    await api().get(`/api/shares/${token}`).expect(401)
    await api().get(`/api/shares/${token}`).set(team.outsider.auth).expect(404)
    await api().get(`/api/shares/${token}`).set(team.viewer.auth).expect(200)
    const row = await ShareLink.findByPk(link.id)
    expect(row?.openCount).toBe(1)
  })

  it('is bounded by entries and by size, dropping the least recently used first', () => {
    const cache = createShareBodyCache({ entries: 2, size: 10_000 })
    const body = (title: string, program = '') => ({ number: 1, message: '', author: { id: null, name: 'A' }, createdAt: new Date(0).toISOString(), content: { ...content({ title, program }), description: '', initialData: [], view: { cursor: null, window: null, selected: null } }, run: { status: 'failed', stage: 'assemble', code: 'x', message: '' } }) as SharedBody
    cache.set('a', body('A'))
    cache.set('b', body('B'))
    cache.get('a')
    cache.set('c', body('C'))
    expect([...cache.keys()].sort()).toEqual(['a', 'c'])
    // One body over the whole size budget is not kept at all.
    cache.set('big', body('Big', 'x'.repeat(20_000)))
    expect(cache.has('big')).toBe(false)
  })
})

describe('token guessing', () => {
  it('an unknown token is a plain 404, a malformed one too', async () => {
    for (const t of ['A'.repeat(43), 'short', `${'z'.repeat(200)}`]) {
      const res = await api().get(`/api/shares/${t}`)
      expect(res.status).toBe(404)
      expect(res.body.error).toEqual({ code: 'not_found', message: 'No such share link' })
    }
  })

  it('tokens that share a long prefix with a real one take no measurably different time than random ones', async () => {
    // The lookup is by SHA-256 of the token through a unique index: a near miss
    // hashes to an unrelated value, so it cannot be found faster or slower.
    const { token } = await makeLink()
    const random = () => Array.from({ length: 43 }, () => 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789-_'[Math.floor(Math.random() * 64)]).join('')
    const near = () => `${token.slice(0, 40)}${random().slice(0, 3)}`
    const time = async (t: string) => {
      const start = process.hrtime.bigint()
      const res = await api().get(`/api/shares/${t}`)
      expect(res.status).toBe(404)
      return Number(process.hrtime.bigint() - start) / 1e6
    }
    for (let i = 0; i < 20; i++) await time(random()) // warm up the JIT and the connection pool
    const a: number[] = []
    const b: number[] = []
    // Interleaved in a random order, so drift on the machine falls on both alike.
    for (let i = 0; i < 100; i++) {
      if (Math.random() < 0.5) {
        a.push(await time(random()))
        b.push(await time(near()))
      } else {
        b.push(await time(near()))
        a.push(await time(random()))
      }
    }
    const median = (xs: number[]) => [...xs].sort((x, y) => x - y)[Math.floor(xs.length / 2)] as number
    // Loopback on 2 shared cores jitters by a millisecond or so; a short-cut on a prefix would differ by a whole query.
    console.info(`share token timing, median ms: random ${median(a).toFixed(2)}, near miss ${median(b).toFixed(2)}`)
    expect(Math.abs(median(a) - median(b))).toBeLessThan(Math.max(1.5, 0.3 * median(a)))
  })
})
