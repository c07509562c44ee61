// @vitest-environment happy-dom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { createPinia, setActivePinia } from 'pinia'
import { scenarioContentSchema, type ScenarioContent } from '@shared/schemas/scenario'
import { STALL_REASONS } from '@shared/sim/trace/types'
import { useAuthStore } from '@/stores/auth'
import { useMembersStore } from '@/stores/members'
import { useScenarioDocumentStore } from '@/stores/scenarioDocument'
import { useScenariosStore } from '@/stores/scenarios'
import { useWorkspaceStore } from '@/stores/workspace'
import { apiError, editor, installFakeServer, json, vectorLab, type FakeRequest } from '../fakeServer'

const SCENARIO_ID = '3a4b5c6d-7e8f-4901-a2b3-c4d5e6f70819'
const OTHER_ID = '4b5c6d7e-8f90-4a12-b3c4-d5e6f7081920'
const WS = `/api/workspaces/${vectorLab.id}`
const now = '2026-03-01T10:00:00.000Z'
const run = { status: 'ok', cycles: 120, flopsPerCycle: 2, stallCycles: Object.fromEntries(STALL_REASONS.map((r) => [r, 0])) }
const author = { id: editor.id, name: editor.name }

function content(program: string): ScenarioContent {
  return scenarioContentSchema.parse({ title: 'saxpy tail', program })
}
function scenario(version: number, program: string) {
  return { id: SCENARIO_ID, workspaceId: vectorLab.id, version, content: content(program), run, author, createdAt: now, updatedAt: now, deletedAt: null, purgeAt: null }
}
function summary(id: string, title: string) {
  return { id, title, tags: ['tail'], version: 1, author, cycles: 120, createdAt: now, updatedAt: now, deletedAt: null, purgeAt: null }
}
function version(number: number, program: string) {
  return { number, message: '', author, createdAt: now, content: content(program), run }
}

async function signIn(routes: Parameters<typeof installFakeServer>[0]) {
  const server = installFakeServer({
    'POST /api/auth/signin': () => json(200, { user: editor, accessToken: 't' }),
    'GET /api/me': () => json(200, { user: editor, workspaces: [vectorLab] }),
    ...routes,
  })
  await useAuthStore().signIn({ email: editor.email, password: 'chimeline-demo-2026' })
  await useWorkspaceStore().load()
  return server
}

const queryOf = (r: FakeRequest) => Object.fromEntries(new URL(r.path, 'http://app.test').searchParams)

beforeEach(() => {
  setActivePinia(createPinia())
  localStorage.clear()
})
afterEach(() => {
  vi.unstubAllGlobals()
})

describe('the scenarios list store', () => {
  it('asks the server for one page with the sort and filters, and shows its total', async () => {
    const server = await signIn({
      [`GET ${WS}/scenarios`]: () => json(200, { scenarios: [summary(SCENARIO_ID, 'saxpy tail')], page: 1, pageSize: 20, total: 41 }),
    })
    const store = useScenariosStore()
    await store.update({ sort: 'title', order: 'asc', tags: ['tail'], q: 'saxpy' })
    const last = server.requests.at(-1)!
    expect(queryOf(last)).toEqual({ page: '1', pageSize: '20', sort: 'title', order: 'asc', tag: 'tail', q: 'saxpy' })
    expect(store.rows.map((r) => r.title)).toEqual(['saxpy tail'])
    expect(store.pageCount).toBe(3)
  })

  it('goes back to page 1 when a filter changes, but not when only the page does', async () => {
    await signIn({ [`GET ${WS}/scenarios`]: () => json(200, { scenarios: [summary(SCENARIO_ID, 'a')], page: 1, pageSize: 20, total: 60 }) })
    const store = useScenariosStore()
    await store.update({ page: 3 })
    expect(store.params.page).toBe(3)
    await store.toggleTag('fp64')
    expect(store.params.page).toBe(1)
    expect(store.params.tags).toEqual(['fp64'])
    await store.toggleTag('fp64')
    expect(store.params.tags).toEqual([])
  })

  it('shows only the newest answer when an older request answers last', async () => {
    let release: (r: Response) => void = () => {}
    let calls = 0
    await signIn({
      [`GET ${WS}/scenarios`]: () => {
        calls += 1
        if (calls === 1) return new Promise<Response>((resolve) => (release = resolve))
        return json(200, { scenarios: [summary(OTHER_ID, 'newest')], page: 1, pageSize: 20, total: 1 })
      },
    })
    const store = useScenariosStore()
    const slow = store.update({ q: 'sa' })
    await store.update({ q: 'saxpy' })
    release(json(200, { scenarios: [summary(SCENARIO_ID, 'stale')], page: 1, pageSize: 20, total: 1 }))
    await slow
    expect(store.rows.map((r) => r.title)).toEqual(['newest'])
  })

  it('moves a scenario to the trash and brings it back with undo', async () => {
    const server = await signIn({
      [`GET ${WS}/scenarios`]: () => json(200, { scenarios: [], page: 1, pageSize: 20, total: 0 }),
      [`DELETE ${WS}/scenarios/${SCENARIO_ID}`]: () => json(200, { scenario: { ...scenario(1, 'x'), deletedAt: now, purgeAt: '2026-03-31T10:00:00.000Z' } }),
      [`POST ${WS}/scenarios/${SCENARIO_ID}/undo-delete`]: () => json(200, { scenario: scenario(1, 'x') }),
    })
    const store = useScenariosStore()
    await store.remove([SCENARIO_ID])
    await store.undo([SCENARIO_ID])
    expect(server.requests.map((r) => `${r.method} ${r.path.split('?')[0]}`).filter((r) => !r.includes('/api/auth') && !r.includes('/api/me'))).toEqual([
      `DELETE ${WS}/scenarios/${SCENARIO_ID}`,
      `GET ${WS}/scenarios`,
      `POST ${WS}/scenarios/${SCENARIO_ID}/undo-delete`,
      `GET ${WS}/scenarios`,
    ])
  })

  it('exports the chosen scenarios as a bundle file named after the title', async () => {
    const bundle = { format: 'chimeline-scenario-bundle', formatVersion: 1, exportedAt: now, scenarios: [{ versions: [{ ...version(1, 'x'), author: editor.name }] }] }
    const server = await signIn({ [`POST ${WS}/scenarios/export`]: () => json(200, bundle) })
    const { fileName, text } = await useScenariosStore().exportBundle([SCENARIO_ID])
    expect(server.requests.at(-1)?.body).toEqual({ scenarioIds: [SCENARIO_ID] })
    expect(fileName).toBe('saxpy-tail.chimeline.json')
    expect(JSON.parse(text)).toEqual(bundle)
  })
})

