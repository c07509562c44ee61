/**
 * The run summaries of saves, computed off the request thread. A save's run
 * can take seconds (SAVE_RUN_LIMITS allows a million steps and cycles); run
 * inline it would stall every other request of the process. Here a small
 * piscina pool of worker threads runs them, with two explicit limits:
 *
 * - a bounded queue: at most `threads + queue` runs in flight; one more is a
 *   503 `server_busy` and nothing is saved (the client can simply retry);
 * - a time limit per run, counted from when a worker starts it: a run over it
 *   is stopped (its thread is terminated) and the version is saved with a
 *   'failed' summary whose code is `time_limit`, like the step and cycle limits.
 *
 * The worker is TypeScript: it loads through tsx's loader, given to the
 * thread explicitly so that it works under `tsx` (npm start) and Vitest alike.
 */
import { createRequire } from 'node:module'
import { pathToFileURL } from 'node:url'
import { MessageChannel } from 'node:worker_threads'
import { Piscina } from 'piscina'
import type { RunSummary } from '../../shared/schemas/scenario'
import { ApiError, errors } from '../http/errors'
import type { RunOutcome } from './scenario-run'
import type { RunTask } from './run-worker'

export interface RunPoolLimits {
  /** Worker threads at most (one from the first save on; more on demand, stopped after a minute idle). */
  threads: number
  /** Runs that may wait for a thread; one more is refused with 503. */
  queue: number
  /** Wall-clock limit of one run, from its start on a worker. */
  timeLimitMs: number
}

export interface RunPool {
  /** The summary of one content; throws 400 for initial data that does not fit, 503 when the queue is full. */
  summarize(content: RunTask['content']): Promise<RunSummary>
  /** Runs in flight (running and queued). */
  readonly inFlight: number
  close(): Promise<void>
}

const tsxLoader = pathToFileURL(createRequire(import.meta.url).resolve('tsx')).href

export function createRunPool(limits: RunPoolLimits): RunPool {
  // Made on the first save, so a process that never saves starts no thread. One
  // thread stays up from then on: piscina refills only up to minThreads after a
  // run is stopped, and a queued run needs a thread to go to.
  let pool: Piscina<RunTask, RunOutcome> | null = null
  const threads = () =>
    (pool ??= new Piscina<RunTask, RunOutcome>({
      filename: new URL('./run-worker.ts', import.meta.url).href,
      minThreads: 1,
      maxThreads: limits.threads,
      idleTimeout: 60_000,
      execArgv: ['--import', tsxLoader],
    }))
  let inFlight = 0
  const seconds = `${limits.timeLimitMs / 1000} s`

  async function summarize(content: RunTask['content']): Promise<RunSummary> {
    if (inFlight >= limits.threads + limits.queue) {
      throw new ApiError(503, 'server_busy', `The server is computing ${inFlight} run summaries already, its limit; nothing was saved: try again in a moment`)
    }
    inFlight++
    const stop = new AbortController()
    const { port1, port2 } = new MessageChannel()
    let timer: NodeJS.Timeout | undefined
    port1.once('message', () => {
      timer = setTimeout(() => stop.abort(), limits.timeLimitMs)
    })
    try {
      const outcome = await threads().run({ content, started: port2 }, { transferList: [port2], signal: stop.signal })
      if (!outcome.ok) {
        throw errors.validation(
          Object.fromEntries(outcome.problems.map((p) => [`content.initialData.${p.index}`, p.message])),
          'Some initial data does not fit the program',
        )
      }
      return outcome.run
    } catch (err) {
      if (stop.signal.aborted) {
        return { status: 'failed', stage: 'simulate', code: 'time_limit', message: `The run took longer than ${seconds}, the server's limit for a saved version's summary; the version is kept without its figures (run it on the Bench to see them)` }
      }
      if ((err as { code?: unknown }).code === 'ERR_WORKER_OUT_OF_MEMORY') {
        return { status: 'failed', stage: 'simulate', code: 'memory_limit', message: "The run needed more memory than a worker thread may use; the version is kept without its figures" }
      }
      throw err
    } finally {
      clearTimeout(timer)
      port1.close()
      inFlight--
    }
  }

  return {
    summarize,
    get inFlight() {
      return inFlight
    },
    close: async () => {
      await pool?.destroy()
    },
  }
}
