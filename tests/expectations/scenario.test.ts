/**
 * Expectations as part of a scenario: kept per version and on the scenario,
 * listed in the version diff in words, exported in bundles; versions and
 * bundles from before expectations existed still read (with none).
 */
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Runtime } from '../../server/runtime'
import { bundleSchema } from '../../shared/schemas/bundle'
import { EXPECTATIONS_MAX } from '../../shared/schemas/expectation'
import { scenarioContentSchema, scenarioResponseSchema, versionDiffResponseSchema } from '../../shared/schemas/scenario'
import { createShareLinkResponseSchema, sharedScenarioResponseSchema } from '../../shared/schemas/share-link'
import { startTestServer } from '../server/helpers'
import { buildScenario, buildTeam, content, type Team } from '../server/scenario-helpers'

let runtime: Runtime
let team: Team
beforeAll(async () => {
  runtime = await startTestServer()
  team = await buildTeam(runtime, 'Expectations lab')
})
afterAll(async () => {
  await runtime.close()
})

const cycles = { kind: 'metric', metric: 'cycles', op: '<=', value: 120 } as const
const bank = { kind: 'stall', reason: 'bank', op: '==', value: 0 } as const
const res = { kind: 'memory' as const, label: 'y', type: 'f64' as const, values: ['12', '24'] }

describe('expectations on scenarios', () => {
  it('keeps them on the scenario and its versions, lists their changes in the diff and exports them', async () => {
    const s = await buildScenario(runtime, team, { expectations: [cycles, bank] })
    expect(s.content.expectations).toEqual([cycles, bank])
    const base = `/api/workspaces/${team.workspace.id}/scenarios`
    const saved = await request(runtime.app)
      .post(`${base}/${s.id}/versions`)
      .set(team.editor.auth)
      .send({ baseVersion: 1, content: content({ expectations: [cycles, res] }), message: 'Check the values' })
      .expect(201)
    expect(scenarioResponseSchema.parse({ scenario: saved.body.scenario }).scenario.content.expectations).toEqual([cycles, res])
    const got = scenarioResponseSchema.parse((await request(runtime.app).get(`${base}/${s.id}`).set(team.viewer.auth).expect(200)).body)
    expect(got.scenario.content.expectations).toEqual([cycles, res])

    const { diff } = versionDiffResponseSchema.parse((await request(runtime.app).get(`${base}/${s.id}/versions/diff?from=1&to=2`).set(team.viewer.auth).expect(200)).body)
    expect(diff.expectations).toEqual({ added: ['memory at label y (f64 x 2) equals [12, 24]'], removed: ['stall.bank == 0'] })

    const exported = await request(runtime.app).post(`${base}/export`).set(team.viewer.auth).send({ scenarioIds: [s.id] }).expect(200)
    const bundle = bundleSchema.parse(JSON.parse(exported.text as string))
    expect(bundle.scenarios[0]!.versions.map((v) => v.content.expectations)).toEqual([[cycles, bank], [cycles, res]])
  })

  it('carries them in a share link', async () => {
    const s = await buildScenario(runtime, team, { expectations: [cycles, res] })
    const made = await request(runtime.app).post(`/api/workspaces/${team.workspace.id}/scenarios/${s.id}/share-links`).set(team.editor.auth).send({}).expect(201)
    const { token } = createShareLinkResponseSchema.parse(made.body)
    const { share } = sharedScenarioResponseSchema.parse((await request(runtime.app).get(`/api/shares/${token}`).expect(200)).body)
    expect(share.content.expectations).toEqual([cycles, res])
  })

  it(`refuses more than ${EXPECTATIONS_MAX} expectations and a bad claim with a 400 naming the field`, async () => {
    const base = `/api/workspaces/${team.workspace.id}/scenarios`
    const many = await request(runtime.app).post(base).set(team.editor.auth).send({ content: content({ expectations: Array(EXPECTATIONS_MAX + 1).fill(cycles) }) })
    expect(many.status).toBe(400)
    expect(JSON.stringify(many.body.error)).toContain(`At most ${EXPECTATIONS_MAX} expectations per scenario`)
    const bad = await request(runtime.app).post(base).set(team.editor.auth).send({ content: { ...content(), expectations: [{ ...cycles, op: '=<' }] } })
    expect(bad.status).toBe(400)
    expect(JSON.stringify(bad.body.error)).toContain('content.expectations.0.op')
  })

  it('reads content and bundles written before expectations existed, with none', () => {
    const old = { title: 't', description: '', tags: [], program: '', machine: {}, initialData: [], view: { cursor: null, window: null, selected: null } }
    expect(scenarioContentSchema.parse(old).expectations).toEqual([])
  })
})