describe('the open scenario store', () => {
  it('saves a new version from the version it started from', async () => {
    const server = await signIn({
      [`GET ${WS}/scenarios/${SCENARIO_ID}`]: () => json(200, { scenario: scenario(2, 'v2') }),
      [`POST ${WS}/scenarios/${SCENARIO_ID}/versions`]: () => json(201, { scenario: scenario(3, 'mine'), version: version(3, 'mine') }),
    })
    const doc = useScenarioDocumentStore()
    await doc.open(vectorLab.id, SCENARIO_ID)
    expect(doc.isDirty(content('v2'))).toBe(false)
    expect(doc.isDirty(content('mine'))).toBe(true)
    expect(await doc.save(content('mine'), 'tail fixed')).toEqual({ status: 'saved', version: 3 })
    expect(server.requests.at(-1)?.body).toMatchObject({ baseVersion: 2, message: 'tail fixed', content: { program: 'mine' } })
    expect(doc.scenario?.version).toBe(3)
  })

  it('turns a 409 into a conflict with both versions, and "keep mine" saves on top of theirs', async () => {
    const theirs = version(3, 'theirs')
    const saves: unknown[] = []
    await signIn({
      [`GET ${WS}/scenarios/${SCENARIO_ID}`]: () => json(200, { scenario: scenario(2, 'v2') }),
      [`POST ${WS}/scenarios/${SCENARIO_ID}/versions`]: (req) => {
        saves.push(req.body)
        if (saves.length === 1) {
          return json(409, { error: { code: 'version_conflict', message: 'Someone saved version 3 since you started from 2' }, conflict: { baseVersion: 2, theirs, mine: content('mine') } })
        }
        return json(201, { scenario: scenario(4, 'mine'), version: version(4, 'mine') })
      },
    })
    const doc = useScenarioDocumentStore()
    await doc.open(vectorLab.id, SCENARIO_ID)
    const outcome = await doc.save(content('mine'))
    expect(outcome.status).toBe('conflict')
    expect(doc.conflict?.theirs.number).toBe(3)
    expect(await doc.keepMine()).toEqual({ status: 'saved', version: 4 })
    expect(saves[1]).toMatchObject({ baseVersion: 3, content: { program: 'mine' } })
    expect(doc.conflict).toBeNull()
  })

  it('"reload theirs" hands back their content and sets mine aside, so nothing is lost', async () => {
    await signIn({
      [`GET ${WS}/scenarios/${SCENARIO_ID}`]: () => json(200, { scenario: scenario(2, 'v2') }),
      [`POST ${WS}/scenarios/${SCENARIO_ID}/versions`]: () =>
        json(409, { error: { code: 'version_conflict', message: 'conflict' }, conflict: { baseVersion: 2, theirs: version(3, 'theirs'), mine: content('mine') } }),
    })
    const doc = useScenarioDocumentStore()
    await doc.open(vectorLab.id, SCENARIO_ID)
    await doc.save(content('mine'))
    expect(doc.reloadTheirs().program).toBe('theirs')
    expect(doc.scenario?.version).toBe(3)
    expect(doc.setAside?.program).toBe('mine')
    expect(doc.conflict).toBeNull()
  })

  it('lets other save errors through as errors', async () => {
    await signIn({
      [`GET ${WS}/scenarios/${SCENARIO_ID}`]: () => json(200, { scenario: scenario(2, 'v2') }),
      [`POST ${WS}/scenarios/${SCENARIO_ID}/versions`]: () => apiError(403, 'forbidden', 'Viewers cannot save'),
    })
    const doc = useScenarioDocumentStore()
    await doc.open(vectorLab.id, SCENARIO_ID)
    await expect(doc.save(content('mine'))).rejects.toMatchObject({ status: 403, code: 'forbidden' })
    expect(doc.conflict).toBeNull()
  })
})

describe('the members store', () => {
  it('transfers ownership by promoting the other member before stepping down', async () => {
    const other = '8b9c0d1e-2f30-4415-8627-a8b9c0d1e2f3'
    const server = await signIn({
      [`GET ${WS}/members`]: () => json(200, { members: [], invitations: [] }),
      [`PATCH ${WS}/members/${other}`]: () => json(200, { member: { userId: other, email: 'o@example.org', name: 'O', role: 'owner' } }),
      [`PATCH ${WS}/members/${editor.id}`]: () => json(200, { member: { userId: editor.id, email: editor.email, name: editor.name, role: 'editor' } }),
    })
    await useMembersStore().transferOwnership(other)
    const patches = server.requests.filter((r) => r.method === 'PATCH').map((r) => [r.path, r.body])
    expect(patches).toEqual([
      [`${WS}/members/${other}`, { role: 'owner' }],
      [`${WS}/members/${editor.id}`, { role: 'editor' }],
    ])
  })
})
