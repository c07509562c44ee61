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
    const runners = [asyncRunner(), asyncRunner()]
    await loadPool(runners, definition)
    let seen = 0
    const run = runPool(runners, { planned: 12, timeLimitMs: 60_000 }, {
      onPoint: () => {
        seen++
        if (seen === 2) run.pause()
      },
    })
    await new Promise((resolve) => setTimeout(resolve, 50))
    // Two runners: the pause comes with the second point; the other runner's point in flight still lands.
    expect(run.paused).toBe(true)
    const atPause = seen
    expect(atPause).toBeLessThanOrEqual(3)
    await new Promise((resolve) => setTimeout(resolve, 50))
    expect(seen).toBe(atPause)
    run.resume()
    run.cancel()
    const end = await run.finished
    expect(end.reason).toBe('cancelled')
    expect(end.message).toMatch(/^cancelled after \d+ of 12 points; the points done are kept$/)
    expect(seen).toBeLessThan(12)
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
