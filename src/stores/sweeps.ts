/**
 * The sweep being built and run in the browser: its definition (program,
 * base machine, swept parameters), the points as they stream in from the
 * Worker pool, and the progress. "Sweep this" on the Bench fills the draft.
 */
import { computed, ref, shallowRef, triggerRef } from 'vue'
import { defineStore } from 'pinia'
import { defaultMachine } from '@shared/schemas/machine'
import { SWEEP_DEFAULT_MAX_POINTS, sweepDefinitionSchema, type SweepDefinition, type SweepParameter, type SweepPointResult, type SweepSummary } from '@shared/schemas/sweep'
import { MACHINE_FIELD_PATHS } from '@shared/sweep/machineFields'
import { programOrder } from '@shared/sweep/order'
import { resolveSweep, type ResolvedSweep, type SweepDefinitionIssue } from '@shared/sweep/resolve'
import { pointsLimitMessage, plannedPoints } from '@shared/sweep/runSweep'
import { symbolDefinitions } from '@shared/sweep/symbols'
import * as Comlink from 'comlink'
import { ApiError } from '@/api'
import { defaultParameters } from '@/lib/sweeps/defaults'
import { useAuthStore } from '@/stores/auth'
import { useWorkspaceStore } from '@/stores/workspace'
import { loadPool, runPool, type PointRunnerPort, type SweepPoolRun, type SweepProgress } from '@/workers/sweepPool'
import type { SweepService } from '@/workers/sweepService'

export type SweepStatus = 'idle' | 'running' | 'paused' | 'done' | 'cancelled' | 'stopped'

interface PoolWorkers {
  runners: PointRunnerPort[]
  /** Ends the Workers' warm-up after the point each is running (a sweep is about to start). */
  stopWarmUp(): void
  close(): void
}

/**
 * `count` sweep Workers. With `warmUp`, each runs the warm-up sweep of
 * sweepService.ts a point a call while the page waits for the user, until
 * its steps end or `stopWarmUp`: a sweep that starts waits at most for the
 * warm-up point under way, not for the whole warm-up.
 */
function makeWorkers(count: number, warmUp: boolean): PoolWorkers {
  const workers = Array.from({ length: count }, (_, i) => new Worker(new URL('../workers/sweep.worker.ts', import.meta.url), { type: 'module', name: `chimeline-sweep-${i}` }))
  const runners = workers.map((w) => Comlink.wrap<SweepService>(w))
  let warming = warmUp
  const warm = async (r: Comlink.Remote<SweepService>) => {
    for (let step = 0; warming && (await r.warm(step)); step++);
  }
  for (const r of runners) void warm(r).catch(() => undefined) // a Worker closed during its warm-up
  return { runners, stopWarmUp: () => (warming = false), close: () => workers.forEach((w) => w.terminate()) }
}

/** Workers a sweep gets: one per core the browser reports, no more than its points. */
export const poolSize = (points: number) => Math.max(1, Math.min(points, globalThis.navigator?.hardwareConcurrency || 2))

/**
 * Points land many times a second; the plot, the table and the progress take
 * them in batches at most this often (the first point at once), so that the
 * page's thread stays free to hand the Workers their next points.
 */
const FLUSH_EVERY_MS = 150

