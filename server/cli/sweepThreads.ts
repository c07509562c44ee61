/**
 * Runs a sweep on worker threads (piscina, sweepWorker.ts): the points in
 * chunks, all chunks queued at once so that a free thread takes the next.
 * Used by the CLI and by `npm run bench:sweep`.
 */
import { createRequire } from 'node:module'
import { pathToFileURL } from 'node:url'
import { Piscina } from 'piscina'
import type { SweepDefinition, SweepPointResult } from '../../shared/schemas/sweep'
import { sweepChunks } from '../../shared/sweep/order'
import type { ResolvedSweep } from '../../shared/sweep/resolve'
import { plannedPoints, pointsLimitMessage, timeLimitMessage } from '../../shared/sweep/runSweep'
import type { SweepChunkTask } from './sweepWorker'

/** About 32 chunks a thread (at most 32 points each): small enough that the threads end together. */
export const threadChunkSize = (points: number, workers: number) => Math.max(1, Math.min(32, Math.ceil(points / (workers * 32))))

const tsxLoader = pathToFileURL(createRequire(import.meta.url).resolve('tsx')).href

/** A pool of sweep threads, each with the tsx loader: starting one takes about a second (the loader compiles the simulator). */
export function startSweepThreads(workers: number): Piscina<SweepChunkTask, SweepPointResult[]> {
  return new Piscina<SweepChunkTask, SweepPointResult[]>({
    filename: new URL('./sweepWorker.ts', import.meta.url).href,
    minThreads: workers,
    maxThreads: workers,
    execArgv: ['--import', tsxLoader],
  })
}

/** Runs a sweep on a started pool of `workers` threads: its points in chunks, all queued at once (largest first), so that a free thread takes the next. */
export async function runOnPool(pool: Piscina<SweepChunkTask, SweepPointResult[]>, workers: number, definition: SweepDefinition, sweep: ResolvedSweep): Promise<{ points: SweepPointResult[]; stopped: string | null }> {
  const planned = plannedPoints(sweep)
  const deadline = Date.now() + sweep.limits.timeLimitMs
  const parts = await Promise.all(sweepChunks(sweep, planned, threadChunkSize(planned, workers)).map((indexes) => pool.run({ definition, indexes, deadline })))
  const points = parts.flat().sort((a, b) => a.index - b.index)
  const stopped = points.length < planned ? timeLimitMessage(sweep, points.length) : pointsLimitMessage(sweep)
  return { points, stopped }
}

export async function runOnThreads(definition: SweepDefinition, sweep: ResolvedSweep, workers: number): Promise<{ points: SweepPointResult[]; stopped: string | null }> {
  const count = Math.min(workers, plannedPoints(sweep))
  const pool = startSweepThreads(count)
  try {
    return await runOnPool(pool, count, definition, sweep)
  } finally {
    await pool.destroy()
  }
}
