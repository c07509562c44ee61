/**
 * Walkthroughs as part of a scenario version: saved with it, listed in its
 * history by title, named in the version diff, carried by share links, by
 * "Make my copy" (copy-from-share) and by bundles (export, then import);
 * bad input is a 400 naming the field. Real PostgreSQL (the test database).
 */
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Runtime } from '../../server/runtime'
import { bundleSchema } from '../../shared/schemas/bundle'
import { scenarioContentSchema, scenarioResponseSchema, versionDiffResponseSchema, versionListResponseSchema } from '../../shared/schemas/scenario'
import { createShareLinkResponseSchema, sharedScenarioResponseSchema } from '../../shared/schemas/share-link'
import { WALKTHROUGHS_MAX, walkthroughSchema, type WalkthroughInput } from '../../shared/schemas/walkthrough'
import { buildUser, startTestServer } from '../server/helpers'
import { buildScenario, buildTeam, content, type Team } from '../server/scenario-helpers'

let runtime: Runtime
let team: Team
beforeAll(async () => {
  runtime = await startTestServer()
  team = await buildTeam(runtime, 'Walkthrough lab')
})
afterAll(async () => {
  await runtime.close()
})

const tail: WalkthroughInput = {
  title: 'The ragged tail',
  steps: [
    { cursor: 0, note: 'The first strip: **four** elements per lane.' },
    { cursor: 12, window: { start: 0, end: 40 }, highlight: { instruction: 6, lane: 1 }, subRows: true, note: 'Lane 1 is busy.' },
    {
      cursor: 20,
      highlight: { lane: 3 },
      note: 'How long is the run?',
      question: { kind: 'number', text: 'How many cycles does the run take?', fact: { kind: 'metric', metric: 'cycles' }, explanation: 'Read the ruler.' },
    },
  ],
}
const parsed = walkthroughSchema.parse(tail)

describe('walkthroughs on scenarios', () => {
  it('keeps them with the version, lists them in the history and names them in the diff', async () => {
    const s = await buildScenario(runtime, team)
    expect(s.content.walkthroughs).toEqual([])
    const base = `/api/workspaces/${team.workspace.id}/scenarios/${s.id}`
    await request(runtime.app).post(`${base}/versions`).set(team.editor.auth).send({ baseVersion: 1, content: content({ walkthroughs: [tail] }), message: 'Walkthrough' }).expect(201)
    const got = scenarioResponseSchema.parse((await request(runtime.app).get(base).set(team.viewer.auth).expect(200)).body)
    expect(got.scenario.content.walkthroughs).toEqual([parsed])

    const { versions } = versionListResponseSchema.parse((await request(runtime.app).get(`${base}/versions`).set(team.viewer.auth).expect(200)).body)
    expect(versions.map((v) => [v.number, v.walkthroughs])).toEqual([
      [2, [{ title: 'The ragged tail', steps: 3 }]],
      [1, []],
    ])
    const { diff } = versionDiffResponseSchema.parse((await request(runtime.app).get(`${base}/versions/diff?from=1&to=2`).set(team.viewer.auth).expect(200)).body)
    expect(diff.fields).toEqual([{ field: 'walkthroughs', before: [], after: ['The ragged tail (3 steps)'] }])
  })

  it('travels in a share link, and a copy from the link into one own workspace keeps it', async () => {
    const s = await buildScenario(runtime, team, { walkthroughs: [tail] })
    const made = await request(runtime.app).post(`/api/workspaces/${team.workspace.id}/scenarios/${s.id}/share-links`).set(team.editor.auth).send({}).expect(201)
    const { token } = createShareLinkResponseSchema.parse(made.body)
    const { share } = sharedScenarioResponseSchema.parse((await request(runtime.app).get(`/api/shares/${token}`).expect(200)).body)
    expect(share.content.walkthroughs).toEqual([parsed])

    // A student: a viewer of the class workspace, the owner of the personal workspace sign-up gave them.
    const student = await buildUser(runtime, { name: 'Sam Student' })
    const own = (await request(runtime.app).post('/api/workspaces').set(student.auth).send({ name: "Sam's workspace" }).expect(201)).body.workspace.id as string
    const copied = await request(runtime.app).post(`/api/workspaces/${own}/scenarios/copy-from-share`).set(student.auth).send({ token }).expect(201)
    expect(scenarioResponseSchema.parse(copied.body).scenario.content.walkthroughs).toEqual([parsed])
  })

  it('goes into a bundle and comes back from it on import', async () => {
    const s = await buildScenario(runtime, team, { walkthroughs: [tail] })
    const exported = await request(runtime.app).post(`/api/workspaces/${team.workspace.id}/scenarios/export`).set(team.viewer.auth).send({ scenarioIds: [s.id] }).expect(200)
    const bundle = bundleSchema.parse(JSON.parse(exported.text as string))
    expect(bundle.scenarios[0]!.versions[0]!.content.walkthroughs).toEqual([parsed])
    const imported = await request(runtime.app).post(`/api/workspaces/${team.workspace.id}/uploads`).set(team.editor.auth).attach('file', Buffer.from(exported.text as string), 'bundle.json')
    expect(imported.status).toBe(201)
    const list = await request(runtime.app).get(`/api/workspaces/${team.workspace.id}/scenarios?q=${encodeURIComponent('Saxpy')}&pageSize=100`).set(team.viewer.auth).expect(200)
    const ids = (list.body.scenarios as { id: string }[]).map((x) => x.id).filter((id) => id !== s.id)
    const copies = await Promise.all(ids.map(async (id) => scenarioResponseSchema.parse((await request(runtime.app).get(`/api/workspaces/${team.workspace.id}/scenarios/${id}`).set(team.viewer.auth)).body).scenario))
    expect(copies.some((c) => JSON.stringify(c.content.walkthroughs) === JSON.stringify([parsed]))).toBe(true)
  })

  it(`refuses a bad step and more than ${WALKTHROUGHS_MAX} walkthroughs with a 400 naming the field`, async () => {
    const base = `/api/workspaces/${team.workspace.id}/scenarios`
    const bad = await request(runtime.app)
      .post(base)
      .set(team.editor.auth)
      .send({ content: content({ walkthroughs: [{ ...tail, steps: [{ cursor: -1, note: 'before the start' }] }] }) })
    expect(bad.status).toBe(400)
    expect(JSON.stringify(bad.body.error)).toContain('content.walkthroughs.0.steps.0.cursor')
    expect(JSON.stringify(bad.body.error)).toContain('A cycle is at least 0')
    const many = await request(runtime.app).post(base).set(team.editor.auth).send({ content: content({ walkthroughs: Array(WALKTHROUGHS_MAX + 1).fill(tail) }) })
    expect(many.status).toBe(400)
    expect(JSON.stringify(many.body.error)).toContain(`At most ${WALKTHROUGHS_MAX} walkthroughs per scenario version`)
  })

  it('reads content written before walkthroughs existed, with none', () => {
    const old = { title: 't', description: '', tags: [], program: '', machine: {}, initialData: [], view: { cursor: null, window: null, selected: null } }
    expect(scenarioContentSchema.parse(old).walkthroughs).toEqual([])
  })
})
