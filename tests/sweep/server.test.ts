/**
 * Sweeps on the server (real PostgreSQL, real pg-boss): a server sweep runs
 * on two sweep workers and gives the same points as the CLI's sequential run
 * of the same definition; a browser sweep is saved with its points; bad
 * definitions are 400s naming the field; the role matrix (members read,
 * owners and editors run and cancel, outsiders get 404); a repeated point is
 * stored once.
 */
import pg from 'pg'
import request from 'supertest'
import { QueryTypes } from 'sequelize'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { sharedScenarioResponseSchema } from '../../shared/schemas/share-link'
import { sweepDefinitionSchema, type SweepPointResult } from '../../shared/schemas/sweep'
import { resolveSweep } from '../../shared/sweep/resolve'
import { runSweep } from '../../shared/sweep/runSweep'
import { ScenarioVersion, Sweep } from '../../server/models'
import type { Runtime } from '../../server/runtime'
import { insertPoints } from '../../server/services/sweeps'
import { SWEEP_QUEUED_CHANNEL } from '../../server/services/sweeps-queue'
import { startSweepWorker, type SweepWorker } from '../../server/worker-sweeps'
import { buildUser, buildWorkspace, startTestServer, type BuiltUser } from '../server/helpers'
import { content } from '../server/scenario-helpers'
import { FMA_CURVE } from './programs'

let runtime: Runtime
let owner: BuiltUser, editor: BuiltUser, viewer: BuiltUser, outsider: BuiltUser
let ws: string
const workers: SweepWorker[] = []

const definition = { program: FMA_CURVE, machine: { lanes: 4 }, parameters: [{ path: 'issue', spec: 'serial,staggered' }, { path: 'AVL', spec: '1..20' }] }

function sequential(): SweepPointResult[] {
  const r = resolveSweep(sweepDefinitionSchema.parse(definition))
  if (!r.ok) throw new Error('unresolved')
  return runSweep(r.sweep).points
}

beforeAll(async () => {
  runtime = await startTestServer()
  ;[owner, editor, viewer, outsider] = await Promise.all([buildUser(runtime), buildUser(runtime), buildUser(runtime), buildUser(runtime)])
  ws = (await buildWorkspace([{ user: owner.user, role: 'owner' }, { user: editor.user, role: 'editor' }, { user: viewer.user, role: 'viewer' }])).id
})

afterAll(async () => {
  for (const w of workers) await w.stop()
  await runtime?.close()
})

const api = () => request(runtime.app)

