/**
 * Saved versions' run summaries run on worker threads (server/services/run-pool.ts):
 * a long save leaves the server answering, a run over the time limit is saved
 * with a 'failed' summary, a full queue is a 503 that saves nothing, the
 * workspaces share the threads in turn, and a stale save is a 409 before any run.
 * No check here reads a clock: responsiveness is shown by order (what answered
 * while what was still running), which holds on a loaded machine too.
 */
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { Scenario, ScenarioVersion } from '../../server/models'
import type { Runtime } from '../../server/runtime'
import { scenarioResponseSchema } from '../../shared/schemas/scenario'
import { buildWorkspace, startTestServer } from './helpers'
import { buildTeam, content, type Team } from './scenario-helpers'

/**
 * Our own kernel: 100,000 strip-mined FP64 adds on the default machine, about
 * 400,000 steps and 880,000 cycles, within SAVE_RUN_LIMITS; it takes about two
 * seconds of one core on this kind of machine.
 */
const loopProgram = (iterations: number) => `  li a1, ${iterations}
  li a0, 64
loop:
  vsetvli t0, a0, e64, m1, ta, ma
  vfadd.vv v1, v1, v2
  addi a1, a1, -1
  bnez a1, loop
`
const LONG = loopProgram(100_000)
const longContent = (title: string) => content({ title, program: LONG, machine: {} })
/** The same kernel, 20,000 times round: long enough that a queue forms behind it. */
const mediumContent = (title: string) => content({ title, program: loopProgram(20_000), machine: {} })

const runtimes: Runtime[] = []
async function server(saveRuns?: Runtime['ctx']['config']['saveRuns']): Promise<Runtime> {
  const first = runtimes[0]
  const r = await startTestServer(saveRuns ? { saveRuns } : {}, first)
  runtimes.push(r)
  return r
}

let team: Team
let other: Team
beforeAll(async () => {
  const first = await server()
  team = await buildTeam(first, 'Save runs lab')
  other = await buildTeam(first, 'Neighbour lab')
})
afterAll(async () => {
  for (const r of runtimes.reverse()) await r.close()
})

const create = (r: Runtime, body: object, t: Team = team) => request(r.app).post(`/api/workspaces/${t.workspace.id}/scenarios`).set(t.editor.auth).send(body)

/** Resolves once the pool holds `n` runs (running and waiting). */
async function inFlight(r: Runtime, n: number): Promise<void> {
  while (r.ctx.runs.inFlight < n) await new Promise((resolve) => setTimeout(resolve, 5))
}

describe('run summaries off the request thread', () => {
  it('while a long save runs on a worker, GET /api/health keeps answering (order, not time: answers arrive while the run is in flight)', async () => {
    const r = await server({ threads: 1, queue: 4, perWorkspace: 3, perAccount: 6, timeLimitMs: 600_000 })
    let done = false
    const save = create(r, { content: longContent('Long save'), message: 'long' }).then((res) => {
      done = true
      return res
    })
    await inFlight(r, 1)
    // The test and the server share this process: had the run taken the event
    // loop, no health answer could arrive while it was in flight.
    let answeredDuringRun = 0
    while (!done) {
      const health = await request(r.app).get('/api/health')
      expect(health.status).toBe(200)
      if (r.ctx.runs.inFlight === 1 && !done) answeredDuringRun++
      await new Promise((resolve) => setTimeout(resolve, 20))
    }
    const res = await save
    expect(res.status).toBe(201)
    expect(scenarioResponseSchema.parse(res.body).scenario.run).toMatchObject({ status: 'ok' })
    expect(answeredDuringRun).toBeGreaterThanOrEqual(3)
  }, 180_000)

  it('a run over the time limit is stopped and the version is kept with a failed summary that says so', async () => {
    const r = await server({ threads: 1, queue: 4, perWorkspace: 3, perAccount: 6, timeLimitMs: 300 })
    const res = await create(r, { content: longContent('Too long for the limit'), message: 'slow' }).expect(201)
    const saved = scenarioResponseSchema.parse(res.body).scenario
    expect(saved.run).toMatchObject({ status: 'failed', stage: 'simulate', code: 'time_limit' })
    if (saved.run.status === 'failed') expect(saved.run.message).toContain('longer than 0.3 s')
    const v1 = await ScenarioVersion.findOne({ where: { scenarioId: saved.id, number: 1 } })
    expect(v1?.run).toEqual(saved.run)
    // The stopped thread is replaced: the next save runs as usual.
    const next = scenarioResponseSchema.parse((await create(r, { content: content({ title: 'Short after' }), message: '' }).expect(201)).body).scenario
    expect(next.run.status).toBe('ok')
  })

  it('a full queue answers 503 server_busy and saves nothing; once it drains, saves work again', async () => {
    // One thread and one place in the queue: two runs in flight at most.
    const r = await server({ threads: 1, queue: 1, perWorkspace: 3, perAccount: 6, timeLimitMs: 1000 })
    const titles = ['Busy 1', 'Busy 2', 'Busy 3']
    const results = await Promise.all(titles.map((t) => create(r, { content: longContent(t), message: '' })))
    expect(results.map((x) => x.status).sort()).toEqual([201, 201, 503])
    const refused = results.find((x) => x.status === 503)
    expect(refused?.body.error.code).toBe('server_busy')
    expect(refused?.body.error.message).toContain('nothing was done')
    expect(refused?.headers['retry-after']).toMatch(/^\d+$/)
    const stored = await Scenario.count({ where: { workspaceId: team.workspace.id, title: titles } })
    expect(stored).toBe(2)
    expect(r.ctx.runs.inFlight).toBe(0)
    await create(r, { content: content({ title: 'After the rush' }), message: '' }).expect(201)
  }, 180_000)

  it('initial data that does not fit is still a 400 naming the entry, computed on the worker', async () => {
    const r = await server()
    const res = await create(r, { content: content({ initialData: [{ label: 'nowhere', type: 'f64', values: ['1'] }] }), message: '' })
    expect(res.status).toBe(400)
    expect(res.body.error.fields).toEqual({ 'content.initialData.0': 'no data label "nowhere" in the program\'s .data' })
  })
})

