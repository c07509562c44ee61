/**
 * The browser's Worker pool logic, on in-process sweep services (the same
 * module the Workers expose): the points stream in from several runners and
 * equal a sequential run; pause, resume and cancel; the time limit.
 */
import { describe, expect, it } from 'vitest'
import { sweepDefinitionSchema, type SweepPointResult } from '../../shared/schemas/sweep'
import { resolveSweep } from '../../shared/sweep/resolve'
import { runSweep } from '../../shared/sweep/runSweep'
import { createSweepService } from '../../src/workers/sweepService'
import { loadPool, runPool, type PointRunnerPort } from '../../src/workers/sweepPool'
import { FMA_CURVE } from './programs'

const definition = sweepDefinitionSchema.parse({ program: FMA_CURVE, parameters: [{ path: 'issue', spec: 'serial,staggered' }, { path: 'AVL', spec: '1..6' }] })

/** A service answering on a later turn of the event loop, as a Worker does. */
const asyncRunner = (): PointRunnerPort => {
  const s = createSweepService()
  return { load: (d) => s.load(d), run: (i) => new Promise((resolve) => setTimeout(() => resolve(s.run(i)), 0)) }
}

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

  it("a Worker's warm-up sweep resolves and runs (it would otherwise fail silently in the page)", () => {
    expect(() => createSweepService().warm()).not.toThrow()
  })

  it('answers a definition with bad values by its issues', async () => {
    const bad = sweepDefinitionSchema.parse({ program: FMA_CURVE, parameters: [{ path: 'lanes', spec: '0,1' }] })
    expect(await loadPool([asyncRunner()], bad)).toEqual([{ field: 'parameters.0.spec', message: 'lanes=0: 0 is outside the range 1..64' }])
  })

  it('pauses (no new point starts), resumes, and cancels keeping the points done', async () => {
    // Runners whose points finish only when the test says so: no timing involved.
    const service = createSweepService()
    service.load(definition)
    const started: number[] = []
    const pending: (() => void)[] = []
    const gated = (): PointRunnerPort => ({ load: () => null, run: (i) => new Promise((resolve) => { started.push(i); pending.push(() => resolve(service.run(i))) }) })
    const finishAll = async () => {
      for (const f of pending.splice(0)) f()
      await new Promise((resolve) => setTimeout(resolve, 0))
    }
    let seen = 0
    const run = runPool([gated(), gated()], { planned: 12, timeLimitMs: 60_000 }, { onPoint: () => seen++ })
    await new Promise((resolve) => setTimeout(resolve, 0))
    // Each runner starts its own half of the 12 points.
    expect(started).toEqual([0, 6])
    run.pause()
    await finishAll()
    // The two points in flight land; no new one starts while paused.
    expect(seen).toBe(2)
    expect(started).toEqual([0, 6])
    run.resume()
    await new Promise((resolve) => setTimeout(resolve, 0))
    expect(started).toEqual([0, 6, 1, 7])
    run.cancel()
    await finishAll()
    const end = await run.finished
    expect(end).toEqual({ reason: 'cancelled', message: 'cancelled after 2 of 12 points; the points done are kept' })
    expect(seen).toBe(4)
  })

  it('a runner keeps to its own share of the order, then takes the later half of the largest share left', async () => {
    const service = createSweepService()
    service.load(definition)
    const fast: number[] = []
    const slow: number[] = []
    let release: (() => void) | null = null
    const quick: PointRunnerPort = { load: () => null, run: (i) => new Promise((resolve) => { fast.push(i); setTimeout(() => resolve(service.run(i)), 0) }) }
    // The slow runner's first point lands only when the fast one has run out of points to take.
    const held: PointRunnerPort = {
      load: () => null,
      run: (i) => new Promise((resolve) => { slow.push(i); if (slow.length === 1) release = () => resolve(service.run(i)); else resolve(service.run(i)) }),
    }
    const run = runPool([quick, held], { planned: 12, timeLimitMs: 60_000 }, { onPoint: () => {} })
    for (let k = 0; k < 20; k++) await new Promise((resolve) => setTimeout(resolve, 0))
    // Shares 0..5 and 6..11. With 7..11 left in the slow share: 10-11 taken, then 9, then 8; 7 stays (one point is not split).
    expect(fast).toEqual([0, 1, 2, 3, 4, 5, 10, 11, 9, 8])
    ;(release as unknown as () => void)()
    expect(await run.finished).toEqual({ reason: 'done', message: null })
    expect(slow).toEqual([6, 7])
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
