/**
 * Request work off the request thread: the tasks of work-tasks.ts run on a
 * fair pool of worker threads (fair-pool.ts) with a time limit, so a large
 * diff asked by any viewer holds neither /api/health nor anyone else's
 * request. Over the limit, or with the workspace's share or the queue full,
 * the answer is 503 `server_busy` with Retry-After.
 */
import { ApiError } from '../http/errors'
import { TaskTimeLimit, createFairPool, type FairPoolLimits } from './fair-pool'
import type { WorkKind, WorkInput, WorkResult } from './work-tasks'
import type { WorkTask } from './work-worker'

export interface WorkPool {
  /** Runs a task on behalf of an owner (a workspace id), asked by an account (a user id). */
  run<K extends WorkKind>(kind: K, input: WorkInput<K>, owner: string, account: string): Promise<WorkResult<K>>
  /** Tasks that reached a thread since start. */
  readonly started: number
  close(): Promise<void>
}

export function createWorkPool(limits: FairPoolLimits): WorkPool {
  const pool = createFairPool<WorkTask, unknown>(new URL('./work-worker.ts', import.meta.url), limits, 'requests of heavy work')
  return {
    async run(kind, input, owner, account) {
      try {
        return (await pool.run({ kind, input }, owner, account)) as WorkResult<typeof kind>
      } catch (err) {
        if (err instanceof TaskTimeLimit) {
          throw new ApiError(503, 'server_busy', `This request needed more than ${limits.timeLimitMs / 1000} s of work, the server's limit; it was stopped`, undefined, 5)
        }
        throw err
      }
    },
    get started() {
      return pool.started
    },
    close: () => pool.close(),
  }
}
