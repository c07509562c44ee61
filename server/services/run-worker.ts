/**
 * Entry of the run-summary worker threads (run-pool.ts): one task is one
 * scenario content to run. It says on `started` when the run begins, so the
 * pool's time limit counts the run and not the wait in the queue.
 */
import type { MessagePort } from 'node:worker_threads'
import type { ScenarioContent } from '../../shared/schemas/scenario'
import { computeRunSummary, type RunOutcome } from './scenario-run'

export interface RunTask {
  content: Pick<ScenarioContent, 'program' | 'machine' | 'initialData'>
  started: MessagePort
}

export default function runTask({ content, started }: RunTask): RunOutcome {
  started.postMessage('started')
  started.close()
  return computeRunSummary(content)
}
