// @vitest-environment happy-dom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { nextTick } from 'vue'
import { createPinia, setActivePinia } from 'pinia'
import { useAuthStore } from '@/stores/auth'
import { WORKSPACE_STORAGE_KEY, useWorkspaceStore } from '@/stores/workspace'
import { apiError, editor, installFakeServer, json, vectorLab } from './fakeServer'

const ringLab = { id: '1c2d3e4f-5061-4728-93a4-b5c6d7e8f901', name: 'Ring Lab', role: 'viewer', defaultPreset: 'default-8' } as const

function signedInServer() {
  return installFakeServer({
    'POST /api/auth/signin': () => json(200, { user: editor, accessToken: 't' }),
    'POST /api/auth/signout': () => json(204),
    'GET /api/me': () => json(200, { user: editor, workspaces: [vectorLab, ringLab] }),
  })
}

beforeEach(() => {
  setActivePinia(createPinia())
  localStorage.clear()
})

afterEach(() => {
  vi.unstubAllGlobals()
})

describe('the workspace store', () => {
  it('lists the workspaces of GET /api/me and starts in the first one', async () => {
    signedInServer()
    await useAuthStore().signIn({ email: editor.email, password: 'chimeline-demo-2026' })
    const store = useWorkspaceStore()
    await store.load()
    expect(store.workspaces.map((w) => w.name)).toEqual(['Vector Lab', 'Ring Lab'])
    expect(store.current?.name).toBe('Vector Lab')
  })

  it('remembers the chosen workspace across loads', async () => {
    signedInServer()
    await useAuthStore().signIn({ email: editor.email, password: 'chimeline-demo-2026' })
    useWorkspaceStore().select(ringLab.id)
    expect(localStorage.getItem(WORKSPACE_STORAGE_KEY)).toBe(ringLab.id)

    setActivePinia(createPinia())
    await useAuthStore().signIn({ email: editor.email, password: 'chimeline-demo-2026' })
    const again = useWorkspaceStore()
    await again.load()
    expect(again.current?.name).toBe('Ring Lab')
  })

  it('falls back to the first workspace when the remembered one is gone', async () => {
    signedInServer()
    localStorage.setItem(WORKSPACE_STORAGE_KEY, '99999999-9999-4999-8999-999999999999')
    await useAuthStore().signIn({ email: editor.email, password: 'chimeline-demo-2026' })
    const store = useWorkspaceStore()
    await store.load()
    expect(store.current?.name).toBe('Vector Lab')
  })

  it('keeps the error when the list cannot be loaded', async () => {
    installFakeServer({
      'POST /api/auth/signin': () => json(200, { user: editor, accessToken: 't' }),
      'GET /api/me': () => apiError(500, 'internal', 'Something went wrong on the server'),
    })
    await useAuthStore().signIn({ email: editor.email, password: 'chimeline-demo-2026' })
    const store = useWorkspaceStore()
    await store.load()
    expect(store.error?.message).toBe('Something went wrong on the server')
    expect(store.current).toBeNull()
  })

  it('forgets the list on sign-out, so the next user never sees it', async () => {
    signedInServer()
    const auth = useAuthStore()
    await auth.signIn({ email: editor.email, password: 'chimeline-demo-2026' })
    const store = useWorkspaceStore()
    await store.load()
    await auth.signOut()
    await nextTick()
    expect(store.workspaces).toEqual([])
  })
})
