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

  // Another user's workspaces must never show after a sign-out or a change of account.
  watch(
    () => auth.user?.id,
    () => {
      workspaces.value = []
      error.value = null
    },
  )

  return { workspaces, current, loading, error, load, select }
})
