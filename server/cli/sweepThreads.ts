/**
 * Runs a sweep on worker threads (piscina, sweepWorker.ts): the points in
 * chunks, all chunks queued at once so that a free thread takes the next.
 * Used by the CLI and by `npm run bench:sweep`.
 */
import { createRequire } from 'node:module'
import { pathToFileURL } from 'node:url'
import { Piscina } from 'piscina'
import type { SweepDefinition, SweepPointResult } from '../../shared/schemas/sweep'
import { programGroups } from '../../shared/sweep/order'
import type { ResolvedSweep } from '../../shared/sweep/resolve'
import { plannedPoints, pointsLimitMessage, timeLimitMessage } from '../../shared/sweep/runSweep'
import type { SweepChunkTask } from './sweepWorker'

/** Points of the largest chunk. */
const MAX_CHUNK = 32

/**
 * Point indexes in chunks of about `count / (32 x workers)` points, in
 * program order (shared/sweep/order.ts), made of whole programs: a program
 * split over two chunks may be prepared by two threads (the heavy grid's
 * 1,000-instruction programs, three points each, were split every other time
 * at two points a chunk). Only a program of more than MAX_CHUNK points (a
 * swept machine field alone) is cut, into chunks of the usual size.
 */
export function chunks(groups: readonly number[][], workers: number): number[][] {
  const count = groups.reduce((n, g) => n + g.length, 0)
  const size = Math.max(1, Math.min(MAX_CHUNK, Math.ceil(count / (workers * 32))))
  const out: number[][] = []
  let open: number[] = []
  for (const g of groups) {
    if (g.length > MAX_CHUNK) {
      for (let start = 0; start < g.length; start += size) out.push(g.slice(start, start + size))
      continue
    }
    open.push(...g)
    if (open.length >= size) {
      out.push(open)
      open = []
    }
  }
  if (open.length > 0) out.push(open)
  return out
}

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

/** Runs a sweep on a started pool of `workers` threads: its points in chunks, all queued at once, so that a free thread takes the next. */
export async function runOnPool(pool: Piscina<SweepChunkTask, SweepPointResult[]>, workers: number, definition: SweepDefinition, sweep: ResolvedSweep): Promise<{ points: SweepPointResult[]; stopped: string | null }> {
  const planned = plannedPoints(sweep)
  const deadline = Date.now() + sweep.limits.timeLimitMs
  const parts = await Promise.all(chunks(programGroups(sweep, planned), workers).map((indexes) => pool.run({ definition, indexes, deadline })))
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
