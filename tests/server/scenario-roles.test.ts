/**
 * The role matrix of issue 6's routes: every actor x every action, allowed and
 * denied. The expected table is written out here from the roles' definitions
 * (common practice for owner/editor/viewer groups): viewers read, editors
 * also write and share, owners also delete, undo deletes and revoke anyone's
 * links; outsiders do not learn that a workspace exists (404); the public
 * share endpoint serves anyone with an `anyone` link.
 */
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { Membership, Workspace } from '../../server/models'
import type { Runtime } from '../../server/runtime'
import { buildUser, buildWorkspace, startTestServer, type BuiltUser } from './helpers'
import { SAXPY, content } from './scenario-helpers'

type Actor = 'anonymous' | 'outsider' | 'viewer' | 'editor' | 'owner'
const ACTORS: Actor[] = ['anonymous', 'outsider', 'viewer', 'editor', 'owner']
const MEMBERS: Actor[] = ['viewer', 'editor', 'owner']
const WRITERS: Actor[] = ['editor', 'owner']

interface World {
  ws: string
  scenario: string
  trashed: string
  ownerLink: { id: string; token: string }
  editorLink: { id: string; token: string }
  deletedWs: string
}

interface Action {
  name: string
  method: 'get' | 'post' | 'delete'
  path: (w: World) => string
  body?: (w: World) => object
  file?: { name: string; text: string }
  ok: number
  allowed: Actor[]
}

const S = (w: World) => `/api/workspaces/${w.ws}/scenarios/${w.scenario}`
const ACTIONS: Action[] = [
  { name: 'list scenarios', method: 'get', path: (w) => `/api/workspaces/${w.ws}/scenarios`, ok: 200, allowed: MEMBERS },
  { name: 'list the trash', method: 'get', path: (w) => `/api/workspaces/${w.ws}/scenarios?trash=true`, ok: 200, allowed: MEMBERS },
  { name: 'read a scenario', method: 'get', path: S, ok: 200, allowed: MEMBERS },
  { name: 'create a scenario', method: 'post', path: (w) => `/api/workspaces/${w.ws}/scenarios`, body: () => ({ content: content() }), ok: 201, allowed: WRITERS },
  { name: 'save a version', method: 'post', path: (w) => `${S(w)}/versions`, body: () => ({ baseVersion: 1, content: content({ title: 'v2' }) }), ok: 201, allowed: WRITERS },
  { name: 'duplicate a scenario', method: 'post', path: (w) => `${S(w)}/duplicate`, body: () => ({}), ok: 201, allowed: WRITERS },
  { name: 'delete a scenario', method: 'delete', path: S, ok: 200, allowed: ['owner'] },
  { name: 'undo a scenario delete', method: 'post', path: (w) => `/api/workspaces/${w.ws}/scenarios/${w.trashed}/undo-delete`, ok: 200, allowed: ['owner'] },
  { name: 'list versions', method: 'get', path: (w) => `${S(w)}/versions`, ok: 200, allowed: MEMBERS },
  { name: 'read a version', method: 'get', path: (w) => `${S(w)}/versions/1`, ok: 200, allowed: MEMBERS },
  { name: 'diff two versions', method: 'get', path: (w) => `${S(w)}/versions/diff?from=1&to=1`, ok: 200, allowed: MEMBERS },
  { name: 'restore a version', method: 'post', path: (w) => `${S(w)}/versions/1/restore`, body: () => ({}), ok: 201, allowed: WRITERS },
  { name: 'export a bundle', method: 'post', path: (w) => `/api/workspaces/${w.ws}/scenarios/export`, body: (w) => ({ scenarioIds: [w.scenario] }), ok: 200, allowed: MEMBERS },
  { name: 'make a share link', method: 'post', path: (w) => `${S(w)}/share-links`, body: () => ({}), ok: 201, allowed: WRITERS },
  { name: 'list share links', method: 'get', path: (w) => `${S(w)}/share-links`, ok: 200, allowed: WRITERS },
  { name: "revoke the owner's link", method: 'post', path: (w) => `/api/workspaces/${w.ws}/share-links/${w.ownerLink.id}/revoke`, ok: 200, allowed: ['owner'] },
  { name: "revoke the editor's link", method: 'post', path: (w) => `/api/workspaces/${w.ws}/share-links/${w.editorLink.id}/revoke`, ok: 200, allowed: WRITERS },
  { name: 'e-mail a share link', method: 'post', path: (w) => `/api/workspaces/${w.ws}/share-links/${w.ownerLink.id}/email`, body: (w) => ({ token: w.ownerLink.token, to: ['matrix-reader@example.test'] }), ok: 202, allowed: WRITERS },
  { name: 'copy a share into the workspace', method: 'post', path: (w) => `/api/workspaces/${w.ws}/scenarios/copy-from-share`, body: (w) => ({ token: w.ownerLink.token }), ok: 201, allowed: WRITERS },
  { name: 'inspect an upload', method: 'post', path: (w) => `/api/workspaces/${w.ws}/uploads/inspect`, file: { name: 'k.s', text: SAXPY }, ok: 200, allowed: WRITERS },
  { name: 'import an upload', method: 'post', path: (w) => `/api/workspaces/${w.ws}/uploads`, file: { name: 'k.s', text: SAXPY }, ok: 201, allowed: WRITERS },
  { name: 'undo a workspace delete', method: 'post', path: (w) => `/api/workspaces/${w.deletedWs}/undo-delete`, ok: 200, allowed: ['owner'] },
  { name: 'open an anyone share link', method: 'get', path: (w) => `/api/shares/${w.ownerLink.token}`, ok: 200, allowed: ACTORS },
  { name: 'read the API description', method: 'get', path: () => '/api/docs', ok: 200, allowed: ACTORS },
]

