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
    expect(started).toEqual([0, 1])
    run.pause()
    await finishAll()
    // The two points in flight land; no new one starts while paused.
    expect(seen).toBe(2)
    expect(started).toEqual([0, 1])
    run.resume()
    await new Promise((resolve) => setTimeout(resolve, 0))
    expect(started).toEqual([0, 1, 2, 3])
    run.cancel()
    await finishAll()
    const end = await run.finished
    expect(end).toEqual({ reason: 'cancelled', message: 'cancelled after 2 of 12 points; the points done are kept' })
    expect(seen).toBe(4)
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