describe('server sweeps', () => {
  it('run on two sweep workers (two pg-boss consumers of the chunks) with the figures of a sequential run', async () => {
    const created = await api().post(`/api/workspaces/${ws}/sweeps`).set(editor.auth).send({ title: 'vl curve', runner: 'server', definition })
    expect(created.status).toBe(201)
    expect(created.body.sweep).toMatchObject({ status: 'queued', planned: 40, done: 0, runner: 'server' })
    const id = created.body.sweep.id as string
    // Chunks follow program order: with issue swept slowest, index order would put each AVL's two points in different chunks.
    const jobs = await runtime.ctx.sequelize.query<{ data: { indexes: number[] } }>("SELECT data FROM pgboss.job WHERE name = 'sweep-chunks' AND data->>'sweepId' = :id", { replacements: { id }, type: QueryTypes.SELECT })
    const chunkOfAvl = new Map<number, Set<number>>()
    jobs.forEach((j, k) => j.data.indexes.forEach((i) => chunkOfAvl.set(i % 20, (chunkOfAvl.get(i % 20) ?? new Set()).add(k))))
    expect(jobs.flatMap((j) => j.data.indexes).sort((a, b) => a - b)).toEqual(Array.from({ length: 40 }, (_, i) => i))
    expect([...chunkOfAvl.values()].every((chunks) => chunks.size === 1)).toBe(true)
    // Workers take the most expensive chunks first (largestFirst: the last AVL first), in pg-boss's order of taking jobs
    // (priority, higher first, then creation time; jobs inserted together share their creation time and have random ids).
    const taken = await runtime.ctx.sequelize.query<{ data: { indexes: number[] } }>("SELECT data FROM pgboss.job WHERE name = 'sweep-chunks' AND data->>'sweepId' = :id ORDER BY priority DESC, created_on, id", { replacements: { id }, type: QueryTypes.SELECT })
    expect(taken[0]?.data.indexes).toContain(19)
    expect(taken.at(-1)?.data.indexes).toContain(0)
    expect(taken.map((j) => Math.max(...j.data.indexes.map((i) => i % 20)))).toEqual([...taken.map((j) => Math.max(...j.data.indexes.map((i) => i % 20)))].sort((a, b) => b - a))
    for (let i = 0; i < 2; i++) workers.push(await startSweepWorker({ databaseUrl: runtime.ctx.config.databaseUrl, sequelize: runtime.ctx.sequelize, logger: runtime.ctx.logger }))
    let sweep: { status: string; points: SweepPointResult[] } = { status: 'queued', points: [] }
    for (let i = 0; i < 240 && sweep.status !== 'done'; i++) {
      await new Promise((resolve) => setTimeout(resolve, 500))
      sweep = (await api().get(`/api/workspaces/${ws}/sweeps/${id}`).set(viewer.auth).expect(200)).body.sweep
    }
    expect(sweep.status).toBe('done')
    expect(sweep.points).toEqual(sequential())
  }, 180_000)

  it('announces queued chunks on the channel idle workers listen on, so that none waits for its next poll', async () => {
    const listener = new pg.Client({ connectionString: runtime.ctx.config.databaseUrl })
    await listener.connect()
    try {
      await listener.query(`LISTEN ${SWEEP_QUEUED_CHANNEL}`)
      const heard = new Promise<string>((resolve) => listener.on('notification', (n) => resolve(n.channel)))
      const created = await api().post(`/api/workspaces/${ws}/sweeps`).set(editor.auth).send({ title: 'notified', runner: 'server', definition: { ...definition, parameters: [{ path: 'AVL', spec: '1,2' }] } })
      expect(created.status).toBe(201)
      expect(await heard).toBe(SWEEP_QUEUED_CHANNEL)
    } finally {
      await listener.end()
    }
  })

  it('stores a repeated point once (a retried chunk)', async () => {
    const created = await api().post(`/api/workspaces/${ws}/sweeps`).set(editor.auth).send({ title: 'saved', runner: 'browser', definition, points: sequential().slice(0, 3) })
    expect(created.status).toBe(201)
    const id = created.body.sweep.id as string
    await insertPoints(runtime.ctx, id, sequential().slice(0, 5))
    const got = (await api().get(`/api/workspaces/${ws}/sweeps/${id}`).set(owner.auth).expect(200)).body.sweep
    expect(got.points.map((p: SweepPointResult) => p.index)).toEqual([0, 1, 2, 3, 4])
    expect(got.points.slice(0, 3)).toEqual(sequential().slice(0, 3))
  })

  it("belongs to the scenario's newest version when saved from a scenario", async () => {
    const scenario = (await api().post(`/api/workspaces/${ws}/scenarios`).set(editor.auth).send({ content: content() }).expect(201)).body.scenario
    await api().post(`/api/workspaces/${ws}/scenarios/${scenario.id}/versions`).set(editor.auth).send({ baseVersion: 1, content: content({ title: 'v2' }) }).expect(201)
    // The API names versions by number; their ids are the database's.
    const v2 = await ScenarioVersion.findOne({ where: { scenarioId: scenario.id, number: 2 } })
    const created = await api().post(`/api/workspaces/${ws}/sweeps`).set(editor.auth).send({ title: 'of v2', runner: 'browser', definition, scenarioId: scenario.id })
    expect(created.status).toBe(201)
    expect(created.body.sweep).toMatchObject({ scenarioId: scenario.id, versionId: v2?.id })
  })

  it("is listed with its scenario's version number, and a share link shows it read-only at that version", async () => {
    const scenario = (await api().post(`/api/workspaces/${ws}/scenarios`).set(editor.auth).send({ content: content({ title: 'Shared sweep' }) }).expect(201)).body.scenario
    const saved = await api().post(`/api/workspaces/${ws}/sweeps`).set(editor.auth).send({ title: 'of v1', runner: 'browser', definition, scenarioId: scenario.id, points: sequential() })
    expect(saved.status).toBe(201)
    const sweepId = saved.body.sweep.id as string
    // A later version does not move the sweep: it stays with v1, and the link defaults to v1.
    await api().post(`/api/workspaces/${ws}/scenarios/${scenario.id}/versions`).set(editor.auth).send({ baseVersion: 1, content: content({ title: 'Shared sweep v2' }) }).expect(201)
    const listed = (await api().get(`/api/workspaces/${ws}/sweeps?scenarioId=${scenario.id}`).set(viewer.auth).expect(200)).body.sweeps
    expect(listed).toHaveLength(1)
    expect(listed[0]).toMatchObject({ id: sweepId, version: 1, done: 40, planned: 40 })
    const badQuery = await api().get(`/api/workspaces/${ws}/sweeps?scenarioId=nope`).set(viewer.auth)
    expect(badQuery.status).toBe(400)
    expect(badQuery.body.error.fields).toEqual({ scenarioId: 'scenarioId is a scenario id (a UUID)' })

    const link = await api().post(`/api/workspaces/${ws}/scenarios/${scenario.id}/share-links`).set(editor.auth).send({ sweepId })
    expect(link.status).toBe(201)
    expect(link.body.link).toMatchObject({ sweepId, version: 1 })
    const opened = sharedScenarioResponseSchema.parse((await api().get(`/api/shares/${link.body.token as string}`).expect(200)).body).share
    expect(opened.version).toBe(1)
    expect(opened.sweep?.title).toBe('of v1')
    expect(opened.sweep?.definition.parameters).toEqual(definition.parameters)
    expect(opened.sweep?.points).toEqual(sequential())
    // The reader's answer names no ids.
    expect(JSON.stringify(opened)).not.toContain(sweepId)

    // Another scenario's sweep is refused, naming the field; so is a sweep still running (409).
    const other = (await api().post(`/api/workspaces/${ws}/scenarios`).set(editor.auth).send({ content: content({ title: 'Other' }) }).expect(201)).body.scenario
    const foreign = await api().post(`/api/workspaces/${ws}/scenarios/${other.id}/share-links`).set(editor.auth).send({ sweepId })
    expect(foreign.status).toBe(400)
    expect(foreign.body.error.fields).toEqual({ sweepId: 'No sweep of this scenario has this id' })
    // A server sweep's state as a worker leaves it mid-way (set here: the test's workers would finish a real one first).
    const running = await api().post(`/api/workspaces/${ws}/sweeps`).set(editor.auth).send({ title: 'running', runner: 'browser', definition, scenarioId: other.id })
    await Sweep.update({ status: 'running' }, { where: { id: running.body.sweep.id as string } })
    const busy = await api().post(`/api/workspaces/${ws}/scenarios/${other.id}/share-links`).set(editor.auth).send({ sweepId: running.body.sweep.id })
    expect(busy.status).toBe(409)
  })

  it('answers a bad definition with a 400 naming the field, the value and the range', async () => {
    const bad = await api().post(`/api/workspaces/${ws}/sweeps`).set(editor.auth).send({ title: 'x', runner: 'server', definition: { ...definition, parameters: [{ path: 'lanes', spec: '1..65' }] } })
    expect(bad.status).toBe(400)
    expect(bad.body.error.fields).toEqual({ 'definition.parameters.0.spec': 'lanes=65: 65 is outside the range 1..64' })
    const foreign = await api().post(`/api/workspaces/${ws}/sweeps`).set(editor.auth).send({ title: 'x', runner: 'browser', definition, points: [{ ...sequential()[0], values: ['serial', 7] }] })
    expect(foreign.status).toBe(400)
    expect(foreign.body.error.fields['points.0']).toMatch(/point 0 does not belong to this sweep/)
  })

  it('follows the role matrix: members read, owners and editors write, outsiders see nothing (common practice)', async () => {
    const list = (u: BuiltUser) => api().get(`/api/workspaces/${ws}/sweeps`).set(u.auth)
    const create = (u: BuiltUser) => api().post(`/api/workspaces/${ws}/sweeps`).set(u.auth).send({ title: 'r', runner: 'browser', definition })
    for (const u of [owner, editor, viewer]) expect((await list(u)).status).toBe(200)
    expect((await list(outsider)).status).toBe(404)
    expect((await api().get(`/api/workspaces/${ws}/sweeps`)).status).toBe(401)
    for (const u of [owner, editor]) expect((await create(u)).status).toBe(201)
    expect((await create(viewer)).status).toBe(403)
    expect((await create(outsider)).status).toBe(404)
    const id = (await create(owner)).body.sweep.id as string
    expect((await api().post(`/api/workspaces/${ws}/sweeps/${id}/cancel`).set(viewer.auth)).status).toBe(403)
    expect((await api().post(`/api/workspaces/${ws}/sweeps/${id}/cancel`).set(editor.auth)).status).toBe(200)
    expect((await api().get(`/api/workspaces/${ws}/sweeps/${id}`).set(outsider.auth)).status).toBe(404)
  })
})
