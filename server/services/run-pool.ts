/**
 * The run summaries of saves, computed off the request thread on a fair pool
 * of worker threads (fair-pool.ts): a save's run can take seconds
 * (SAVE_RUN_LIMITS allows a million steps and cycles), and run inline it would
 * stall every other request of the process.
 *
 * - Fair: each workspace has at most `perWorkspace` runs in flight, and free
 *   threads take the workspaces' runs in turn, so one account's burst of
 *   saves waits behind itself. One more is a 503 `server_busy` with
 *   Retry-After and nothing is saved (the client can simply retry).
 * - A run over the time limit (counted from its start on a thread) is
 *   stopped and the version is saved with a 'failed' summary whose code is
 *   `time_limit`, like the step and cycle limits.
 *
 * The worker is TypeScript: it loads through tsx's loader, given to the
 * thread explicitly so that it works under `tsx` (npm start) and Vitest alike.
 */
import type { RunSummary } from '../../shared/schemas/scenario'
import { errors } from '../http/errors'
import { TaskTimeLimit, createFairPool } from './fair-pool'
import type { RunOutcome } from './scenario-run'
import type { RunTask } from './run-worker'

export interface RunPoolLimits {
  /** Worker threads at most. */
  threads: number
  /** Runs that may wait for a thread, all workspaces together. */
  queue: number
  /** Runs of one workspace in flight (running and waiting). */
  perWorkspace: number
  /** Runs one account asked for in flight, over all its workspaces. */
  perAccount: number
  /** Wall-clock limit of one run, from its start on a worker. */
  timeLimitMs: number
}

export interface RunPool {
  /**
   * The summary of one content, run on behalf of a workspace; throws 400 for
   * initial data that does not fit, 503 when the workspace's share or the
   * queue is full.
   */
  summarize(content: RunTask['content'], workspaceId: string, userId: string): Promise<RunSummary>
  /** Runs in flight (running and queued). */
  readonly inFlight: number
  /** Runs that reached a thread since start. */
  readonly started: number
  close(): Promise<void>
}

export function createRunPool(limits: RunPoolLimits): RunPool {
  const pool = createFairPool<Omit<RunTask, 'started'>, RunOutcome>(
    new URL('./run-worker.ts', import.meta.url),
    { threads: limits.threads, queue: limits.queue, perOwner: limits.perWorkspace, perAccount: limits.perAccount, timeLimitMs: limits.timeLimitMs },
    'run summaries',
  )
  const seconds = `${limits.timeLimitMs / 1000} s`

  async function summarize(content: RunTask['content'], workspaceId: string, userId: string): Promise<RunSummary> {
    let outcome: RunOutcome
    try {
      outcome = await pool.run({ content }, workspaceId, userId)
    } catch (err) {
      if (err instanceof TaskTimeLimit) {
        return { status: 'failed', stage: 'simulate', code: 'time_limit', message: `The run took longer than ${seconds}, the server's limit for a saved version's summary; the version is kept without its figures (run it on the Bench to see them)` }
      }
      if ((err as { code?: unknown }).code === 'ERR_WORKER_OUT_OF_MEMORY') {
        return { status: 'failed', stage: 'simulate', code: 'memory_limit', message: 'The run needed more memory than a worker thread may use; the version is kept without its figures' }
      }
      throw err
    }
    if (!outcome.ok) {
      throw errors.validation(
        Object.fromEntries(outcome.problems.map((p) => [`content.initialData.${p.index}`, p.message])),
        'Some initial data does not fit the program',
      )
    }
    return outcome.run
  }

  return {
    summarize,
    get inFlight() {
      return pool.inFlight
    },
    get started() {
      return pool.started
    },
    close: () => pool.close(),
  }
}
