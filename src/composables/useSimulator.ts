/**
 * Runs the simulator in its Web Worker for a component. One Worker per
 * composable instance, created on the first run and ended when the owning
 * scope is disposed. A new run supersedes the one in progress (it is
 * cancelled); `cancel()` stops it. The trace is held in a shallowRef: it is
 * large and never changed in place.
 *
 * @example
 *   const sim = useSimulator()
 *   await sim.run(source, machine)
 *   sim.trace.value?.cycles
 *   sim.registers.value?.writes // per traced instruction, the registers it wrote
 */
import * as Comlink from 'comlink'
import { getCurrentScope, onScopeDispose, readonly, ref, shallowRef } from 'vue'
import type { RegisterGroups } from '@shared/sim/registerGroups'
import type { FunctionalResult, RunError, RunInput, RunOptions, RunProgress } from '@shared/sim/run'
import { decodeTrace } from '@shared/sim/trace/compact'
import type { TimingTrace } from '@shared/sim/trace/types'
import type { SimulatorService } from '@/workers/simulatorService'

export interface UseSimulatorOptions {
  /** Makes the Worker (default: the simulator Worker module). */
  createWorker?: () => Worker
}

const defaultWorker = () => new Worker(new URL('../workers/simulator.worker.ts', import.meta.url), { type: 'module', name: 'chimeline-simulator' })

export function useSimulator(options: UseSimulatorOptions = {}) {
  const trace = shallowRef<TimingTrace | null>(null)
  /** Why the last run failed or stopped early (then `trace` holds the partial trace), or null. */
  const error = shallowRef<RunError | null>(null)
  const progress = shallowRef<RunProgress | null>(null)
  /** Registers, memory and output of the last successful run. */
  const functional = shallowRef<FunctionalResult | null>(null)
  /** Registers each traced instruction wrote and the groups it read (with `trace`). */
  const registers = shallowRef<RegisterGroups | null>(null)
  const running = ref(false)
  let worker: Worker | null = null
  let api: Comlink.Remote<SimulatorService> | null = null
  let runId = 0

  function service(): Comlink.Remote<SimulatorService> {
    if (!api) {
      worker = (options.createWorker ?? defaultWorker)()
      api = Comlink.wrap<SimulatorService>(worker)
    }
    return api
  }

  /** Runs a program; resolves when this run ends (or is superseded by a newer one). */
  async function run(program: RunInput['program'], machine: unknown, runOptions: RunOptions = {}): Promise<void> {
    const id = ++runId
    running.value = true
    progress.value = null
    error.value = null
    try {
      const onProgress = Comlink.proxy((p: RunProgress) => {
        if (id === runId) progress.value = p
      })
      const result = await service().simulate(program, machine, runOptions, onProgress)
      if (id !== runId) return
      trace.value = result.trace ? decodeTrace(result.trace) : null
      registers.value = result.trace ? (result.registers ?? null) : null
      functional.value = result.ok ? result.functional : null
      error.value = result.ok ? null : result.error
    } catch (e) {
      // Only a broken Worker gets here: the pipeline reports its errors as values.
      if (id === runId) error.value = { stage: 'simulate', code: 'worker', message: `The simulator stopped: ${(e as Error).message}` }
    } finally {
      if (id === runId) running.value = false
    }
  }

  /** The cycles of the program with its vl-`from` instructions timed at each of `toVls`, in the Worker. */
  async function neighbours(source: string, machine: unknown, from: number, toVls: number[]): Promise<{ vl: number; cycles: number }[] | null> {
    return service().neighbours(source, machine, from, toVls)
  }

  function cancel(): void {
    if (running.value && api) void api.cancel()
  }

  function dispose(): void {
    runId++
    worker?.terminate()
    worker = null
    api = null
    running.value = false
  }

  if (getCurrentScope()) onScopeDispose(dispose)

  return { trace, functional, registers, error, progress, running: readonly(running), run, neighbours, cancel, dispose }
}
