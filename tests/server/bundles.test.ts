import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Runtime } from '../../server/runtime'
import { bundleSchema } from '../../shared/schemas/bundle'
import { scenarioResponseSchema, versionListResponseSchema } from '../../shared/schemas/scenario'
import { uploadResponseSchema } from '../../shared/schemas/upload'
import { startTestServer } from './helpers'
import { buildScenario, buildTeam, content, type Team } from './scenario-helpers'

let runtime: Runtime
let team: Team
beforeAll(async () => {
  runtime = await startTestServer()
  team = await buildTeam(runtime, 'Bundle lab')
})
afterAll(async () => {
  await runtime.close()
})

const exportIds = async (t: Team, ids: string[]) => {
  const res = await request(runtime.app).post(`/api/workspaces/${t.workspace.id}/scenarios/export`).set(t.viewer.auth).send({ scenarioIds: ids }).expect(200)
  expect(res.headers['content-disposition']).toMatch(/^attachment; filename="chimeline-scenarios-\d{4}-\d{2}-\d{2}\.json"$/)
  return { bundle: bundleSchema.parse(res.body), text: res.text }
}

describe('scenario bundles', () => {
  it('export then import into another workspace reads back the same content, messages and figures, history and all', async () => {
    const a = await buildScenario(runtime, team, { title: 'Dot product', tags: ['fp64', 'reduction'], description: '# Notes\nSum of **x*y**.', initialData: [{ label: 'a', type: 'f64', values: ['-0.5'] }], view: { cursor: 9, window: { start: 2, end: 30 }, selected: 1 } })
    await request(runtime.app).post(`/api/workspaces/${team.workspace.id}/scenarios/${a.id}/versions`).set(team.owner.auth).send({ baseVersion: 1, content: content({ title: 'Dot product', machine: { lanes: 2, vlen: 256 } }), message: 'two lanes' }).expect(201)
    const b = await buildScenario(runtime, team, { title: 'Broken one', program: '  vbogus v1\n' })
    const first = await exportIds(team, [a.id, b.id])
    expect(first.bundle.scenarios.map((s) => s.versions.map((v) => [v.number, v.message, v.author]))).toEqual([
      [[1, 'First', 'Eddie Editor'], [2, 'two lanes', 'Olive Owner']],
      [[1, 'First', 'Eddie Editor']],
    ])

    const other = await buildTeam(runtime, 'Elsewhere')
    const imported = await request(runtime.app).post(`/api/workspaces/${other.workspace.id}/uploads`).set(other.editor.auth).attach('file', Buffer.from(first.text), 'bundle.json')
    expect(imported.status).toBe(201)
    const { upload, scenarios } = uploadResponseSchema.parse(imported.body)
    expect(upload.kind).toBe('bundle')
    expect(scenarios.map((s) => [s.title, s.version])).toEqual([['Dot product', 2], ['Broken one', 1]])

    const again = await exportIds(other, scenarios.map((s) => s.id))
    // Content, messages and (recomputed, by the same engine) figures read back identically;
    // the importer is now the author of every version.
    const strip = (b: typeof first.bundle) => b.scenarios.map((s) => s.versions.map(({ number, message, content, run }) => ({ number, message, content, run })))
    expect(strip(again.bundle)).toEqual(strip(first.bundle))
    expect(again.bundle.scenarios.flatMap((s) => s.versions.map((v) => v.author))).toEqual(['Eddie Editor', 'Eddie Editor', 'Eddie Editor'])
  })

  it('an imported bundle is not trusted (issue 9, item 5): figures recomputed, importer and import time as author and date, the claimed ones kept as "originally"', async () => {
    const real = await buildScenario(runtime, team, { title: 'Honest saxpy' })
    const forged = (await exportIds(team, [real.id])).bundle
    const v1 = forged.scenarios[0]?.versions[0] as (typeof forged.scenarios)[number]['versions'][number]
    v1.author = 'Ada Admin'
    v1.createdAt = '2099-01-01T00:00:00.000Z'
    v1.run = { status: 'ok', cycles: 1, flopsPerCycle: 999_999, stallCycles: Object.fromEntries(Object.keys(real.run.status === 'ok' ? real.run.stallCycles : {}).map((k) => [k, 0])) as never }
    // A second scenario whose program does not even assemble, claiming a perfect run.
    forged.scenarios.push({ versions: [{ ...v1, content: { ...v1.content, title: 'Never ran', program: '  vbogus v1\n' } }] })

    const other = await buildTeam(runtime, 'Import lab')
    const before = new Date()
    const res = await request(runtime.app).post(`/api/workspaces/${other.workspace.id}/uploads`).set(other.editor.auth).attach('file', Buffer.from(JSON.stringify(forged)), 'forged.json')
    expect(res.status).toBe(201)
    const after = new Date()
    const [honest, broken] = uploadResponseSchema.parse(res.body).scenarios
    const history = async (id: string) => versionListResponseSchema.parse((await request(runtime.app).get(`/api/workspaces/${other.workspace.id}/scenarios/${id}/versions`).set(other.viewer.auth).expect(200)).body).versions

    const [h] = await history(honest?.id as string)
    // The figures are those the server computed when the same content was saved for real.
    expect(h?.run).toEqual(real.run)
    expect(h?.author).toEqual({ id: other.editor.user.id, name: 'Eddie Editor' })
    const at = new Date(h?.createdAt as string)
    expect(at >= new Date(before.getTime() - 1000) && at <= after).toBe(true)
    expect(h?.originally).toEqual({ author: 'Ada Admin', createdAt: '2099-01-01T00:00:00.000Z' })

    const [b] = await history(broken?.id as string)
    expect(b?.run).toMatchObject({ status: 'failed', stage: 'assemble' })
    const s = scenarioResponseSchema.parse((await request(runtime.app).get(`/api/workspaces/${other.workspace.id}/scenarios/${broken?.id}`).set(other.viewer.auth).expect(200)).body).scenario
    expect(s.run.status).toBe('failed')
    expect(s.createdAt.startsWith('2099')).toBe(false)
  })

  it('exporting a scenario of another workspace is a 404 naming it', async () => {
    const other = await buildTeam(runtime, 'Not yours')
    const s = await buildScenario(runtime, other)
    const res = await request(runtime.app).post(`/api/workspaces/${team.workspace.id}/scenarios/export`).set(team.viewer.auth).send({ scenarioIds: [s.id] })
    expect(res.status).toBe(404)
    expect(res.body.error.message).toBe(`No such scenario ${s.id} in this workspace`)
  })
})

describe('a saved scenario survives a restart', () => {
  it('a new app instance against the same database returns it unchanged, versions included', async () => {
    const s = await buildScenario(runtime, team, { title: 'Keep for years', tags: ['corner-case'] })
    const versions = (await request(runtime.app).get(`/api/workspaces/${team.workspace.id}/scenarios/${s.id}/versions`).set(team.viewer.auth)).body
    // Sequelize models are bound once per process, so the new instance shares the
    // connection (see RuntimeOptions.sequelize) but nothing else: new app, new routes, new mailer.
    const second = await startTestServer({}, runtime)
    try {
      const got = scenarioResponseSchema.parse((await request(second.app).get(`/api/workspaces/${team.workspace.id}/scenarios/${s.id}`).set(team.viewer.auth).expect(200)).body)
      expect(got.scenario).toEqual(s)
      expect((await request(second.app).get(`/api/workspaces/${team.workspace.id}/scenarios/${s.id}/versions`).set(team.viewer.auth)).body).toEqual(versions)
    } finally {
      await second.close()
    }
  })
})