describe('one run pool shared fairly (issue 9, item 3)', () => {
  it('threads take the workspaces in turn: a neighbour\'s save runs before the second of a burst that came first', async () => {
    const r = await server({ threads: 1, queue: 16, perWorkspace: 3, perAccount: 6, timeLimitMs: 600_000 })
    const order: string[] = []
    const track = (label: string, p: Promise<request.Response>) => p.then((res) => (order.push(label), res))
    // A1 is the long kernel, so the neighbour asks while it still holds the only thread.
    // Each request is in the pool before the next is sent, so the pool sees them in this order.
    const burst: Promise<request.Response>[] = []
    for (const [i, t] of ['A1', 'A2', 'A3'].entries()) {
      burst.push(track(t, create(r, { content: t === 'A1' ? longContent(t) : mediumContent(t), message: '' })))
      await inFlight(r, i + 1)
    }
    const neighbour = track('B1', create(r, { content: content({ title: 'B1' }), message: '' }, other))
    await inFlight(r, 4)
    expect(order).toEqual([])
    const results = await Promise.all([...burst, neighbour])
    expect(results.map((x) => x.status)).toEqual([201, 201, 201, 201])
    // First come, first served would give A1, A2, A3, B1.
    expect(order).toEqual(['A1', 'B1', 'A2', 'A3'])
  }, 180_000)

  it('a workspace has at most a few runs in flight: more is 503 with Retry-After for it alone, its neighbour saves as usual', async () => {
    const r = await server({ threads: 1, queue: 16, perWorkspace: 2, perAccount: 6, timeLimitMs: 600_000 })
    const titles = ['Flood 1', 'Flood 2', 'Flood 3', 'Flood 4']
    // supertest sends on then(): start all four now.
    const flood = titles.map((t) => create(r, { content: mediumContent(t), message: '' }).then((res) => res))
    await inFlight(r, 2)
    const neighbour = await create(r, { content: content({ title: 'Neighbour' }), message: '' }, other)
    const results = await Promise.all(flood)
    expect(neighbour.status).toBe(201)
    expect(results.map((x) => x.status).sort()).toEqual([201, 201, 503, 503])
    for (const refused of results.filter((x) => x.status === 503)) {
      expect(refused.body.error.code).toBe('server_busy')
      expect(refused.body.error.message).toContain('This workspace has 2 run summaries in progress')
      expect(Number(refused.headers['retry-after'])).toBeGreaterThan(0)
    }
    expect(await Scenario.count({ where: { workspaceId: team.workspace.id, title: titles } })).toBe(2)
  }, 180_000)

  it('an account cannot fill the queue through many workspaces: its runs in flight are capped over all of them', async () => {
    const r = await server({ threads: 1, queue: 16, perWorkspace: 2, perAccount: 3, timeLimitMs: 600_000 })
    const second = await buildWorkspace([{ user: team.editor.user, role: 'editor' }], 'Second lab of the same editor')
    const inWs = (ws: string, t: string) => request(r.app).post(`/api/workspaces/${ws}/scenarios`).set(team.editor.auth).send({ content: mediumContent(t), message: '' })
    const burst = [inWs(team.workspace.id, 'Acct 1'), inWs(team.workspace.id, 'Acct 2'), inWs(second.id, 'Acct 3'), inWs(second.id, 'Acct 4')].map((p) => p.then((res) => res))
    await inFlight(r, 3)
    const neighbour = await create(r, { content: content({ title: 'Other account' }), message: '' }, other)
    const results = await Promise.all(burst)
    expect(neighbour.status).toBe(201)
    expect(results.map((x) => x.status).sort()).toEqual([201, 201, 201, 503])
    expect(results.find((x) => x.status === 503)?.body.error.message).toContain('Your account has 3 run summaries in progress')
  }, 180_000)

  it('20 concurrent saves from a stale baseVersion all answer 409 and run no simulation', async () => {
    const r = await server({ threads: 1, queue: 2, perWorkspace: 3, perAccount: 6, timeLimitMs: 600_000 })
    const made = scenarioResponseSchema.parse((await create(r, { content: content({ title: 'Contended' }), message: '' }).expect(201)).body).scenario
    const path = `/api/workspaces/${team.workspace.id}/scenarios/${made.id}/versions`
    await request(r.app).post(path).set(team.owner.auth).send({ baseVersion: 1, content: content({ title: 'Contended v2' }) }).expect(201)
    const runsBefore = r.ctx.runs.started
    const stale = await Promise.all(Array.from({ length: 20 }, (_, i) => request(r.app).post(path).set(team.editor.auth).send({ baseVersion: 1, content: content({ title: `Stale ${i}` }) })))
    expect(stale.map((x) => x.status)).toEqual(Array(20).fill(409))
    expect(stale[0]?.body.error.code).toBe('version_conflict')
    expect(stale[0]?.body.conflict.theirs.number).toBe(2)
    expect(r.ctx.runs.started).toBe(runsBefore)
  })
})
