/**
 * A scenario's saved sweeps by version number, for its history: read when
 * `scenarioId()` names a scenario (the history is open), again each time it does.
 */
import { computed, shallowRef, watch } from 'vue'
import type { SweepSummary } from '@shared/schemas/sweep'
import { useAuthStore } from '@/stores/auth'
import { useWorkspaceStore } from '@/stores/workspace'

export function useScenarioSweeps(scenarioId: () => string | null | undefined) {
  const auth = useAuthStore()
  const workspace = useWorkspaceStore()
  const list = shallowRef<SweepSummary[]>([])
  watch(
    scenarioId,
    async (id) => {
      const ws = workspace.current?.id
      if (!id || !ws) return
      try {
        list.value = (await auth.api.sweeps.list(ws, id)).sweeps
      } catch {
        // The history still works without its sweeps; the Sweeps page shows the error if there is one.
        list.value = []
      }
    },
    { immediate: true },
  )
  const byVersion = computed(() => {
    const m = new Map<number, SweepSummary[]>()
    for (const s of list.value) if (s.version !== null) m.set(s.version, [...(m.get(s.version) ?? []), s])
    return m
  })
  return { byVersion }
}
