/**
 * Runs a sweep on a pool of point runners (Comlink-wrapped Workers in the
 * app, in-process services in tests), streaming results back as they finish,
 * in whatever order. Each runner works through its own contiguous share of
 * the order (one program's points stay together on one runner, which
 * assembles and executes that program once; taking turns point by point,
 * every runner prepared every program); a runner whose share is done takes
 * the later half of the largest share left.
 *
 * A runner gets its points in batches of about BATCH_MS of its own running
 * time (the first batch is one point, so the first point lands at once; the
 * runner reports how long each batch took, and the next is sized from that),
 * and always has a second batch waiting behind the one it runs: a message
 * per point, and a Worker idle while the page's thread draws before handing
 * it the next point, cost the browser pool a third of its time (Chromium
 * trace of the vl curve: 0.7 ms a message on the page's thread, which then
 * also competes with the Workers for the cores).
 *
 * Pause stops handing out batches (those given finish), resume goes on,
 * cancel ends the sweep keeping the points done. The time limit counts
 * running time only, not time paused.
 */
import type { SweepDefinition, SweepPointResult } from '@shared/schemas/sweep'
import type { SweepDefinitionIssue } from '@shared/sweep/resolve'

/** Points a runner ran in one call, in the order asked, and the milliseconds they took it. */
export interface PointBatch {
  points: SweepPointResult[]
  ms: number
}

/** One runner of the pool: what src/workers/sweepService.ts exposes. */
export interface PointRunnerPort {
  load(definition: SweepDefinition): Promise<SweepDefinitionIssue[] | null> | SweepDefinitionIssue[] | null
  runBatch(indexes: number[]): Promise<PointBatch> | PointBatch
}

/** The running time a batch aims at: long beside a message's cost, short beside a pause or the end of a share. */
const BATCH_MS = 25
const MAX_BATCH = 256
/** Batches a runner holds at once: the one it runs and the next, waiting in its queue. */
const BATCHES_IN_FLIGHT = 2

export interface SweepProgress {
  done: number
  planned: number
  /** Milliseconds of running time (pauses excluded). */
  elapsedMs: number
  /** Points a second so far, and the estimated milliseconds left (null before the first point). */
  rate: number | null
  remainingMs: number | null
}

export type SweepEnd = { reason: 'done' | 'cancelled' | 'time-limit'; message: string | null }

export interface SweepPoolRun {
  pause(): void
  resume(): void
  cancel(): void
  readonly paused: boolean
  /** Settles when every runner has stopped. */
  finished: Promise<SweepEnd>
}

export interface SweepPoolCallbacks {
  onPoint(point: SweepPointResult, progress: SweepProgress): void
}

export interface SweepPoolOptions {
  planned: number
  timeLimitMs: number
  /** The order runners take the indexes in (default: index order); shared/sweep/order.ts groups a program's points. */
  order?: readonly number[]
  now?: () => number
}

export async function loadPool(runners: PointRunnerPort[], definition: SweepDefinition): Promise<SweepDefinitionIssue[] | null> {
  const answers = await Promise.all(runners.map((r) => r.load(definition)))
  return answers[0] ?? null
}

export function runPool(runners: PointRunnerPort[], options: SweepPoolOptions, callbacks: SweepPoolCallbacks): SweepPoolRun {
  const now = options.now ?? (() => performance.now())
  let done = 0
  let paused = false
  let stop: SweepEnd | null = null
  let runningSince: number | null = now()
  let elapsedBefore = 0
  let wake: (() => void)[] = []

  const elapsed = () => elapsedBefore + (runningSince === null ? 0 : now() - runningSince)
  const progress = (): SweepProgress => {
    const ms = elapsed()
    const rate = done > 0 && ms > 0 ? (done * 1000) / ms : null
    return { done, planned: options.planned, elapsedMs: ms, rate, remainingMs: rate ? ((options.planned - done) * 1000) / rate : null }
  }

  // Runner r's share is positions next..end-1 of the order.
  const count = runners.length
  const shares = runners.map((_, r) => ({ next: Math.floor((r * options.planned) / count), end: Math.floor(((r + 1) * options.planned) / count) }))
  /** Up to `size` next positions for runner r (empty when no share has a point left to give). */
  function claim(r: number, size: number): number[] {
    const own = shares[r]!
    if (own.next >= own.end) {
      let largest: { next: number; end: number } | null = null
      for (const s of shares) if (s.end - s.next >= 2 && (!largest || s.end - s.next > largest.end - largest.next)) largest = s
      if (!largest) return []
      const mid = largest.next + Math.ceil((largest.end - largest.next) / 2)
      own.next = mid
      own.end = largest.end
      largest.end = mid
    }
    const from = own.next
    own.next = Math.min(own.end, from + size)
    const at: number[] = []
    for (let k = from; k < own.next; k++) at.push(options.order?.[k] ?? k)
    return at
  }

  /** One of a runner's BATCHES_IN_FLIGHT feeds; `sizing` is shared by the runner's feeds. */
  async function feed(runner: PointRunnerPort, r: number, sizing: { size: number }): Promise<void> {
    for (;;) {
      while (paused && !stop) await new Promise<void>((resolve) => wake.push(resolve))
      if (stop) return
      if (elapsed() > options.timeLimitMs) {
        stop ??= { reason: 'time-limit', message: `the sweep reached its time limit of ${options.timeLimitMs / 1000} s after ${done} of ${options.planned} points; the points done are kept` }
        return
      }
      const indexes = claim(r, sizing.size)
      if (indexes.length === 0) return
      const batch = await runner.runBatch(indexes)
      const perPoint = batch.ms / Math.max(1, batch.points.length)
      sizing.size = Math.max(1, Math.min(MAX_BATCH, Math.floor(BATCH_MS / Math.max(perPoint, 0.01))))
      for (const point of batch.points) {
        done++
        callbacks.onPoint(point, progress())
      }
    }
  }

  const lane = (runner: PointRunnerPort, r: number): Promise<unknown> => {
    const sizing = { size: 1 }
    return Promise.all(Array.from({ length: BATCHES_IN_FLIGHT }, () => feed(runner, r, sizing)))
  }

  const wakeAll = () => {
    const w = wake
    wake = []
    for (const f of w) f()
  }

  const finished = Promise.all(runners.map(lane)).then((): SweepEnd => {
    if (runningSince !== null) elapsedBefore = elapsed()
    runningSince = null
    return stop ?? { reason: 'done', message: null }
  })

  return {
    pause() {
      if (paused || stop) return
      paused = true
      elapsedBefore = elapsed()
      runningSince = null
    },
    resume() {
      if (!paused) return
      paused = false
      runningSince = now()
      wakeAll()
    },
    cancel() {
      stop ??= { reason: 'cancelled', message: `cancelled after ${done} of ${options.planned} points; the points done are kept` }
      wakeAll()
    },
    get paused() {
      return paused
    },
    finished,
  }
}
