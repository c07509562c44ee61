import { computed, reactive, ref, shallowRef } from 'vue'
import { defineStore } from 'pinia'
import type { ScenarioSummary } from '@shared/schemas/scenario'
import { ApiError } from '@/api'
import type { ScenarioListParams } from '@/api/scenarios'
import { bundleFileName } from '@/lib/scenarios/content'
import { useAuthStore } from './auth'
import { useWorkspaceStore } from './workspace'

export const DEFAULT_LIST_PARAMS: ScenarioListParams = {
  page: 1,
  pageSize: 20,
  sort: 'updatedAt',
  order: 'desc',
  tags: [],
  author: null,
  q: '',
  trash: false,
}

function asApiError(err: unknown): ApiError {
  return err instanceof ApiError ? err : new ApiError(0, 'internal', 'Something went wrong in the page. Reload it and try again.')
}

/** The Scenarios page: one page of the current workspace's scenarios, as the server sorted and filtered it. */
export const useScenariosStore = defineStore('scenarios', () => {
  const auth = useAuthStore()
  const workspace = useWorkspaceStore()
  const params = reactive<ScenarioListParams>({ ...DEFAULT_LIST_PARAMS, tags: [] })
  const rows = shallowRef<ScenarioSummary[]>([])
  const total = ref(0)
  const loading = ref(false)
  const error = ref<ApiError | null>(null)
  const pageCount = computed(() => Math.max(1, Math.ceil(total.value / params.pageSize)))

  function workspaceId(): string {
    const id = workspace.current?.id
    if (!id) throw new ApiError(0, 'not_found', 'Choose a workspace first.')
    return id
  }

  // Answers can arrive out of order when filters change quickly: only the newest request's answer is shown.
  let seq = 0
  async function load() {
    const id = workspace.current?.id
    if (!id) {
      rows.value = []
      total.value = 0
      return
    }
    const mine = ++seq
    loading.value = true
    error.value = null
    try {
      const res = await auth.api.scenarios.list(id, { ...params, tags: [...params.tags] })
      if (mine !== seq) return
      rows.value = res.scenarios
      total.value = res.total
      // A delete can empty the last page: step back to the new last page.
      if (res.scenarios.length === 0 && res.total > 0 && params.page > 1) {
        params.page = Math.ceil(res.total / params.pageSize)
        await load()
      }
    } catch (err) {
      if (mine === seq) error.value = asApiError(err)
    } finally {
      if (mine === seq) loading.value = false
    }
  }

  /** Changes filters or sorting; any change but the page number goes back to page 1. */
  function update(change: Partial<ScenarioListParams>) {
    const pageOnly = Object.keys(change).every((k) => k === 'page')
    Object.assign(params, change)
    if (!pageOnly) params.page = change.page ?? 1
    return load()
  }

  function toggleTag(tag: string) {
    const tags = params.tags.includes(tag) ? params.tags.filter((t) => t !== tag) : [...params.tags, tag]
    return update({ tags })
  }

  function resetFilters() {
    return update({ tags: [], author: null, q: '' })
  }

  async function duplicate(id: string) {
    const { scenario } = await auth.api.scenarios.duplicate(workspaceId(), id)
    await load()
    return scenario
  }

  /** Moves scenarios to the trash; `undo` brings them back (within 30 days). */
  async function remove(ids: string[]) {
    const ws = workspaceId()
    for (const id of ids) await auth.api.scenarios.remove(ws, id)
    await load()
  }

  async function undo(ids: string[]) {
    const ws = workspaceId()
    for (const id of ids) await auth.api.scenarios.undelete(ws, id)
    await load()
  }

  /** The bundle of the chosen scenarios as a file to download. */
  async function exportBundle(ids: string[]): Promise<{ fileName: string; text: string }> {
    const bundle = await auth.api.scenarios.exportBundle(workspaceId(), ids)
    const titles = bundle.scenarios.map((s) => s.versions[s.versions.length - 1]?.content.title ?? '')
    return { fileName: bundleFileName(titles, new Date()), text: `${JSON.stringify(bundle, null, 2)}\n` }
  }

  function $reset() {
    Object.assign(params, { ...DEFAULT_LIST_PARAMS, tags: [] })
    rows.value = []
    total.value = 0
    error.value = null
  }

  return { params, rows, total, loading, error, pageCount, load, update, toggleTag, resetFilters, duplicate, remove, undo, exportBundle, $reset }
})
