/**
 * Saved versions' run summaries run on worker threads (server/services/run-pool.ts):
 * a long save leaves the server answering, a run over the time limit is saved
 * with a 'failed' summary, and a full queue is a 503 that saves nothing.
 */
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { Scenario, ScenarioVersion } from '../../server/models'
import type { Runtime } from '../../server/runtime'
import { scenarioResponseSchema } from '../../shared/schemas/scenario'
import { startTestServer } from './helpers'
import { buildTeam, content, type Team } from './scenario-helpers'

/**
 * Our own kernel: 100,000 strip-mined FP64 adds on the default machine, about
 * 400,000 steps and 880,000 cycles, within SAVE_RUN_LIMITS; it takes about two
 * seconds of one core on this kind of machine.
 */
const LONG = `  li a1, 100000
  li a0, 64
loop:
  vsetvli t0, a0, e64, m1, ta, ma
  vfadd.vv v1, v1, v2
  addi a1, a1, -1
  bnez a1, loop
`
const longContent = (title: string) => content({ title, program: LONG, machine: {} })

const runtimes: Runtime[] = []
async function server(saveRuns?: Runtime['ctx']['config']['saveRuns']): Promise<Runtime> {
  const first = runtimes[0]
  const r = await startTestServer(saveRuns ? { saveRuns } : {}, first)
  runtimes.push(r)
  return r
}

let team: Team
beforeAll(async () => {
  team = await buildTeam(await server(), 'Save runs lab')
})
afterAll(async () => {
  for (const r of runtimes.reverse()) await r.close()
})

const create = (r: Runtime, body: object) => request(r.app).post(`/api/workspaces/${team.workspace.id}/scenarios`).set(team.editor.auth).send(body)

describe('run summaries off the request thread', () => {
  it('while a long save runs, GET /api/health keeps answering, never 500 ms apart (a behaviour check, not a benchmark)', async () => {
    const r = await server({ threads: 1, queue: 4, timeLimitMs: 60_000 })
    const started = performance.now()
    let done = false
    const save = create(r, { content: longContent('Long save'), message: 'long' }).then((res) => {
      done = true
      return res
    })
    // The test and the server share this process, so a blocked event loop would stall
    // the asking too: measure the gaps between answers, which tile the whole save.
    const gaps: number[] = []
    let last = started
    while (!done) {
      const health = await request(r.app).get('/api/health')
      expect(health.status).toBe(200)
      const now = performance.now()
      gaps.push(now - last)
      last = now
      await new Promise((resolve) => setTimeout(resolve, 20))
    }
    const res = await save
    const saveMs = performance.now() - started
    expect(res.status).toBe(201)
    const saved = scenarioResponseSchema.parse(res.body).scenario
    expect(saved.run).toMatchObject({ status: 'ok' })
    // The save was long enough to matter: an inline run would have held a health answer for over a second.
    expect(saveMs).toBeGreaterThan(1000)
    expect(gaps.length).toBeGreaterThanOrEqual(5)
    expect(Math.max(...gaps)).toBeLessThan(500)
  })

  it('a run over the time limit is stopped and the version is kept with a failed summary that says so', async () => {
    const r = await server({ threads: 1, queue: 4, timeLimitMs: 300 })
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
    const r = await server({ threads: 1, queue: 1, timeLimitMs: 1000 })
    const titles = ['Busy 1', 'Busy 2', 'Busy 3']
    const results = await Promise.all(titles.map((t) => create(r, { content: longContent(t), message: '' })))
    expect(results.map((x) => x.status).sort()).toEqual([201, 201, 503])
    const refused = results.find((x) => x.status === 503)
    expect(refused?.body.error.code).toBe('server_busy')
    expect(refused?.body.error.message).toContain('nothing was saved')
    const stored = await Scenario.count({ where: { workspaceId: team.workspace.id, title: titles } })
    expect(stored).toBe(2)
    expect(r.ctx.runs.inFlight).toBe(0)
    await create(r, { content: content({ title: 'After the rush' }), message: '' }).expect(201)
  })

  it('initial data that does not fit is still a 400 naming the entry, computed on the worker', async () => {
    const r = await server()
    const res = await create(r, { content: content({ initialData: [{ label: 'nowhere', type: 'f64', values: ['1'] }] }), message: '' })
    expect(res.status).toBe(400)
    expect(res.body.error.fields).toEqual({ 'content.initialData.0': 'no data label "nowhere" in the program\'s .data' })
  })
})