export const useSweepsStore = defineStore('sweeps', () => {
  const program = ref('')
  const machine = ref<Record<string, unknown>>(structuredClone(defaultMachine) as unknown as Record<string, unknown>)
  const parameters = ref<SweepParameter[]>([{ path: 'AVL', spec: '1..256' }])
  const maxPoints = ref(SWEEP_DEFAULT_MAX_POINTS)
  /** The Bench's scenario when "Sweep this" was pressed: a saved sweep belongs to its newest version. */
  const scenarioId = ref<string | null>(null)

  const status = ref<SweepStatus>('idle')
  const issues = ref<SweepDefinitionIssue[]>([])
  const message = ref<string | null>(null)
  /** Points by index as they arrive (holes until they do); triggerRef on each arrival. */
  const points = shallowRef<(SweepPointResult | undefined)[]>([])
  const progress = shallowRef<SweepProgress | null>(null)
  /** The sweep of the last run: its parameters and values, for plots and the table. */
  const sweep = shallowRef<ResolvedSweep | null>(null)
  /** ms from Run to the first point and to the last, for the bench script. */
  const firstPointMs = ref<number | null>(null)
  const totalMs = ref<number | null>(null)
  let current: { run: SweepPoolRun; close: () => void } | null = null
  const auth = useAuthStore()
  const workspace = useWorkspaceStore()
  /** The workspace's saved and server sweeps. */
  const saved = shallowRef<SweepSummary[]>([])
  /** The saved sweep shown (its id), or null for a sweep not saved. */
  const savedId = ref<string | null>(null)
  const apiError = ref<string | null>(null)
  let polling: ReturnType<typeof setTimeout> | null = null
  /** A server sweep being followed (polled): it can be cancelled, not paused. */
  const following = ref(false)

  function workspaceId(): string {
    const id = workspace.current?.id
    if (!id) throw new ApiError(0, 'not_found', 'Choose a workspace first.')
    return id
  }
  async function guarded<T>(fn: () => Promise<T>): Promise<T | null> {
    apiError.value = null
    try {
      return await fn()
    } catch (e) {
      apiError.value = e instanceof ApiError ? e.message : String(e)
      return null
    }
  }

  const symbols = computed(() => [...new Set(symbolDefinitions(program.value).map((d) => d.name))])
  /** What a parameter may name: the program's symbols first, then the machine fields. */
  const parameterNames = computed(() => [...symbols.value, ...MACHINE_FIELD_PATHS])
  const arrived = computed(() => points.value.filter((p): p is SweepPointResult => p !== undefined))

  function fromBench(text: string, benchMachine: object, fromScenario: string | null = null): void {
    scenarioId.value = fromScenario
    program.value = text
    // The Bench's machine is a reactive proxy, which structuredClone refuses; it is plain JSON.
    machine.value = JSON.parse(JSON.stringify(benchMachine)) as Record<string, unknown>
    parameters.value = defaultParameters(text)
  }

  function definition(): { ok: true; definition: SweepDefinition } | { ok: false; issues: SweepDefinitionIssue[] } {
    // Plain JSON, not reactive proxies: the definition is cloned into each Worker.
    const input: unknown = JSON.parse(JSON.stringify({ program: program.value, machine: machine.value, parameters: parameters.value, limits: { maxPoints: maxPoints.value } }))
    const parsed = sweepDefinitionSchema.safeParse(input)
    if (!parsed.success) return { ok: false, issues: parsed.error.issues.map((i) => ({ field: i.path.join('.'), message: i.message })) }
    return { ok: true, definition: parsed.data }
  }

  async function start(): Promise<void> {
    if (current) return
    const def = definition()
    const resolved = def.ok ? resolveSweep(def.definition) : def
    if (!def.ok || !resolved.ok) {
      issues.value = resolved.ok ? [] : resolved.issues
      return
    }
    issues.value = []
    message.value = null
    savedId.value = null
    sweep.value = resolved.sweep
    const planned = plannedPoints(resolved.sweep)
    points.value = new Array<SweepPointResult | undefined>(planned)
    progress.value = { done: 0, planned, elapsedMs: 0, rate: null, remainingMs: null }
    firstPointMs.value = null
    totalMs.value = null
    status.value = 'running'
    const t0 = performance.now()
    const workers = warm ?? makeWorkers(poolSize(planned), false)
    workers.stopWarmUp()
    let latest: SweepProgress | null = null
    let timer: ReturnType<typeof setTimeout> | null = null
    const flush = () => {
      if (timer) clearTimeout(timer)
      timer = null
      triggerRef(points)
      if (latest) progress.value = latest
    }
    try {
      await loadPool(workers.runners, def.definition)
      const run = runPool(workers.runners, { planned, timeLimitMs: resolved.sweep.limits.timeLimitMs, order: programOrder(resolved.sweep, planned) }, {
        onPoint(point, p) {
          points.value[point.index] = point
          latest = p
          if (firstPointMs.value === null) {
            firstPointMs.value = performance.now() - t0
            flush()
          } else timer ??= setTimeout(flush, FLUSH_EVERY_MS)
        },
      })
      current = { run, close: workers.close }
      const end = await run.finished
      flush()
      totalMs.value = performance.now() - t0
      status.value = end.reason === 'done' ? (pointsLimitMessage(resolved.sweep) ? 'stopped' : 'done') : end.reason === 'cancelled' ? 'cancelled' : 'stopped'
      message.value = end.message ?? pointsLimitMessage(resolved.sweep)
    } finally {
      if (timer) clearTimeout(timer)
      if (workers !== warm) workers.close()
      current = null
    }
  }

  // Workers started ahead of a run while the Sweeps page is open, so that the first point does not wait for a Worker to load the simulator.
  let warm: PoolWorkers | null = null
  function warmUp(): void {
    warm ??= makeWorkers(poolSize(Number.MAX_SAFE_INTEGER), true)
  }
  /** Lets the page's Workers go (a run under way finishes on them first). */
  function releaseWorkers(): void {
    const w = warm
    warm = null
    if (!w) return
    if (current) void current.run.finished.then(() => w.close())
    else w.close()
  }

  function pause(): void {
    current?.run.pause()
    if (current) status.value = 'paused'
  }
  function resume(): void {
    current?.run.resume()
    if (current) status.value = 'running'
  }
  function cancel(): void {
    if (current) current.run.cancel()
    else if (following.value && savedId.value) {
      const id = savedId.value
      void guarded(() => auth.api.sweeps.cancel(workspaceId(), id)).then(() => open(id))
    }
  }

  async function loadSaved(): Promise<void> {
    const r = await guarded(() => auth.api.sweeps.list(workspaceId()))
    if (r) saved.value = r.sweeps
  }

  /** Saves the browser sweep shown, with its points. */
  async function save(title: string): Promise<string | null> {
    const def = definition()
    if (!def.ok || !sweep.value) return null
    const st = status.value === 'cancelled' ? 'cancelled' : status.value === 'stopped' ? 'stopped' : 'done'
    const r = await guarded(() => auth.api.sweeps.create(workspaceId(), { title, runner: 'browser', definition: def.definition, scenarioId: scenarioId.value, points: arrived.value, status: st, message: message.value }))
    if (!r) return null
    savedId.value = r.sweep.id
    await loadSaved()
    return r.sweep.id
  }

  function show(definitionOf: SweepDefinition, got: SweepPointResult[], total: number): void {
    program.value = definitionOf.program
    machine.value = definitionOf.machine
    parameters.value = definitionOf.parameters.map((p) => ({ ...p }))
    const r = resolveSweep(definitionOf)
    sweep.value = r.ok ? r.sweep : null
    const arr = new Array<SweepPointResult | undefined>(total)
    for (const p of got) arr[p.index] = p
    points.value = arr
  }

  /** Opens a saved sweep; a server sweep still running is followed until it ends. */
  async function open(id: string): Promise<void> {
    if (polling) clearTimeout(polling)
    const r = await guarded(() => auth.api.sweeps.get(workspaceId(), id))
    if (!r) return
    const s = r.sweep
    savedId.value = s.id
    show(s.definition, s.points, s.planned)
    status.value = s.status === 'queued' || s.status === 'running' ? 'running' : s.status
    message.value = s.message
    // A saved sweep's running time is not kept: only the points done are shown.
    progress.value = { done: s.points.length, planned: s.planned, elapsedMs: 0, rate: null, remainingMs: null }
    following.value = s.status === 'queued' || s.status === 'running'
    if (following.value) polling = setTimeout(() => void open(id), 1000)
  }

  /** Queues the sweep on the server's workers, then follows it. */
  async function runOnServer(title: string): Promise<string | null> {
    const def = definition()
    if (!def.ok) {
      issues.value = def.issues
      return null
    }
    const r = await guarded(() => auth.api.sweeps.create(workspaceId(), { title, runner: 'server', definition: def.definition, scenarioId: scenarioId.value }))
    if (!r) return null
    await loadSaved()
    await open(r.sweep.id)
    return r.sweep.id
  }

  function stopFollowing(): void {
    if (polling) clearTimeout(polling)
    polling = null
    following.value = false
  }

  function addParameter(): void {
    if (parameters.value.length < 3) parameters.value.push({ path: '', spec: '' })
  }
  function removeParameter(i: number): void {
    parameters.value.splice(i, 1)
  }

  return {
    program, machine, parameters, maxPoints, scenarioId, status, issues, message, points, arrived, progress, sweep, firstPointMs, totalMs, symbols, parameterNames,
    saved, savedId, apiError, following,
    fromBench, start, warmUp, releaseWorkers, pause, resume, cancel, addParameter, removeParameter, loadSaved, save, open, runOnServer, stopFollowing,
  }
})
