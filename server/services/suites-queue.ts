/**
 * The suite runs' job queue: its own pg-boss queue beside the sweeps' (the
 * same start-up, sweeps-queue.ts startBoss), one job per suite run. A run is
 * a job of seconds to minutes; one whose worker died is taken again after its
 * expiry, and the worker writes the run's result once (status still
 * 'queued' or 'running'), so a retried job does not e-mail twice.
 */
import type PgBoss from 'pg-boss'
import { startBoss } from './sweeps-queue'

export const SUITE_QUEUE = 'suite-runs'

export interface SuiteRunJob {
  runId: string
}

/** Starts pg-boss (startBoss) and makes sure the suite queue exists too. */
export async function startSuiteBoss(databaseUrl: string): Promise<PgBoss> {
  const boss = await startBoss(databaseUrl)
  if (!(await boss.getQueue(SUITE_QUEUE))) {
    // A run of 50 scenarios at their cycle limits stays well inside 15 minutes; then it is taken again, twice at most.
    await boss.createQueue(SUITE_QUEUE, { name: SUITE_QUEUE, retryLimit: 2, expireInSeconds: 900 })
  }
  return boss
}

export interface SuiteQueue {
  enqueue(runId: string): Promise<void>
  close(): Promise<void>
}

export function createSuiteQueue(databaseUrl: string): SuiteQueue {
  let boss: Promise<PgBoss> | null = null
  return {
    async enqueue(runId) {
      const b = await (boss ??= startSuiteBoss(databaseUrl))
      await b.send(SUITE_QUEUE, { runId } satisfies SuiteRunJob)
    },
    async close() {
      if (boss) await (await boss).stop({ graceful: false, wait: true })
    },
  }
}
