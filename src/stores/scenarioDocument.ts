import { computed, ref, shallowRef } from 'vue'
import { defineStore } from 'pinia'
import type { Scenario, ScenarioContent, ScenarioVersionSummary, VersionDiff } from '@shared/schemas/scenario'
import { ApiError } from '@/api'
import { conflictOf, type SaveConflict } from '@/lib/scenarios/conflict'
import { sameContent } from '@/lib/scenarios/content'
import { useAuthStore } from './auth'
import { useWorkspaceStore } from './workspace'

export type SaveOutcome = { status: 'saved'; version: number } | { status: 'conflict'; conflict: SaveConflict }

/**
 * The scenario open on the Bench: which one and at which version, its
 * history, and a save that lost a race (the 409 with both versions) until
 * the user chose how to go on. The Bench's own state (program, machine, view)
 * stays in the bench store; callers pass it in as content.
 */
export const useScenarioDocumentStore = defineStore('scenarioDocument', () => {
  const auth = useAuthStore()
  const workspace = useWorkspaceStore()
  const scenario = shallowRef<Scenario | null>(null)
  const versions = shallowRef<ScenarioVersionSummary[]>([])
  const conflict = shallowRef<SaveConflict | null>(null)
  /** "Reload theirs" keeps the user's edit here, so that it can still be saved as a scenario of its own. */
  const setAside = shallowRef<ScenarioContent | null>(null)
  const saving = ref(false)
  const loadingVersions = ref(false)

  const workspaceId = computed(() => scenario.value?.workspaceId ?? workspace.current?.id ?? null)
  /** Viewers read; owners and editors save. */
  const canSave = computed(() => {
    const ws = workspace.workspaces.find((w) => w.id === workspaceId.value)
    return ws ? ws.role !== 'viewer' : false
  })

  function requireWorkspace(): string {
    const id = workspaceId.value
    if (!id) throw new ApiError(0, 'not_found', 'Choose a workspace first.')
    return id
  }

  function isDirty(content: ScenarioContent): boolean {
    return scenario.value ? !sameContent(scenario.value.content, content) : true
  }

  async function open(workspaceIdToUse: string, id: string): Promise<Scenario> {
    const { scenario: s } = await auth.api.scenarios.get(workspaceIdToUse, id)
    scenario.value = s
    versions.value = []
    conflict.value = null
    return s
  }

  /** Forgets the open scenario: the next save makes a new one. */
  function close() {
    scenario.value = null
    versions.value = []
    conflict.value = null
  }

  async function withSaving<T>(action: () => Promise<T>): Promise<T> {
    saving.value = true
    try {
      return await action()
    } finally {
      saving.value = false
    }
  }

  /** Saves a new version of the open scenario; a lost race comes back as a conflict, not an error. */
  async function save(content: ScenarioContent, message = ''): Promise<SaveOutcome> {
    const current = scenario.value
    if (!current) throw new ApiError(0, 'not_found', 'Nothing to save to: use Save as to make a new scenario.')
    return withSaving(async () => {
      try {
        const res = await auth.api.scenarios.save(current.workspaceId, current.id, { baseVersion: current.version, content, message })
        scenario.value = res.scenario
        conflict.value = null
        if (versions.value.length > 0) await loadVersions()
        return { status: 'saved', version: res.version.number }
      } catch (err) {
        const c = conflictOf(err)
        if (!c) throw err
        conflict.value = c
        return { status: 'conflict', conflict: c }
      }
    })
  }

  /** Makes a new scenario (version 1) in the current workspace and opens it. */
  async function saveAs(content: ScenarioContent, message = ''): Promise<Scenario> {
    const ws = workspace.current?.id
    if (!ws) throw new ApiError(0, 'not_found', 'Choose a workspace first.')
    return withSaving(async () => {
      const res = await auth.api.scenarios.create(ws, { content, message })
      scenario.value = res.scenario
      versions.value = []
      conflict.value = null
      setAside.value = null
      return res.scenario
    })
  }

  /** Conflict, way 1: my content becomes the next version after theirs (theirs stays in the history). */
  async function keepMine(message = ''): Promise<SaveOutcome> {
    const c = conflict.value
    const current = scenario.value
    if (!c || !current) throw new ApiError(0, 'conflict', 'There is no conflict to resolve.')
    scenario.value = { ...current, version: c.theirs.number, content: c.theirs.content, run: c.theirs.run }
    return save(c.mine, message || `Kept my edit over version ${c.theirs.number}`)
  }

  /** Conflict, way 2: their version is loaded; mine is set aside. Returns the content to load. */
  function reloadTheirs(): ScenarioContent {
    const c = conflict.value
    const current = scenario.value
    if (!c || !current) throw new ApiError(0, 'conflict', 'There is no conflict to resolve.')
    setAside.value = c.mine
    scenario.value = { ...current, version: c.theirs.number, content: c.theirs.content, run: c.theirs.run }
    conflict.value = null
    return c.theirs.content
  }

  function dismissSetAside() {
    setAside.value = null
  }

  async function loadVersions() {
    const current = scenario.value
    if (!current) return
    loadingVersions.value = true
    try {
      versions.value = (await auth.api.scenarios.versions(current.workspaceId, current.id)).versions
    } finally {
      loadingVersions.value = false
    }
  }

  async function diff(from: number, to: number): Promise<VersionDiff> {
    const current = scenario.value
    if (!current) throw new ApiError(0, 'not_found', 'No scenario is open.')
    return (await auth.api.scenarios.diff(current.workspaceId, current.id, from, to)).diff
  }

  /** Makes a new version with an old one's content; returns that content for the Bench. */
  async function restore(number: number): Promise<ScenarioContent> {
    const current = scenario.value
    if (!current) throw new ApiError(0, 'not_found', 'No scenario is open.')
    return withSaving(async () => {
      const res = await auth.api.scenarios.restore(current.workspaceId, current.id, number, `Restored version ${number}`)
      scenario.value = res.scenario
      await loadVersions()
      return res.scenario.content
    })
  }

  return {
    scenario, versions, conflict, setAside, saving, loadingVersions, workspaceId, canSave,
    isDirty, open, close, save, saveAs, keepMine, reloadTheirs, dismissSetAside, loadVersions, diff, restore, requireWorkspace,
  }
})