const PUBLIC = /^\/api\/(shares|docs)/

function deniedStatus(actor: Actor, path: string): number {
  if (actor === 'anonymous') return 401
  if (actor === 'outsider' && !PUBLIC.test(path)) return 404
  return 403
}

let runtime: Runtime
let people: Record<Exclude<Actor, 'anonymous'>, BuiltUser>
beforeAll(async () => {
  runtime = await startTestServer()
  people = { outsider: await buildUser(runtime), viewer: await buildUser(runtime), editor: await buildUser(runtime), owner: await buildUser(runtime) }
})
afterAll(async () => {
  await runtime.close()
})

const team = () => [
  { user: people.owner.user, role: 'owner' as const },
  { user: people.editor.user, role: 'editor' as const },
  { user: people.viewer.user, role: 'viewer' as const },
]

async function freshWorld(): Promise<World> {
  const ws = (await buildWorkspace(team(), 'Matrix lab')).id
  const api = () => request(runtime.app)
  const make = async () => (await api().post(`/api/workspaces/${ws}/scenarios`).set(people.editor.auth).send({ content: content() }).expect(201)).body.scenario.id as string
  const scenario = await make()
  const trashed = await make()
  await api().delete(`/api/workspaces/${ws}/scenarios/${trashed}`).set(people.owner.auth).expect(200)
  const link = async (by: BuiltUser) => {
    const res = await api().post(`/api/workspaces/${ws}/scenarios/${scenario}/share-links`).set(by.auth).send({}).expect(201)
    return { id: res.body.link.id as string, token: res.body.token as string }
  }
  const deleted = await buildWorkspace(team(), 'Deleted lab')
  await Workspace.destroy({ where: { id: deleted.id } })
  return { ws, scenario, trashed, ownerLink: await link(people.owner), editorLink: await link(people.editor), deletedWs: deleted.id }
}

const cases = ACTIONS.flatMap((action) => ACTORS.map((actor) => ({ action, actor, allowed: action.allowed.includes(actor), label: `${actor} may ${action.allowed.includes(actor) ? '' : 'not '}${action.name}` })))

describe('role matrix of scenarios, versions, share links and uploads', () => {
  it.each(cases)('$label', async ({ action, actor, allowed }) => {
    const world = await freshWorld()
    const path = action.path(world)
    let req = request(runtime.app)[action.method](path)
    if (actor !== 'anonymous') req = req.set(people[actor].auth)
    const res = await (action.file ? req.attach('file', Buffer.from(action.file.text), action.file.name) : action.body ? req.send(action.body(world)) : req)
    const expected = allowed ? action.ok : deniedStatus(actor, path)
    expect({ status: res.status, body: res.status === expected ? null : res.body }).toEqual({ status: expected, body: null })
    if (!allowed) expect(res.body.error.code).toBe({ 401: 'unauthenticated', 403: 'forbidden', 404: 'not_found' }[expected])
  })

  it('the world the matrix runs in has exactly three members', async () => {
    const world = await freshWorld()
    expect(await Membership.count({ where: { workspaceId: world.ws } })).toBe(3)
  })
})
