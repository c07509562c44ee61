/**
 * Entry of the work-pool threads (work-pool.ts): runs one named task of
 * work-tasks.ts. It says on `started` when it begins, so the pool's time
 * limit counts the work and not the wait in the queue.
 */
import type { Started } from './fair-pool'
import { WORK_TASKS, type WorkKind } from './work-tasks'

export interface WorkTask {
  kind: WorkKind
  input: unknown
}

export default function runWork({ kind, input, started }: WorkTask & Started): unknown {
  started.postMessage('started')
  started.close()
  const task = WORK_TASKS[kind] as (input: unknown) => unknown
  return task(input)
}
