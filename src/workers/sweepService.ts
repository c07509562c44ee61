/**
 * What a sweep Worker exposes through Comlink, kept apart from the Worker
 * entry so that tests can call it directly: load a definition once, then run
 * its points a batch of indexes at a time (the pool feeds them), timing each
 * batch so that the pool can size the next. The Worker keeps the
 * programs it assembled for the sweep, so a swept machine field assembles once.
 */
import { sweepDefinitionSchema, type SweepDefinition } from '@shared/schemas/sweep'
import { resolveSweep, type SweepDefinitionIssue } from '@shared/sweep/resolve'
import { createPointRunner } from '@shared/sweep/runPoint'
import type { PointBatch } from './sweepPool'

/** A two-point sweep a Worker runs once when it starts, so that the first point of a real sweep finds the simulator's code compiled. */
const WARM_UP: SweepDefinition = sweepDefinitionSchema.parse({
  program: `    .equ AVL, 16
    li a0, AVL
    vsetvli t0, a0, e64, m1, ta, ma
    vid.v v1
    vfcvt.f.xu.v v1, v1
    vfmacc.vv v2, v1, v1
    vfredusum.vs v3, v2, v1
`,
  parameters: [{ path: 'AVL', spec: '16,20' }],
})

export function createSweepService() {
  let runner: ReturnType<typeof createPointRunner> | null = null
  return {
    /** Runs the warm-up sweep (its points are dropped). */
    warm(): void {
      const r = resolveSweep(WARM_UP)
      if (!r.ok) throw new Error(`the warm-up sweep does not resolve: ${r.issues[0]?.message}`)
      const warmRunner = createPointRunner(r.sweep)
      warmRunner.run(0)
      warmRunner.run(1)
    },
    /** Resolves the definition; answers its issues, or null when it is ready to run. */
    load(definition: SweepDefinition): SweepDefinitionIssue[] | null {
      const r = resolveSweep(definition)
      runner = r.ok ? createPointRunner(r.sweep) : null
      return r.ok ? null : r.issues
    },
    runBatch(indexes: number[]): PointBatch {
      const loaded = runner
      if (!loaded) throw new Error('no sweep loaded')
      const t0 = performance.now()
      const points = indexes.map((i) => loaded.run(i))
      return { points, ms: performance.now() - t0 }
    },
  }
}

export type SweepService = ReturnType<typeof createSweepService>
