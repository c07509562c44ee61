/**
 * Suites on the server (real PostgreSQL, real pg-boss, a suite worker): a run
 * passes, the exported suite gives the same verdicts through
 * `chimeline check` as a child process, a run on another preset turns the
 * one claim the preset breaks red and e-mails the watchers through the share
 * mails' path and limits, a new model version with the same results changes
 * no verdict, bad bodies are 400s naming the field, the limits are 429s, and
 * the role matrix (members read and export, owners and editors write,
 * outsiders get 404).
 *
 * The claims are the closed forms of tests/suites/runner.test.ts: one
 * vfadd.vv of 64 e64 elements is 16 cycles on 8 lanes, 24 on the 4 lanes of
 * the starter-4 preset.
 */
import { spawnSync } from 'node:child_process'
import { mkdtempSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { SUITE_MAX_SCENARIOS, SUITE_RUNS_ACTIVE_MAX, type SuiteRun } from '../../shared/schemas/suite'
import { MODEL_VERSION } from '../../shared/sim/timing/version'
import { MailSend, OutboxMessage, SuiteRun as SuiteRunRow } from '../../server/models'
import type { Runtime } from '../../server/runtime'
import { runSuiteJob, startSuiteWorker, type SuiteWorker } from '../../server/worker-suites'
import { startTestServer, waitForMail } from '../server/helpers'
import { buildScenario, buildTeam, type Team } from '../server/scenario-helpers'

const root = join(import.meta.dirname, '..', '..')
const tmp = mkdtempSync(join(tmpdir(), 'chimeline-suites-'))
const VFADD = '  li a0, 64\n  vsetvli t0, a0, e64, m1, ta, ma\n  vfadd.vv v3, v1, v2\n'
const CLAIMS = [
  { kind: 'metric', metric: 'cycles', op: '<=', value: 16 },
  { kind: 'stall', reason: 'bank', op: '==', value: 0 },
  { kind: 'metric', metric: 'flops', op: '==', value: 64 },
]

let runtime: Runtime
let team: Team
let worker: SuiteWorker
let scenarioId: string
let suiteId: string

const api = () => request(runtime.app)
const base = () => `/api/workspaces/${team.workspace.id}/suites`

async function waitForRun(runId: string): Promise<SuiteRun> {
  for (let i = 0; i < 240; i++) {
    const run = (await api().get(`${base()}/${suiteId}/runs/${runId}`).set(team.viewer.auth).expect(200)).body.run as SuiteRun
    if (run.status !== 'queued' && run.status !== 'running') return run
    await new Promise((resolve) => setTimeout(resolve, 250))
  }
  throw new Error('the suite run did not finish')
}

const verdictsOf = (run: SuiteRun) => run.entries.flatMap((e) => e.results.map((r) => `${r.pass ? 'PASS' : 'FAIL'}  ${e.title} › ${r.text} (measured ${r.measured}`))

function cli(file: string, ...args: string[]) {
  const r = spawnSync(process.execPath, ['bin/chimeline.js', 'check', file, ...args], { cwd: root, encoding: 'utf8', timeout: 120_000 })
  return { code: r.status, lines: r.stdout.split('\n').filter((l) => /^(PASS|FAIL) /.test(l)), stdout: r.stdout }
}

beforeAll(async () => {
  runtime = await startTestServer()
  team = await buildTeam(runtime, 'Suite lab')
  scenarioId = (await buildScenario(runtime, team, { title: 'One vfadd', program: VFADD, machine: {}, expectations: CLAIMS } as never)).id
  worker = await startSuiteWorker({ config: runtime.ctx.config, sequelize: runtime.ctx.sequelize, mailer: runtime.ctx.mailer, logger: runtime.ctx.logger })
}, 60_000)

afterAll(async () => {
  await worker?.stop()
  await runtime?.close()
})

describe('suites', () => {
  it('run on the worker, keep the model version, and give the CLI’s verdicts for the exported bundle', async () => {
    const created = await api().post(base()).set(team.editor.auth).send({ title: 'Adds', scenarioIds: [scenarioId], watcherIds: [team.viewer.user.id] })
    expect(created.status).toBe(201)
    suiteId = created.body.suite.id
    expect(created.body.suite).toMatchObject({ title: 'Adds', presetId: null, scenarios: [{ id: scenarioId, title: 'One vfadd', version: 1, expectations: 3 }], watchers: [{ id: team.viewer.user.id }] })

    const queued = await api().post(`${base()}/${suiteId}/runs`).set(team.editor.auth).send({})
    expect(queued.status).toBe(201)
    const run = await waitForRun(queued.body.run.id)
    expect(run).toMatchObject({ status: 'passed', passed: 3, failed: 0, modelVersion: MODEL_VERSION, presetId: null })
    expect(run.entries[0]).toMatchObject({ scenarioId, version: 1, status: 'ok' })
    expect(run.entries[0]?.figures?.cycles).toBe(16)

    const exported = await api().get(`${base()}/${suiteId}/export`).set(team.viewer.auth).expect(200)
    expect(exported.headers['content-disposition']).toContain('Adds.chimeline.json')
    expect(exported.body.suite).toEqual({ title: 'Adds', presetId: null })
    const file = join(tmp, 'adds.json')
    writeFileSync(file, JSON.stringify(exported.body))
    const checked = cli(file)
    expect(checked.code).toBe(0)
    expect(checked.lines.map((l) => l.replace(/\)$/, ''))).toEqual(verdictsOf(run))
  }, 120_000)

  it('on another preset turns the cycles claim red, e-mails the watchers, and the CLI agrees on the export', async () => {
    const since = new Date()
    await api().patch(`${base()}/${suiteId}`).set(team.editor.auth).send({ title: 'Adds', scenarioIds: [scenarioId], presetId: 'starter-4', watcherIds: [team.viewer.user.id] }).expect(200)
    const queued = await api().post(`${base()}/${suiteId}/runs`).set(team.editor.auth).send({})
    const run = await waitForRun(queued.body.run.id)
    expect(run).toMatchObject({ status: 'failed', passed: 2, failed: 1, presetId: 'starter-4' })
    const failing = run.entries[0]?.results.find((r) => !r.pass)
    expect(failing).toMatchObject({ text: 'cycles <= 16', measured: '24' })
    expect(failing?.at?.cycle).toBe(23)
    // Against the run before (default machine): exactly this claim flipped, with the machine as the change.
    expect(run.previous).toMatchObject({ presetId: null, modelVersion: MODEL_VERSION, changed: ['One vfadd › cycles <= 16: pass -> FAIL'] })

    const mail = await waitForMail(team.viewer.user.email, since, 10_000)
    expect(mail.subject).toBe('Suite "Adds": 1 expectation(s) failing')
    expect(mail.text).toContain('One vfadd › cycles <= 16 (measured 24)')
    expect(mail.text).toContain(`/suites/${suiteId}?run=${run.id}`)
    expect((await api().get(`${base()}/${suiteId}/runs/${run.id}`).set(team.viewer.auth)).body.run.message).toBe('e-mailed 1 watcher(s)')

    const exported = await api().get(`${base()}/${suiteId}/export`).set(team.viewer.auth).expect(200)
    const file = join(tmp, 'adds-starter.json')
    writeFileSync(file, JSON.stringify(exported.body))
    const checked = cli(file)
    expect(checked.code).toBe(1)
    expect(checked.stdout).toContain('SUITE Adds on preset starter-4')
    expect(checked.lines.map((l) => l.replace(/[;)].*$/, ''))).toEqual(verdictsOf(run))

    // The run body's preset wins over the suite's for one run (a characterisation on another machine).
    const onDefault = await waitForRun((await api().post(`${base()}/${suiteId}/runs`).set(team.editor.auth).send({ presetId: 'default-8' }).expect(201)).body.run.id)
    expect(onDefault).toMatchObject({ status: 'passed', presetId: 'default-8' })
  }, 120_000)

  it('gives the same verdicts under a new model version whose results are unchanged', async () => {
    // The worker records the version it was given; a bumped number with the same engine is a model change that moved nothing.
    const runs = (await api().get(`${base()}/${suiteId}/runs`).set(team.viewer.auth).expect(200)).body.runs as SuiteRun[]
    // The history counts each run's scenarios without sending their verdicts.
    expect(runs.map((r) => [r.status, r.scenarios, 'entries' in r])).toEqual([['passed', 1, false], ['failed', 1, false], ['passed', 1, false]])
    const previous = (await api().get(`${base()}/${suiteId}/runs/${runs.find((r) => r.presetId === 'default-8')?.id}`).set(team.viewer.auth)).body.run as SuiteRun
    const row = await SuiteRunRow.create({ suiteId, workspaceId: team.workspace.id, status: 'queued', presetId: 'default-8', modelVersion: null, message: null, startedById: team.editor.user.id, finishedAt: null })
    await runSuiteJob({ config: runtime.ctx.config, sequelize: runtime.ctx.sequelize, mailer: runtime.ctx.mailer, logger: runtime.ctx.logger, modelVersion: MODEL_VERSION + 1 }, { runId: row.id })
    const bumped = (await api().get(`${base()}/${suiteId}/runs/${row.id}`).set(team.viewer.auth)).body.run as SuiteRun
    expect(bumped.modelVersion).toBe(MODEL_VERSION + 1)
    expect(bumped.status).toBe('passed')
    expect(verdictsOf(bumped)).toEqual(verdictsOf(previous))
    expect(bumped.previous).toMatchObject({ modelVersion: MODEL_VERSION, changed: [] })
    // A retried job finds the run finished and writes nothing again.
    await runSuiteJob({ config: runtime.ctx.config, sequelize: runtime.ctx.sequelize, mailer: runtime.ctx.mailer, logger: runtime.ctx.logger, modelVersion: 99 }, { runId: row.id })
    expect((await SuiteRunRow.findByPk(row.id))?.modelVersion).toBe(MODEL_VERSION + 1)
  }, 60_000)

  it('sends nothing past the starter’s mail budget, and says so on the run', async () => {
    // The share e-mails' limits (mail-limits.ts), here with a budget of 0 messages an hour for the starter's account.
    const budget = { perHour: 0, perDay: 0, recipientsPerMessage: 5 }
    const config = { ...runtime.ctx.config, mailLimits: { enabled: true, regular: budget, newAccount: budget, newAccountDays: 1 } }
    const row = await SuiteRunRow.create({ suiteId, workspaceId: team.workspace.id, status: 'queued', presetId: 'starter-4', modelVersion: null, message: null, startedById: team.editor.user.id, finishedAt: null })
    const before = await OutboxMessage.count()
    await runSuiteJob({ config, sequelize: runtime.ctx.sequelize, mailer: runtime.ctx.mailer, logger: runtime.ctx.logger }, { runId: row.id })
    const run = await SuiteRunRow.findByPk(row.id)
    expect(run?.status).toBe('failed')
    expect(run?.message).toMatch(/^watchers not e-mailed: An account younger than 1 day\(s\) may have the server send 0 e-mail\(s\) per hour/)
    expect(await OutboxMessage.count()).toBe(before)
    expect(await MailSend.count({ where: { userId: team.editor.user.id, kind: 'suite-run' } })).toBe(0)
  })

  it('answers bad bodies with 400 naming the field', async () => {
    const other = (await buildTeam(runtime, 'Elsewhere')).workspace
    void other
    const foreign = '00000000-0000-4000-8000-000000000000'
    const cases: [unknown, string][] = [
      [{ title: '', scenarioIds: [scenarioId] }, 'title'],
      [{ title: 'x', scenarioIds: [] }, 'scenarioIds'],
      [{ title: 'x', scenarioIds: [scenarioId, scenarioId] }, 'scenarioIds'],
      [{ title: 'x', scenarioIds: Array.from({ length: SUITE_MAX_SCENARIOS + 1 }, () => crypto.randomUUID()) }, 'scenarioIds'],
      [{ title: 'x', scenarioIds: ['not-a-uuid'] }, 'scenarioIds.0'],
      [{ title: 'x', scenarioIds: [scenarioId, foreign] }, 'scenarioIds.1'],
      [{ title: 'x', scenarioIds: [scenarioId], presetId: 'no-such' }, 'presetId'],
      [{ title: 'x', scenarioIds: [scenarioId], watcherIds: [team.outsider.user.id] }, 'watcherIds.0'],
      [{ title: 'x', scenarioIds: [scenarioId], extra: 1 }, 'body'],
    ]
    for (const [body, field] of cases) {
      const res = await api().post(base()).set(team.editor.auth).send(body as object)
      expect(res.status, JSON.stringify(body).slice(0, 80)).toBe(400)
      expect(Object.keys(res.body.error.fields ?? {}).some((k) => k === field || k.startsWith(`${field}`)), `${field} in ${JSON.stringify(res.body.error)}`).toBe(true)
    }
    const badRun = await api().post(`${base()}/${suiteId}/runs`).set(team.editor.auth).send({ presetId: 'nope' })
    expect(badRun.status).toBe(400)
    expect(badRun.body.error.fields).toHaveProperty('presetId')
  })

  it(`queues at most ${SUITE_RUNS_ACTIVE_MAX} runs of a workspace at once (429 past it)`, async () => {
    await worker.stop()
    const started: string[] = []
    for (let i = 0; i < SUITE_RUNS_ACTIVE_MAX; i++) started.push((await api().post(`${base()}/${suiteId}/runs`).set(team.editor.auth).send({}).expect(201)).body.run.id)
    const over = await api().post(`${base()}/${suiteId}/runs`).set(team.editor.auth).send({})
    expect(over.status).toBe(429)
    expect(over.headers['retry-after']).toBeDefined()
    await SuiteRunRow.update({ status: 'error' }, { where: { id: started } })
    worker = await startSuiteWorker({ config: runtime.ctx.config, sequelize: runtime.ctx.sequelize, mailer: runtime.ctx.mailer, logger: runtime.ctx.logger })
  }, 60_000)

  it('lets members read and export, owners and editors change and run, and hides suites from outsiders', async () => {
    const body = { title: 'Roles', scenarioIds: [scenarioId] }
    expect((await api().post(base()).set(team.viewer.auth).send(body)).status).toBe(403)
    expect((await api().post(base()).set(team.outsider.auth).send(body)).status).toBe(404)
    const id = (await api().post(base()).set(team.owner.auth).send(body).expect(201)).body.suite.id
    expect((await api().get(base()).set(team.viewer.auth)).status).toBe(200)
    expect((await api().get(`${base()}/${id}/export`).set(team.viewer.auth)).status).toBe(200)
    expect((await api().get(`${base()}/${id}`).set(team.outsider.auth)).status).toBe(404)
    expect((await api().post(`${base()}/${id}/runs`).set(team.viewer.auth).send({})).status).toBe(403)
    expect((await api().patch(`${base()}/${id}`).set(team.viewer.auth).send(body)).status).toBe(403)
    expect((await api().delete(`${base()}/${id}`).set(team.viewer.auth)).status).toBe(403)
    expect((await api().delete(`${base()}/${id}`).set(team.editor.auth)).status).toBe(204)
    expect((await api().get(`${base()}/${id}`).set(team.owner.auth)).status).toBe(404)
  })
})
