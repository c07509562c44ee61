/**
 * The browser's Worker pool logic, on in-process sweep services (the same
 * module the Workers expose): the points stream in from several runners and
 * equal a sequential run; batches sized from the time the runner reports,
 * two held by each runner at once; pause, resume and cancel; the time limit.
 */
import { describe, expect, it } from 'vitest'
import { sweepDefinitionSchema, type SweepPointResult } from '../../shared/schemas/sweep'
import { resolveSweep } from '../../shared/sweep/resolve'
import { runSweep } from '../../shared/sweep/runSweep'
import { WARM_UP_STEPS, createSweepService } from '../../src/workers/sweepService'
import { loadPool, runPool, type PointBatch, type PointRunnerPort } from '../../src/workers/sweepPool'
import { FMA_CURVE } from './programs'

const definition = sweepDefinitionSchema.parse({ program: FMA_CURVE, parameters: [{ path: 'issue', spec: 'serial,staggered' }, { path: 'AVL', spec: '1..6' }] })

/** A service answering on a later turn of the event loop, as a Worker does. */
const asyncRunner = (): PointRunnerPort => {
  const s = createSweepService()
  return { load: (d) => s.load(d), runBatch: (ix) => new Promise((resolve) => setTimeout(() => resolve(s.runBatch(ix)), 0)) }
}

/** The points of a batch, reported as taking `msPerPoint` each: batch sizes then follow from the test, not the clock. */
const batchOf = (service: ReturnType<typeof createSweepService>, ix: number[], msPerPoint: number): PointBatch => ({ points: service.runBatch(ix).points, ms: msPerPoint * ix.length })

