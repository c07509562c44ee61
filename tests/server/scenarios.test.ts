import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Runtime } from '../../server/runtime'
import { ScenarioVersion } from '../../server/models'
import { saveConflictBodySchema, savedScenarioResponseSchema, scenarioListResponseSchema, scenarioResponseSchema, versionDiffResponseSchema, versionListResponseSchema } from '../../shared/schemas/scenario'
import { startTestServer } from './helpers'
import { buildScenario, buildTeam, content, type Team } from './scenario-helpers'

let runtime: Runtime
let team: Team
beforeAll(async () => {
  runtime = await startTestServer()
  team = await buildTeam(runtime)
})
afterAll(async () => {
  await runtime.close()
})

const api = () => request(runtime.app)
const base = () => `/api/workspaces/${team.workspace.id}/scenarios`

describe('creating and reading scenarios', () => {
  it('an editor creates a scenario; version 1 keeps the content and a run summary from the shared engine', async () => {
    const s = await buildScenario(runtime, team)
    expect(s.version).toBe(1)
    expect(s.content).toMatchObject({ title: 'Saxpy, ragged tail', tags: ['saxpy'], description: '', initialData: [], view: { cursor: null, window: null, selected: null } })
    // Defaults of the machine schema are filled in, so equal scenarios compare equal.
    expect(s.content.machine).toMatchObject({ lanes: 4, vlen: 512, issue: 'staggered' })
    expect(s.run.status).toBe('ok')
    if (s.run.status === 'ok') {
      expect(s.run.cycles).toBeGreaterThan(0)
      expect(Object.keys(s.run.stallCycles).sort()).toEqual(['bank', 'barrier', 'frontend', 'memory', 'queue', 'raw', 'rename', 'ring', 'slot'])
    }
    const got = scenarioResponseSchema.parse((await api().get(`${base()}/${s.id}`).set(team.viewer.auth).expect(200)).body)
    expect(got.scenario).toEqual(s)
  })

  it('a program that does not assemble is kept, with the assembler error as its run summary', async () => {
    const s = await buildScenario(runtime, team, { title: 'Half-written', program: '  vfoo.vv v1, v2, v3\n' })
    expect(s.run).toMatchObject({ status: 'failed', stage: 'assemble' })
    if (s.run.status === 'failed') expect(s.run.message).toMatch(/^line 1, column 3: /)
  })

  it('initial data naming a missing label is refused with the field', async () => {
    const res = await api().post(base()).set(team.editor.auth).send({ content: content({ initialData: [{ label: 'nope', type: 'f64', values: ['1'] }] }) })
    expect(res.status).toBe(400)
    expect(res.body.error.fields['content.initialData.0']).toBe('no data label "nope" in the program\'s .data')
  })

  it('initial data changes the run: more elements of x change nothing in cycles, but values are written', async () => {
    const s = await buildScenario(runtime, team, { initialData: [{ label: 'a', type: 'f64', values: ['3.5'] }] })
    expect(s.content.initialData).toEqual([{ label: 'a', type: 'f64', values: ['3.5'] }])
    const tooMany = await api().post(base()).set(team.editor.auth).send({ content: content({ initialData: [{ label: 'a', type: 'f64', values: ['1', '2'] }] }) })
    expect(tooMany.body.error.fields['content.initialData.0']).toBe('2 f64 values take 16 bytes; "a" has 8')
  })

  it('a body with a bad machine field names the field and the range', async () => {
    const res = await api().post(base()).set(team.editor.auth).send({ content: content({ machine: { lanes: 100 } }) })
    expect(res.status).toBe(400)
    expect(res.body.error.fields['content.machine.lanes']).toBe('100 is outside the range 1..64')
  })
})

