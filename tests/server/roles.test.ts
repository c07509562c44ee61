/**
 * The authorization matrix: every actor x every action, allowed and denied.
 * The expected table is written out here, independently of the server's own
 * permission table, from the roles' definitions (common practice for
 * owner/editor/viewer groups): owners administer the workspace and its
 * members, editors and viewers may read it and its member list, any member may
 * leave; only a site admin reads the Outbox; outsiders do not learn that a
 * workspace exists (404).
 */
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { Membership, type User, type Workspace } from '../../server/models'
import type { Runtime } from '../../server/runtime'
import { buildUser, buildWorkspace, startTestServer, uniqueEmail, type BuiltUser } from './helpers'

type Actor = 'anonymous' | 'outsider' | 'siteAdmin' | 'viewer' | 'editor' | 'owner'
const ACTORS: Actor[] = ['anonymous', 'outsider', 'siteAdmin', 'viewer', 'editor', 'owner']

interface World {
  workspace: Workspace
  users: Record<Exclude<Actor, 'anonymous'>, BuiltUser>
  /** A second editor, the target of member actions. */
  target: User
}

interface Action {
  name: string
  method: 'get' | 'post' | 'patch' | 'delete'
  path: (w: World, actor: Actor) => string
  body?: (w: World) => object
  /** Status of an allowed call. */
  ok: number
  allowed: Actor[]
}

const WORKSPACE_MEMBERS: Actor[] = ['viewer', 'editor', 'owner']
const SIGNED_IN: Actor[] = ['outsider', 'siteAdmin', 'viewer', 'editor', 'owner']

const ACTIONS: Action[] = [
  { name: 'read my profile (GET /api/me)', method: 'get', path: () => '/api/me', ok: 200, allowed: SIGNED_IN },
  { name: 'list my workspaces', method: 'get', path: () => '/api/workspaces', ok: 200, allowed: SIGNED_IN },
  { name: 'create a workspace', method: 'post', path: () => '/api/workspaces', body: () => ({ name: 'New one' }), ok: 201, allowed: SIGNED_IN },
  { name: 'read the workspace', method: 'get', path: (w) => `/api/workspaces/${w.workspace.id}`, ok: 200, allowed: WORKSPACE_MEMBERS },
  { name: 'rename the workspace', method: 'patch', path: (w) => `/api/workspaces/${w.workspace.id}`, body: () => ({ name: 'Renamed' }), ok: 200, allowed: ['owner'] },
  { name: 'delete the workspace', method: 'delete', path: (w) => `/api/workspaces/${w.workspace.id}`, ok: 204, allowed: ['owner'] },
  { name: 'list members', method: 'get', path: (w) => `/api/workspaces/${w.workspace.id}/members`, ok: 200, allowed: WORKSPACE_MEMBERS },
  {
    name: 'invite by e-mail',
    method: 'post',
    path: (w) => `/api/workspaces/${w.workspace.id}/invitations`,
    body: () => ({ email: uniqueEmail('invitee'), role: 'viewer' }),
    ok: 201,
    allowed: ['owner'],
  },
  {
    name: 'invite a class (bulk)',
    method: 'post',
    path: (w) => `/api/workspaces/${w.workspace.id}/invitations/bulk`,
    body: () => ({ addresses: `${uniqueEmail('student')}\n${uniqueEmail('student')}` }),
    ok: 201,
    allowed: ['owner'],
  },
  {
    name: "change another member's role",
    method: 'patch',
    path: (w) => `/api/workspaces/${w.workspace.id}/members/${w.target.id}`,
    body: () => ({ role: 'viewer' }),
    ok: 200,
    allowed: ['owner'],
  },
  {
    name: 'remove another member',
    method: 'delete',
    path: (w) => `/api/workspaces/${w.workspace.id}/members/${w.target.id}`,
    ok: 204,
    allowed: ['owner'],
  },
  {
    // The owner is the only owner here, so leaving is refused for another reason (409), tested below.
    name: 'leave the workspace (remove myself)',
    method: 'delete',
    path: (w, actor) => `/api/workspaces/${w.workspace.id}/members/${actor === 'anonymous' ? w.target.id : w.users[actor].user.id}`,
    ok: 204,
    allowed: ['viewer', 'editor'],
  },
  { name: 'read the Outbox', method: 'get', path: () => '/api/admin/outbox', ok: 200, allowed: ['siteAdmin'] },
]

const WORKSPACE_ROUTE = /^\/api\/workspaces\/[^/]+/

/** The status a denied actor gets: 401 without sign-in, 404 outside the workspace, else 403. */
function deniedStatus(action: Action, actor: Actor, path: string): number {
  if (actor === 'anonymous') return 401
  if (WORKSPACE_ROUTE.test(path) && (actor === 'outsider' || actor === 'siteAdmin')) return 404
  if (actor === 'owner' && action.name.startsWith('leave')) return 409
  return 403
}