describe('sweep Worker pool', () => {
  it('streams every point once from three runners, with the figures of a sequential run', async () => {
    const runners = [asyncRunner(), asyncRunner(), asyncRunner()]
    expect(await loadPool(runners, definition)).toBeNull()
    const got: SweepPointResult[] = []
    const run = runPool(runners, { planned: 12, timeLimitMs: 60_000 }, { onPoint: (p) => got.push(p) })
    expect(await run.finished).toEqual({ reason: 'done', message: null })
    const r = resolveSweep(definition)
    if (!r.ok) throw new Error('unresolved')
    expect(got.sort((a, b) => a.index - b.index)).toEqual(runSweep(r.sweep).points)
  })

  it("a Worker's warm-up sweep resolves and runs every step, then says it is done (it would otherwise fail silently in the page)", () => {
    const service = createSweepService()
    const more: boolean[] = []
    for (let step = 0; step < WARM_UP_STEPS; step++) more.push(service.warm(step))
    expect(more).toEqual([...Array<boolean>(WARM_UP_STEPS - 1).fill(true), false])
  })

  it('answers a definition with bad values by its issues', async () => {
    const bad = sweepDefinitionSchema.parse({ program: FMA_CURVE, parameters: [{ path: 'lanes', spec: '0,1' }] })
    expect(await loadPool([asyncRunner()], bad)).toEqual([{ field: 'parameters.0.spec', message: 'lanes=0: 0 is outside the range 1..64' }])
  })

  it('sizes batches to about 25 ms of the running time the runner reports, and keeps two in flight', async () => {
    const service = createSweepService()
    service.load(sweepDefinitionSchema.parse({ program: FMA_CURVE, parameters: [{ path: 'issue', spec: 'serial,staggered' }, { path: 'AVL', spec: '1..50' }] }))
    const sizes = (msPerPoint: number) => {
      const seen: number[] = []
      const runner: PointRunnerPort = { load: () => null, runBatch: (ix) => new Promise((resolve) => { seen.push(ix.length); setTimeout(() => resolve(batchOf(service, ix, msPerPoint)), 0) }) }
      return { seen, run: runPool([runner], { planned: 100, timeLimitMs: 60_000 }, { onPoint: () => {} }) }
    }
    // 1 ms a point: both first batches are one point (the first lands at once), then 25 points each until the 100 are out.
    const quick = sizes(1)
    await quick.run.finished
    expect(quick.seen).toEqual([1, 1, 25, 25, 25, 23])
    // 40 ms a point: one point a batch throughout.
    const slow = sizes(40)
    await slow.run.finished
    expect(slow.seen).toEqual(new Array(100).fill(1))
  })

  it('pauses (no new batch starts), resumes, and cancels keeping the points done', async () => {
    // Runners whose batches finish only when the test says so: no timing involved.
    const service = createSweepService()
    service.load(definition)
    const started: number[] = []
    const pending: (() => void)[] = []
    const gated = (): PointRunnerPort => ({ load: () => null, runBatch: (ix) => new Promise((resolve) => { started.push(...ix); pending.push(() => resolve(batchOf(service, ix, 25))) }) })
    const finishAll = async () => {
      for (const f of pending.splice(0)) f()
      await new Promise((resolve) => setTimeout(resolve, 0))
    }
    let seen = 0
    const run = runPool([gated(), gated()], { planned: 12, timeLimitMs: 60_000 }, { onPoint: () => seen++ })
    await new Promise((resolve) => setTimeout(resolve, 0))
    // Each runner holds two one-point batches from its own half of the 12 points.
    expect(started).toEqual([0, 1, 6, 7])
    run.pause()
    await finishAll()
    // The four points in flight land; no new batch starts while paused.
    expect(seen).toBe(4)
    expect(started).toEqual([0, 1, 6, 7])
    run.resume()
    await new Promise((resolve) => setTimeout(resolve, 0))
    expect(started).toEqual([0, 1, 6, 7, 2, 3, 8, 9])
    run.cancel()
    await finishAll()
    const end = await run.finished
    expect(end).toEqual({ reason: 'cancelled', message: 'cancelled after 4 of 12 points; the points done are kept' })
    expect(seen).toBe(8)
  })

  it('a runner keeps to its own share of the order, then takes the later half of the largest share left', async () => {
    const service = createSweepService()
    service.load(definition)
    const fast: number[] = []
    const slow: number[] = []
    const held: (() => void)[] = []
    let holding = true
    const quick: PointRunnerPort = { load: () => null, runBatch: (ix) => new Promise((resolve) => { fast.push(...ix); setTimeout(() => resolve(batchOf(service, ix, 25)), 0) }) }
    // The slow runner's batches land only when the fast one has run out of points to take.
    const stuck: PointRunnerPort = {
      load: () => null,
      runBatch: (ix) => new Promise((resolve) => { slow.push(...ix); const go = () => resolve(batchOf(service, ix, 25)); if (holding) held.push(go); else go() }),
    }
    const run = runPool([quick, stuck], { planned: 12, timeLimitMs: 60_000 }, { onPoint: () => {} })
    for (let k = 0; k < 20; k++) await new Promise((resolve) => setTimeout(resolve, 0))
    // Shares 0..5 and 6..11; the slow runner holds 6 and 7. With 8..11 left in its share: 10-11 taken, then 9; 8 stays (one point is not split).
    expect(fast).toEqual([0, 1, 2, 3, 4, 5, 10, 11, 9])
    holding = false
    for (const go of held.splice(0)) go()
    expect(await run.finished).toEqual({ reason: 'done', message: null })
    expect(slow).toEqual([6, 7, 8])
  })

  it('stops at the time limit, counting running time only', async () => {
    const runners = [asyncRunner()]
    await loadPool(runners, definition)
    let clock = 0
    // Each clock reading advances 1 ms; the limit of 5 ms passes after a few points.
    const run = runPool(runners, { planned: 12, timeLimitMs: 5, now: () => clock++ }, { onPoint: () => {} })
    const end = await run.finished
    expect(end.reason).toBe('time-limit')
    expect(end.message).toMatch(/^the sweep reached its time limit of 0\.005 s after \d of 12 points; the points done are kept$/)
  })
})
