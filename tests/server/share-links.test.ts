import crypto from 'node:crypto'
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { ShareLink } from '../../server/models'
import { ShareOpens } from '../../server/services/share-links-open'
import { listenForShareLinkChanges } from '../../server/services/share-links-notify'
import { securityHeaders } from '../../server/app'
import { withShareFastOpen } from '../../server/routes/shares/fast-open'
import type { Runtime } from '../../server/runtime'
import { createShareLinkResponseSchema, shareLinkListResponseSchema, sharedScenarioResponseSchema } from '../../shared/schemas/share-link'
import { scenarioResponseSchema } from '../../shared/schemas/scenario'
import { buildUser, startTestServer, waitForMail } from './helpers'
import { buildScenario, buildTeam, content, type Team } from './scenario-helpers'

let runtime: Runtime
let team: Team
beforeAll(async () => {
  // No timer: counts are written when a test flushes them (or at close).
  runtime = await startTestServer({ shareCountFlushMs: 0 })
  team = await buildTeam(runtime, 'Share lab')
})
afterAll(async () => {
  await runtime.close()
})

const api = () => request(runtime.app)

/** A change made straight in the database reaches this process as a notice; wait for it. */
async function untilDropped(token: string) {
  for (let i = 0; i < 200 && runtime.ctx.shares.cached(token); i++) await new Promise((resolve) => setTimeout(resolve, 10))
}

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
    await api().get(`/api/shares/${token}`).expect(200)
    // No write per open: the counts wait in memory for the next flush.
    expect((await ShareLink.findByPk(link.id))?.openCount).toBe(0)
    await runtime.ctx.shares.counts.flush()
    const row = await ShareLink.findByPk(link.id)
    expect(row?.openCount).toBe(2)
    expect(row?.lastOpenedAt).not.toBeNull()
  })

  it('the owner sees the right open counts after a flush, from several readers, and a flush keeps the cache', async () => {
    const { token, link, scenario } = await makeLink()
    const list = async () => shareLinkListResponseSchema.parse((await api().get(`/api/workspaces/${team.workspace.id}/scenarios/${scenario.id}/share-links`).set(team.owner.auth).expect(200)).body).links
    await Promise.all(Array.from({ length: 25 }, () => api().get(`/api/shares/${token}`).expect(200)))
    await runtime.ctx.shares.counts.flush()
    expect(runtime.ctx.shares.cached(token)).toBe(true)
    await api().get(`/api/shares/${token}`).set(team.outsider.auth).expect(200)
    await api().get(`/api/shares/${token}`).expect(200)
    const before = (await list()).find((l) => l.id === link.id)
    expect(before?.openCount).toBe(25)
    await runtime.ctx.shares.counts.flush()
    const after = (await list()).find((l) => l.id === link.id)
    expect(after?.openCount).toBe(27)
    expect(Date.parse(after?.lastOpenedAt ?? '')).toBeGreaterThanOrEqual(Date.parse(before?.lastOpenedAt ?? ''))
  })

  it('an anyone-link answer names no user, workspace or scenario id, and is the same for every reader', async () => {
    const { token, scenario, link } = await makeLink()
    const anon = await api().get(`/api/shares/${token}`).expect(200)
    const member = await api().get(`/api/shares/${token}`).set(team.owner.auth).expect(200)
    expect(member.text).toBe(anon.text)
    for (const id of [team.workspace.id, team.owner.user.id, team.editor.user.id, scenario.id, link.id]) expect(anon.text).not.toContain(id)
    expect(Object.keys(anon.body.share.author)).toEqual(['name'])
    expect(anon.body.share.workspace).toEqual({ name: 'Share lab' })
  })

  it('a reload revalidates: the same ETag answers 304 without a body, and a revoked link 410 despite it', async () => {
    const { token, link } = await makeLink()
    const first = await api().get(`/api/shares/${token}`).expect(200)
    const etag = first.headers.etag as string
    expect(etag).toMatch(/^"[A-Za-z0-9_-]+"$/)
    // RFC 9111 5.2.2.4: no-cache lets the browser keep it but not use it unchecked; private keeps it out of shared caches.
    expect(first.headers['cache-control']).toBe('private, no-cache')
    const again = await api().get(`/api/shares/${token}`).set('If-None-Match', etag)
    expect(again.status).toBe(304)
    expect(again.text ?? '').toBe('')
    expect((await api().get(`/api/shares/${token}`).set('If-None-Match', '"something-else"')).status).toBe(200)
    await api().post(`/api/workspaces/${team.workspace.id}/share-links/${link.id}/revoke`).set(team.owner.auth).expect(200)
    expect((await api().get(`/api/shares/${token}`).set('If-None-Match', etag)).status).toBe(410)
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
    await untilDropped(token)
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

describe('the cache of opened links', () => {
  it('keeps a link after its first open and answers warm opens without a database query', async () => {
    const { token } = await makeLink()
    expect(runtime.ctx.shares.cached(token)).toBe(false)
    const first = (await api().get(`/api/shares/${token}`).expect(200)).text
    expect(runtime.ctx.shares.cached(token)).toBe(true)
    let queries = 0
    const count = () => {
      queries++
    }
    runtime.ctx.sequelize.addHook('beforeQuery', 'count-share-queries', count)
    try {
      for (let i = 0; i < 5; i++) expect((await api().get(`/api/shares/${token}`).expect(200)).text).toBe(first)
    } finally {
      runtime.ctx.sequelize.removeHook('beforeQuery', 'count-share-queries')
    }
    expect(queries).toBe(0)
  })

  it('a revoke takes effect at once for a cached link, through the API and from a change made straight in the database', async () => {
    const byApi = await makeLink()
    await api().get(`/api/shares/${byApi.token}`).expect(200)
    await api().post(`/api/workspaces/${team.workspace.id}/share-links/${byApi.link.id}/revoke`).set(team.owner.auth).expect(200)
    expect((await api().get(`/api/shares/${byApi.token}`)).body.error.code).toBe('share_revoked')

    // psql, a script or another process writes only the row: the table's trigger notifies every process.
    const elsewhere = await makeLink()
    await api().get(`/api/shares/${elsewhere.token}`).expect(200)
    expect(runtime.ctx.shares.cached(elsewhere.token)).toBe(true)
    await ShareLink.update({ revokedAt: new Date() }, { where: { id: elsewhere.link.id } })
    await untilDropped(elsewhere.token)
    expect((await api().get(`/api/shares/${elsewhere.token}`)).body.error.code).toBe('share_revoked')
  })

  it('deleting the scenario closes its cached links, and undoing the delete opens them again', async () => {
    const { token, scenario } = await makeLink()
    await api().get(`/api/shares/${token}`).expect(200)
    await api().delete(`/api/workspaces/${team.workspace.id}/scenarios/${scenario.id}`).set(team.owner.auth).expect(200)
    await untilDropped(token)
    expect((await api().get(`/api/shares/${token}`)).status).toBe(410)
    await api().post(`/api/workspaces/${team.workspace.id}/scenarios/${scenario.id}/undo-delete`).set(team.owner.auth).expect(200)
    await untilDropped(token)
    await api().get(`/api/shares/${token}`).expect(200)
  })

  it('caches nothing while its notice connection is lost, so a revoke then still shows; caches again once it is back', async () => {
    const opens = new ShareOpens(runtime.ctx.sequelize, runtime.ctx.shares.counts)
    const name = `chimeline test notices ${crypto.randomUUID()}`
    const listener = await listenForShareLinkChanges(runtime.ctx.config.databaseUrl, opens, runtime.ctx.logger, name)
    const until = async (what: () => boolean) => {
      for (let i = 0; i < 500 && !what(); i++) await new Promise((resolve) => setTimeout(resolve, 20))
      expect(what()).toBe(true)
    }
    try {
      const { token, link } = await makeLink()
      await opens.open(token, null)
      expect(opens.cached(token)).toBe(true)
      // The database ends the connection (a restart, a network cut, an administrator).
      await runtime.ctx.sequelize.query('SELECT pg_terminate_backend(pid) FROM pg_stat_activity WHERE application_name = $1', { bind: [name] })
      await until(() => !opens.isListening())
      expect(opens.cached(token)).toBe(false)
      await opens.open(token, null)
      expect(opens.cached(token)).toBe(false)
      await ShareLink.update({ revokedAt: new Date() }, { where: { id: link.id } })
      await expect(opens.open(token, null)).rejects.toMatchObject({ status: 410, code: 'share_revoked' })
      // It reconnects by itself and caches again.
      await until(() => opens.isListening())
      const other = await makeLink()
      await opens.open(other.token, null)
      expect(opens.cached(other.token)).toBe(true)
    } finally {
      await listener.close()
    }
  })

  it('counts only the opens it allows', async () => {
    const { token, link } = await makeLink({ accessMode: 'workspace' })
    await api().get(`/api/shares/${token}`).expect(401)
    await api().get(`/api/shares/${token}`).set(team.outsider.auth).expect(404)
    await api().get(`/api/shares/${token}`).set(team.viewer.auth).expect(200)
    await runtime.ctx.shares.counts.flush()
    const row = await ShareLink.findByPk(link.id)
    expect(row?.openCount).toBe(1)
  })

  it('is bounded by entries and by size, dropping the least recently used first', async () => {
    const small = new ShareOpens(runtime.ctx.sequelize, runtime.ctx.shares.counts, { entries: 2, size: 1_000_000 })
    small.setListening(true)
    const links = [await makeLink(), await makeLink(), await makeLink()]
    await small.open(links[0]!.token, null)
    await small.open(links[1]!.token, null)
    await small.open(links[0]!.token, null)
    await small.open(links[2]!.token, null)
    expect(links.map((l) => small.cached(l.token))).toEqual([true, false, true])
    // A body over the whole size budget is served but not kept.
    const tiny = new ShareOpens(runtime.ctx.sequelize, runtime.ctx.shares.counts, { entries: 10, size: 100 })
    tiny.setListening(true)
    await tiny.open(links[0]!.token, null)
    expect(tiny.cached(links[0]!.token)).toBe(false)
  })
})

describe('the fast path of warm opens', () => {
  /** The same listener as runtime.handler, over a stand-in app that marks what reached it. */
  const fastOnly = () => withShareFastOpen(runtime.ctx, (_req, res) => res.writeHead(599).end(), securityHeaders(runtime.ctx))
  const comparable = (headers: Record<string, string>) => {
    const { date: _date, connection: _connection, 'keep-alive': _keepAlive, ...rest } = headers
    return rest
  }

  it('answers a warm anyone-link as the full route does: same body and headers, 304 alike', async () => {
    const { token, link } = await makeLink()
    const full = await api().get(`/api/shares/${token}`).expect(200)
    const fast = await request(fastOnly()).get(`/api/shares/${token}`)
    expect(fast.status).toBe(200)
    expect(fast.text).toBe(full.text)
    expect(comparable(fast.headers)).toEqual(comparable(full.headers))
    const fullNotModified = await api().get(`/api/shares/${token}`).set('If-None-Match', full.headers.etag as string).expect(304)
    const fastNotModified = await request(fastOnly()).get(`/api/shares/${token}`).set('If-None-Match', full.headers.etag as string)
    expect(fastNotModified.status).toBe(304)
    expect(comparable(fastNotModified.headers)).toEqual(comparable(fullNotModified.headers))
    await runtime.ctx.shares.counts.flush()
    expect((await ShareLink.findByPk(link.id))?.openCount).toBe(4)
  })

  it('leaves everything else to the app: cold, unknown, revoked, workspace links, a reader with a token, HEAD, another ETag', async () => {
    const warm = await makeLink()
    const cold = await makeLink()
    const members = await makeLink({ accessMode: 'workspace' })
    await api().get(`/api/shares/${warm.token}`).expect(200)
    await api().get(`/api/shares/${members.token}`).set(team.viewer.auth).expect(200)
    const reachesApp = async (r: request.Test) => expect((await r).status).toBe(599)
    await reachesApp(request(fastOnly()).get(`/api/shares/${cold.token}`))
    await reachesApp(request(fastOnly()).get(`/api/shares/${'A'.repeat(43)}`))
    await reachesApp(request(fastOnly()).get(`/api/shares/${members.token}`).set(team.viewer.auth))
    await reachesApp(request(fastOnly()).get(`/api/shares/${warm.token}`).set(team.viewer.auth))
    await reachesApp(request(fastOnly()).head(`/api/shares/${warm.token}`))
    await reachesApp(request(fastOnly()).get(`/api/shares/${warm.token}`).set('If-None-Match', '"other"'))
    await reachesApp(request(fastOnly()).get(`/api/shares/${warm.token}/more`))
    await api().post(`/api/workspaces/${team.workspace.id}/share-links/${warm.link.id}/revoke`).set(team.owner.auth).expect(200)
    await reachesApp(request(fastOnly()).get(`/api/shares/${warm.token}`))
    // Through the real listener, the app then answers as before.
    expect((await request(runtime.handler).get(`/api/shares/${warm.token}`)).status).toBe(410)
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
})
