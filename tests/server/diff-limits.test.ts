/**
 * Issue 9, hardening item 2: the version diff of two programs at the program
 * field's limit (200,000 characters each) answers, on the work pool and not
 * on the request thread, with a correct diff (coarse past the edit budget).
 */
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Runtime } from '../../server/runtime'
import { SCENARIO_PROGRAM_MAX_LENGTH, versionDiffResponseSchema } from '../../shared/schemas/scenario'
import { startTestServer } from './helpers'
import { buildTeam, content, type Team } from './scenario-helpers'

let runtime: Runtime
let team: Team
beforeAll(async () => {
  runtime = await startTestServer()
  team = await buildTeam(runtime, 'Diff limits lab')
})
afterAll(async () => {
  await runtime.close()
})

/** Our own filler: distinct addi lines, cut to exactly the limit at a line end. */
function program(register: string): string {
  let text = ''
  for (let i = 0; ; i++) {
    const line = `  addi ${register}, ${register}, ${i % 2000}\n`
    if (text.length + line.length > SCENARIO_PROGRAM_MAX_LENGTH) break
    text += line
  }
  return text
}

describe('version diff at the limits', () => {
  it('two 200,000-character programs that differ on every line: 200, coarse and correct, computed on the work pool', async () => {
    const a = program('a0')
    const b = program('t1')
    expect(a.length).toBeGreaterThan(SCENARIO_PROGRAM_MAX_LENGTH - 40)
    const base = `/api/workspaces/${team.workspace.id}/scenarios`
    const made = await request(runtime.app).post(base).set(team.editor.auth).send({ content: content({ program: a, machine: {} }) }).expect(201)
    const id = made.body.scenario.id as string
    await request(runtime.app).post(`${base}/${id}/versions`).set(team.editor.auth).send({ baseVersion: 1, content: content({ program: b, machine: {} }) }).expect(201)
    const before = runtime.ctx.work.started
    const res = await request(runtime.app).get(`${base}/${id}/versions/diff?from=1&to=2`).set(team.viewer.auth)
    expect(res.status).toBe(200)
    expect(runtime.ctx.work.started).toBe(before + 1)
    const { diff } = versionDiffResponseSchema.parse(res.body)
    expect(diff.program.exact).toBe(false)
    const lines = (t: string) => t.split('\n').slice(0, -1).length
    expect(diff.program.removed).toBe(lines(a))
    expect(diff.program.added).toBe(lines(b))
    const deleted = diff.program.changes.filter((c) => c.op === 'delete').flatMap((c) => c.lines)
    expect(`${deleted.join('\n')}\n`).toBe(a)
  })

  it('a small edit of a 200,000-character program is an exact diff naming the one line', async () => {
    const a = program('a0')
    const lines = a.split('\n')
    lines[5000] = '  addi a0, a0, 9999'
    const b = lines.join('\n')
    const base = `/api/workspaces/${team.workspace.id}/scenarios`
    const id = (await request(runtime.app).post(base).set(team.editor.auth).send({ content: content({ program: a, machine: {} }) }).expect(201)).body.scenario.id as string
    await request(runtime.app).post(`${base}/${id}/versions`).set(team.editor.auth).send({ baseVersion: 1, content: content({ program: b, machine: {} }) }).expect(201)
    const { diff } = versionDiffResponseSchema.parse((await request(runtime.app).get(`${base}/${id}/versions/diff?from=1&to=2`).set(team.viewer.auth).expect(200)).body)
    expect(diff.program).toMatchObject({ exact: true, added: 1, removed: 1 })
    expect(diff.program.changes.find((c) => c.op === 'insert')).toEqual({ op: 'insert', oldStart: null, newStart: 5001, lines: ['  addi a0, a0, 9999'] })
  })
})