describe('listing', () => {
  it('pages, sorts, and filters by tag, author and text on the server', async () => {
    const t = await buildTeam(runtime, 'Listing lab')
    const made = []
    for (const [i, tags] of [['fp64', 'reduction'], ['fp64'], ['int'], ['fp64', 'reduction'], ['mask']].entries()) {
      made.push(await buildScenario(runtime, t, { title: `K${i} ${i % 2 ? 'odd' : 'even 100%'}`, tags }, i === 2 ? t.owner : t.editor))
    }
    const list = async (query: string) => scenarioListResponseSchema.parse((await request(runtime.app).get(`/api/workspaces/${t.workspace.id}/scenarios?${query}`).set(t.viewer.auth).expect(200)).body)
    const page1 = await list('sort=title&order=asc&pageSize=2')
    expect(page1.total).toBe(5)
    expect(page1.scenarios.map((s) => s.title)).toEqual(['K0 even 100%', 'K1 odd'])
    expect((await list('sort=title&order=asc&pageSize=2&page=3')).scenarios.map((s) => s.title)).toEqual(['K4 even 100%'])
    expect((await list('tag=fp64&tag=reduction&sort=title&order=asc')).scenarios.map((s) => s.title)).toEqual(['K0 even 100%', 'K3 odd'])
    expect((await list('tag=fp64,reduction')).total).toBe(2)
    expect((await list(`author=${t.owner.user.id}`)).scenarios.map((s) => s.title)).toEqual(['K2 even 100%'])
    // `%` is a character to look for, not a wildcard.
    expect((await list('q=100%25')).total).toBe(3)
    expect((await list('q=ODD')).total).toBe(2)
    expect((await list('sort=author&order=asc&pageSize=1')).scenarios[0]?.author.name).toBe('Eddie Editor')
  })

  it('bad query parameters are a 400 naming them', async () => {
    const res = await api().get(`${base()}?pageSize=1000&sort=cycles`).set(team.viewer.auth)
    expect(res.status).toBe(400)
    expect(res.body.error.fields).toEqual({ pageSize: 'pageSize is at most 100', sort: 'sort is one of updatedAt, createdAt, title, author' })
  })
})

describe('saving with optimistic concurrency', () => {
  it('two clients save from version 1: the first wins, the second gets 409 with both versions, and keeping theirs loses nothing', async () => {
    const s = await buildScenario(runtime, team)
    const url = `${base()}/${s.id}/versions`
    const mine = content({ title: 'Mine', machine: { lanes: 8, vlen: 1024 } })
    const theirs = content({ title: 'Theirs' })
    const [a, b] = await Promise.all([
      api().post(url).set(team.editor.auth).send({ baseVersion: 1, content: theirs, message: 'theirs' }),
      api().post(url).set(team.owner.auth).send({ baseVersion: 1, content: mine, message: 'mine' }),
    ])
    const statuses = [a.status, b.status].sort()
    expect(statuses).toEqual([201, 409])
    const [won, lost] = a.status === 201 ? [a, b] : [b, a]
    const conflict = saveConflictBodySchema.parse(lost.body)
    expect(conflict.conflict.baseVersion).toBe(1)
    expect(conflict.conflict.theirs.number).toBe(2)
    expect(conflict.conflict.theirs.content.title).toBe(savedScenarioResponseSchema.parse(won.body).version.content.title)
    // "Keep mine as a new version": save again from the version it now knows.
    const keep = await api().post(url).set(team.owner.auth).send({ baseVersion: 2, content: conflict.conflict.mine, message: 'kept mine' })
    expect(keep.status).toBe(201)
    const history = versionListResponseSchema.parse((await api().get(url).set(team.viewer.auth).expect(200)).body)
    expect(history.versions.map((v) => v.number)).toEqual([3, 2, 1])
    const titles = await Promise.all([1, 2, 3].map(async (n) => (await api().get(`${url}/${n}`).set(team.viewer.auth)).body.version.content.title))
    expect(new Set(titles.slice(1))).toEqual(new Set(['Mine', 'Theirs']))
  })

  it('the database refuses to change a version once written', async () => {
    const s = await buildScenario(runtime, team)
    const v = await ScenarioVersion.findOne({ where: { scenarioId: s.id, number: 1 } })
    await expect(v!.update({ message: 'rewritten' })).rejects.toThrow(/scenario versions are immutable/)
  })
})