let runtime: Runtime
let people: World['users']

beforeAll(async () => {
  runtime = await startTestServer()
  people = {
    outsider: await buildUser(runtime),
    siteAdmin: await buildUser(runtime, { role: 'admin' }),
    viewer: await buildUser(runtime),
    editor: await buildUser(runtime),
    owner: await buildUser(runtime),
  }
})
afterAll(async () => {
  await runtime.close()
})

/** A fresh workspace per case, so destructive actions do not affect the next one. */
async function freshWorld(): Promise<World> {
  const target = (await buildUser(runtime)).user
  const workspace = await buildWorkspace([
    { user: people.owner.user, role: 'owner' },
    { user: people.editor.user, role: 'editor' },
    { user: people.viewer.user, role: 'viewer' },
    { user: target, role: 'editor' },
  ])
  return { workspace, users: people, target }
}

const cases = ACTIONS.flatMap((action) =>
  ACTORS.map((actor) => ({ action, actor, allowed: action.allowed.includes(actor), label: `${actor} may ${action.allowed.includes(actor) ? '' : 'not '}${action.name}` })),
)

describe('role matrix', () => {
  it.each(cases)('$label', async ({ action, actor, allowed }) => {
    const world = await freshWorld()
    const path = action.path(world, actor)
    let req = request(runtime.app)[action.method](path)
    if (actor !== 'anonymous') req = req.set(world.users[actor].auth)
    const res = await (action.body ? req.send(action.body(world)) : req)
    const expected = allowed ? action.ok : deniedStatus(action, actor, path)
    expect({ status: res.status, code: res.body?.error?.code }).toMatchObject({ status: expected })
    if (!allowed) expect(res.body.error.code).toBe({ 401: 'unauthenticated', 403: 'forbidden', 404: 'not_found', 409: 'conflict' }[expected])
  })
})

describe('effects of allowed actions', () => {
  it('a viewer who leaves is no longer a member', async () => {
    const world = await freshWorld()
    await request(runtime.app).delete(`/api/workspaces/${world.workspace.id}/members/${people.viewer.user.id}`).set(people.viewer.auth).expect(204)
    expect(await Membership.findOne({ where: { workspaceId: world.workspace.id, userId: people.viewer.user.id } })).toBeNull()
    await request(runtime.app).get(`/api/workspaces/${world.workspace.id}`).set(people.viewer.auth).expect(404)
  })

  it('the last owner can neither leave nor step down; with a second owner they can', async () => {
    const world = await freshWorld()
    const base = `/api/workspaces/${world.workspace.id}/members`
    const refused = await request(runtime.app).patch(`${base}/${people.owner.user.id}`).set(people.owner.auth).send({ role: 'editor' })
    expect(refused.status).toBe(409)
    expect(refused.body.error.message).toBe('A workspace needs an owner: make someone else owner first')
    await request(runtime.app).patch(`${base}/${world.target.id}`).set(people.owner.auth).send({ role: 'owner' }).expect(200)
    await request(runtime.app).delete(`${base}/${people.owner.user.id}`).set(people.owner.auth).expect(204)
  })

  it('a role change takes effect on the next request', async () => {
    const world = await freshWorld()
    const path = `/api/workspaces/${world.workspace.id}`
    await request(runtime.app).patch(path).set(people.editor.auth).send({ name: 'Nope' }).expect(403)
    await request(runtime.app).patch(`${path}/members/${people.editor.user.id}`).set(people.owner.auth).send({ role: 'owner' }).expect(200)
    const res = await request(runtime.app).patch(path).set(people.editor.auth).send({ name: 'Now allowed' })
    expect(res.status).toBe(200)
    expect(res.body.workspace).toMatchObject({ name: 'Now allowed', role: 'owner' })
  })

  it('the creator of a workspace becomes its owner', async () => {
    const res = await request(runtime.app).post('/api/workspaces').set(people.outsider.auth).send({ name: '  Corner cases ' })
    expect(res.status).toBe(201)
    expect(res.body.workspace).toMatchObject({ name: 'Corner cases', role: 'owner' })
    const list = await request(runtime.app).get('/api/workspaces').set(people.outsider.auth).expect(200)
    expect(list.body.workspaces).toContainEqual(res.body.workspace)
  })

  it('a workspace id that is not a UUID is simply not found', async () => {
    const res = await request(runtime.app).get('/api/workspaces/not-a-uuid').set(people.owner.auth)
    expect(res.status).toBe(404)
    expect(res.body.error).toEqual({ code: 'not_found', message: 'No such workspace' })
  })
})
