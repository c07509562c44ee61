/**
 * Factories for scenario tests: a workspace with one member per role, and a
 * scenario made through the API (so it has a real version 1 and run summary).
 */
import request from 'supertest'
import type { Workspace } from '../../server/models'
import type { Runtime } from '../../server/runtime'
import { scenarioResponseSchema, type Scenario, type ScenarioContentInput } from '../../shared/schemas/scenario'
import { buildUser, buildWorkspace, type BuiltUser } from './helpers'

/** Our own kernel: a strip-mined FP64 saxpy (y = a*x + y) over 10 elements, a ragged tail at VLEN 128. */
export const SAXPY = `  .data
  .balign 8
x: .double 1, 2, 3, 4, 5, 6, 7, 8, 9, 10
y: .double 10, 20, 30, 40, 50, 60, 70, 80, 90, 100
a: .double 2.0
  .text
  li a0, 10
  la a1, x
  la a2, y
  la t1, a
  fld fa0, 0(t1)
loop:
  vsetvli t0, a0, e64, m1, ta, ma
  vle64.v v0, (a1)
  vle64.v v1, (a2)
  vfmacc.vf v1, fa0, v0
  vse64.v v1, (a2)
  slli t2, t0, 3
  add a1, a1, t2
  add a2, a2, t2
  sub a0, a0, t0
  bnez a0, loop
`

export interface Team {
  workspace: Workspace
  owner: BuiltUser
  editor: BuiltUser
  viewer: BuiltUser
  outsider: BuiltUser
}

export async function buildTeam(runtime: Runtime, name = 'Scenario lab'): Promise<Team> {
  const [owner, editor, viewer, outsider] = [await buildUser(runtime, { name: 'Olive Owner' }), await buildUser(runtime, { name: 'Eddie Editor' }), await buildUser(runtime, { name: 'Vera Viewer' }), await buildUser(runtime, { name: 'Otto Outsider' })]
  const workspace = await buildWorkspace([{ user: owner.user, role: 'owner' }, { user: editor.user, role: 'editor' }, { user: viewer.user, role: 'viewer' }], name)
  return { workspace, owner, editor, viewer, outsider }
}

export function content(overrides: Partial<ScenarioContentInput> = {}): ScenarioContentInput {
  return { title: 'Saxpy, ragged tail', program: SAXPY, machine: { lanes: 4, vlen: 512 }, tags: ['saxpy'], ...overrides }
}

export async function buildScenario(runtime: Runtime, team: Team, overrides: Partial<ScenarioContentInput> = {}, by: BuiltUser = team.editor): Promise<Scenario> {
  const res = await request(runtime.app).post(`/api/workspaces/${team.workspace.id}/scenarios`).set(by.auth).send({ content: content(overrides), message: 'First' })
  if (res.status !== 201) throw new Error(`create scenario: ${res.status} ${JSON.stringify(res.body)}`)
  return scenarioResponseSchema.parse(res.body).scenario
}