describe('history: diff and restore', () => {
  it('diffs two versions: program lines, machine fields, metrics before and after', async () => {
    const s = await buildScenario(runtime, team)
    const url = `${base()}/${s.id}/versions`
    const program = s.content.program.replace('vfmacc.vf v1, fa0, v0', 'vfmul.vf v2, v0, fa0\n  vfadd.vv v1, v1, v2')
    await api().post(url).set(team.editor.auth).send({ baseVersion: 1, content: content({ program, machine: { lanes: 8, vlen: 512, units: { fpu: { latency: 6 } } } }) }).expect(201)
    const { diff } = versionDiffResponseSchema.parse((await api().get(`${url}/diff?from=1&to=2`).set(team.viewer.auth).expect(200)).body)
    expect(diff.program.removed).toBe(1)
    expect(diff.program.added).toBe(2)
    const del = diff.program.changes.find((c) => c.op === 'delete')
    expect(del).toEqual({ op: 'delete', oldStart: 16, newStart: null, lines: ['  vfmacc.vf v1, fa0, v0'] })
    expect(diff.machine).toEqual([{ field: 'lanes', before: 4, after: 8 }, { field: 'units.fpu.latency', before: 4, after: 6 }])
    expect(diff.metrics.before.status).toBe('ok')
    expect(diff.metrics.after.status).toBe('ok')
  })

  it('restore makes a new version with the old content; nothing is overwritten', async () => {
    const s = await buildScenario(runtime, team)
    const url = `${base()}/${s.id}/versions`
    await api().post(url).set(team.editor.auth).send({ baseVersion: 1, content: content({ title: 'Changed' }) }).expect(201)
    const restored = savedScenarioResponseSchema.parse((await api().post(`${url}/1/restore`).set(team.editor.auth).send({}).expect(201)).body)
    expect(restored.version).toMatchObject({ number: 3, message: 'Restored version 1' })
    expect(restored.scenario.content).toEqual(s.content)
    expect((await api().get(`${url}/2`).set(team.viewer.auth)).body.version.content.title).toBe('Changed')
    await api().get(`${url}/9`).set(team.viewer.auth).expect(404)
    await api().get(`${url}/abc`).set(team.viewer.auth).expect(404)
  })
})

describe('duplicate, soft delete and undo', () => {
  it('duplicates into a new scenario with its own history', async () => {
    const s = await buildScenario(runtime, team)
    const dup = scenarioResponseSchema.parse((await api().post(`${base()}/${s.id}/duplicate`).set(team.editor.auth).send({}).expect(201)).body).scenario
    expect(dup.id).not.toBe(s.id)
    expect(dup.version).toBe(1)
    expect(dup.content).toEqual({ ...s.content, title: `${s.content.title} (copy)` })
  })

  it('a deleted scenario leaves the list for the trash and comes back with undo', async () => {
    const s = await buildScenario(runtime, team, { title: 'Trash me' })
    const deleted = scenarioResponseSchema.parse((await api().delete(`${base()}/${s.id}`).set(team.owner.auth).expect(200)).body).scenario
    expect(Date.parse(deleted.purgeAt!) - Date.parse(deleted.deletedAt!)).toBe(30 * 86_400_000)
    await api().get(`${base()}/${s.id}`).set(team.viewer.auth).expect(404)
    const trash = scenarioListResponseSchema.parse((await api().get(`${base()}?trash=true&q=Trash me`).set(team.viewer.auth)).body)
    expect(trash.scenarios.map((x) => x.id)).toEqual([s.id])
    await api().post(`${base()}/${s.id}/undo-delete`).set(team.owner.auth).expect(200)
    expect((await api().get(`${base()}/${s.id}`).set(team.viewer.auth).expect(200)).body.scenario.content).toEqual(s.content)
  })

  it('after 30 days the undo is refused with 410 undo_expired, and the trash purges it', async () => {
    const s = await buildScenario(runtime, team, { title: 'Old trash' })
    const { Scenario } = await import('../../server/models')
    await Scenario.update({ deletedAt: new Date(Date.now() - 31 * 86_400_000) }, { where: { id: s.id } })
    const res = await api().post(`${base()}/${s.id}/undo-delete`).set(team.owner.auth)
    expect(res.status).toBe(410)
    expect(res.body.error.code).toBe('undo_expired')
    await api().get(`${base()}?trash=true`).set(team.viewer.auth).expect(200)
    expect(await Scenario.findByPk(s.id)).toBeNull()
  })

  it('a deleted workspace is gone for its members until its owner undoes it', async () => {
    const t = await buildTeam(runtime, 'Soft lab')
    const s = await buildScenario(runtime, t)
    await request(runtime.app).delete(`/api/workspaces/${t.workspace.id}`).set(t.owner.auth).expect(204)
    await request(runtime.app).get(`/api/workspaces/${t.workspace.id}/scenarios/${s.id}`).set(t.viewer.auth).expect(404)
    const mine = (await request(runtime.app).get('/api/workspaces').set(t.owner.auth)).body.workspaces.map((w: { id: string }) => w.id)
    expect(mine).not.toContain(t.workspace.id)
    await request(runtime.app).post(`/api/workspaces/${t.workspace.id}/undo-delete`).set(t.editor.auth).expect(403)
    await request(runtime.app).post(`/api/workspaces/${t.workspace.id}/undo-delete`).set(t.owner.auth).expect(200)
    await request(runtime.app).get(`/api/workspaces/${t.workspace.id}/scenarios/${s.id}`).set(t.viewer.auth).expect(200)
  })
})
