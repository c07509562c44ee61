/**
 * Suites of the current workspace: the list, the open suite with its run
 * history, and the run shown. Runs are queued on the server and polled until
 * they finish (a run is a job of seconds on the suite workers).
 */
import { defineStore } from 'pinia'
import { ref, shallowRef } from 'vue'
import type { Suite, SuiteBodyInput, SuiteRun, SuiteRunSummary } from '@shared/schemas/suite'
import { useAuthStore } from './auth'
import { useWorkspaceStore } from './workspace'

/** How often an unfinished run is asked for. */
export const RUN_POLL_MS = 1000

export const isFinished = (r: Pick<SuiteRunSummary, 'status'>) => r.status !== 'queued' && r.status !== 'running'

export const useSuitesStore = defineStore('suites', () => {
  const auth = useAuthStore()
  const workspace = useWorkspaceStore()
  const list = ref<Suite[]>([])
  const suite = shallowRef<Suite | null>(null)
  const runs = ref<SuiteRunSummary[]>([])
  const run = shallowRef<SuiteRun | null>(null)
  const loading = ref(false)
  let poll: ReturnType<typeof setTimeout> | null = null

  const ws = () => {
    const id = workspace.current?.id
    if (!id) throw new Error('No workspace is open.')
    return id
  }

  async function load(): Promise<void> {
    loading.value = true
    try {
      list.value = (await auth.api.suites.list(ws())).suites
    } finally {
      loading.value = false
    }
  }

  async function open(id: string): Promise<void> {
    suite.value = (await auth.api.suites.get(ws(), id)).suite
    runs.value = (await auth.api.suites.runs(ws(), id)).runs
  }

  async function create(body: SuiteBodyInput): Promise<Suite> {
    const s = (await auth.api.suites.create(ws(), body)).suite
    await load()
    return s
  }

  async function update(body: SuiteBodyInput): Promise<void> {
    if (!suite.value) return
    suite.value = (await auth.api.suites.update(ws(), suite.value.id, body)).suite
  }

  async function remove(id: string): Promise<void> {
    await auth.api.suites.remove(ws(), id)
    suite.value = null
    await load()
  }

  /** Opens one run; while it is unfinished, asks again every RUN_POLL_MS and refreshes the history when it ends. */
  async function showRun(runId: string): Promise<SuiteRun> {
    stopPolling()
    const s = suite.value
    if (!s) throw new Error('No suite is open.')
    const r = (await auth.api.suites.getRun(ws(), s.id, runId)).run
    run.value = r
    if (!isFinished(r)) poll = setTimeout(() => void showRun(runId).catch(() => undefined), RUN_POLL_MS)
    else runs.value = (await auth.api.suites.runs(ws(), s.id)).runs
    return r
  }

  function stopPolling(): void {
    if (poll) clearTimeout(poll)
    poll = null
  }

  /** Queues a run (on `presetId` when given) and returns its id. */
  async function start(presetId?: string | null): Promise<string> {
    const s = suite.value
    if (!s) throw new Error('No suite is open.')
    const r = (await auth.api.suites.run(ws(), s.id, presetId === undefined ? {} : { presetId })).run
    runs.value = [r, ...runs.value]
    return r.id
  }

  /** A finished run, fetched without showing it (the report compares two). */
  async function fetchRun(runId: string): Promise<SuiteRun> {
    const s = suite.value
    if (!s) throw new Error('No suite is open.')
    return (await auth.api.suites.getRun(ws(), s.id, runId)).run
  }

  /** The suite as a bundle file for `chimeline check`. */
  async function exportBundle(): Promise<{ fileName: string; text: string }> {
    const s = suite.value
    if (!s) throw new Error('No suite is open.')
    const bundle = await auth.api.suites.exportBundle(ws(), s.id)
    const name = s.title.replace(/[^\p{L}\p{N}._-]+/gu, '-').replace(/^-+|-+$/g, '').slice(0, 80) || 'suite'
    return { fileName: `${name}.chimeline.json`, text: `${JSON.stringify(bundle, null, 2)}\n` }
  }

  return { list, suite, runs, run, loading, load, open, create, update, remove, showRun, stopPolling, start, fetchRun, exportBundle }
})
