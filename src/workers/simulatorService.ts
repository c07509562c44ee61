/**
 * What the simulator Worker exposes through Comlink, kept apart from the
 * Worker entry so that tests can call it directly. It drives the pure pipeline
 * (shared/sim/run.ts) step by step, and between steps gives the event loop a
 * turn once a time budget is spent: that is where progress is reported and a
 * cancel call gets through. The trace goes back in its compact form, with the
 * register use of each dynamic instruction, their buffers transferred, not copied.
 */
import * as Comlink from 'comlink'
import { runPipelineSteps, type FunctionalResult, type RunError, type RunInput, type RunOptions, type RunProgress } from '@shared/sim/run'
import { registerGroupTransferables, type RegisterGroups } from '@shared/sim/registerGroups'
import { encodeTrace, transferablesOf, type CompactTrace } from '@shared/sim/trace/compact'
import { neighbourCycles } from '@/lib/bench/vlNeighbours'

export type WorkerRunResult =
  | { ok: true; trace: CompactTrace; functional: FunctionalResult; registers: RegisterGroups; error?: undefined }
  | {
      ok: false
      error: RunError
      /** The partial trace of a run cut short by a limit, and the register use of its stream. */
      trace?: CompactTrace
      registers?: RegisterGroups
    }

export type ProgressCallback = (progress: RunProgress) => void

export interface SimulatorServiceOptions {
  /** Milliseconds of work between turns of the event loop (default 16: about one frame). */
  sliceMs?: number
  /** How to give the event loop a turn (default: a zero-delay timeout). */
  yieldTurn?: () => Promise<void>
  now?: () => number
}

export function createSimulatorService(options: SimulatorServiceOptions = {}) {
  const sliceMs = options.sliceMs ?? 16
  const yieldTurn = options.yieldTurn ?? (() => new Promise<void>((resolve) => setTimeout(resolve, 0)))
  const now = options.now ?? (() => performance.now())
  /** The run in progress; a new run or cancel() marks it cancelled. */
  let current: { cancelled: boolean } | null = null

  const withTransfer = (r: WorkerRunResult): WorkerRunResult => {
    const buffers = new Set<ArrayBuffer>(r.trace ? transferablesOf(r.trace) : [])
    for (const b of r.registers ? registerGroupTransferables(r.registers) : []) buffers.add(b)
    if (r.ok) {
      for (const a of [...r.functional.v, r.functional.memory, r.functional.output]) {
        if (a.buffer instanceof ArrayBuffer) buffers.add(a.buffer)
      }
    }
    return Comlink.transfer(r, [...buffers])
  }

  return {
    /** Runs text or an assembled program on a machine; resolves with the compact trace or a structured error. */
    async simulate(program: RunInput['program'], machine: unknown, runOptions: RunOptions = {}, onProgress?: ProgressCallback): Promise<WorkerRunResult> {
      if (current) current.cancelled = true
      const token = { cancelled: false }
      current = token
      const steps = runPipelineSteps({ program, machine }, runOptions)
      let sliceStart = now()
      try {
        for (;;) {
          const step = steps.next()
          if (step.done) {
            const r = step.value
            if (r.ok) return withTransfer({ ok: true, trace: encodeTrace(r.trace), functional: r.functional, registers: r.registers })
            const partial = r.trace ? { trace: encodeTrace(r.trace), ...(r.registers ? { registers: r.registers } : {}) } : {}
            return withTransfer({ ok: false, error: r.error, ...partial })
          }
          if (now() - sliceStart >= sliceMs) {
            // A proxied callback answers with a promise; progress is best effort, never awaited.
            if (onProgress) Promise.resolve(onProgress(step.value)).catch(() => undefined)
            await yieldTurn()
            if (token.cancelled) {
              steps.return(undefined as never)
              return { ok: false, error: { stage: step.value.stage, code: 'cancelled', message: 'The run was cancelled.' } }
            }
            sliceStart = now()
          }
        }
      } finally {
        if (current === token) current = null
      }
    },
    /**
     * Times the program's vl-`from` instructions at each of `toVls` (the even neighbours of a
     * ragged tail, src/lib/bench/raggedTail.ts); null when the program does not run.
     */
    neighbours(source: string, machine: unknown, from: number, toVls: number[]): { vl: number; cycles: number }[] | null {
      return neighbourCycles(source, machine as never, from, toVls)
    },
    /** Cancels the run in progress, if any; it resolves with a 'cancelled' error at its next step. */
    cancel(): void {
      if (current) current.cancelled = true
    },
  }
}

export type SimulatorService = ReturnType<typeof createSimulatorService>
