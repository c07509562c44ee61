import { computed, ref, watch } from 'vue'
import { defineStore } from 'pinia'
import type { WorkspaceSummary } from '@shared/schemas/workspace'
import { ApiError } from '@/api'
import { useAuthStore } from './auth'

export const WORKSPACE_STORAGE_KEY = 'chimeline.workspace'

function storedWorkspaceId(): string | null {
  try {
    return localStorage.getItem(WORKSPACE_STORAGE_KEY)
  } catch {
    return null
  }
}

/** The signed-in user's workspaces (from GET /api/me) and the one they are working in. */
export const useWorkspaceStore = defineStore('workspace', () => {
  const auth = useAuthStore()
  const workspaces = ref<WorkspaceSummary[]>([])
  const selectedId = ref<string | null>(storedWorkspaceId())
  const loading = ref(false)
  const error = ref<ApiError | null>(null)

  /** The chosen workspace, or the first one when the saved choice is gone (left, deleted). */
  const current = computed<WorkspaceSummary | null>(
    () => workspaces.value.find((w) => w.id === selectedId.value) ?? workspaces.value[0] ?? null,
  )

  async function load() {
    loading.value = true
    error.value = null
    try {
      const me = await auth.api.workspaces.me()
      workspaces.value = me.workspaces
    } catch (err) {
      error.value = err instanceof ApiError ? err : new ApiError(0, 'internal', String(err))
    } finally {
      loading.value = false
    }
  }

  function select(id: string) {
    selectedId.value = id
    try {
      localStorage.setItem(WORKSPACE_STORAGE_KEY, id)
    } catch {
      // Not persisted: the choice lasts for this page.
    }
  }

  /** Creates a workspace owned by the user and switches to it. */
  async function create(name: string): Promise<WorkspaceSummary> {
    const { workspace } = await auth.api.workspaces.create({ name })
    workspaces.value = [...workspaces.value, workspace].sort((a, b) => a.name.localeCompare(b.name))
    select(workspace.id)
    return workspace
  }

  /** Sets the preset imports start on (owners only). */
  async function setDefaultPreset(id: string, presetId: string): Promise<void> {
    const { workspace } = await auth.api.workspaces.update(id, { defaultPreset: presetId })
    workspaces.value = workspaces.value.map((w) => (w.id === workspace.id ? workspace : w))
  }

  // Another user's workspaces must never show after a sign-out or a change of account.
  watch(
    () => auth.user?.id,
    () => {
      workspaces.value = []
      error.value = null
    },
  )

  return { workspaces, current, loading, error, load, select, create, setDefaultPreset }
})
