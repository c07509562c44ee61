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

/**
 * The sweep a Worker runs while the page waits for the user, one point a
 * call, so that a real sweep finds the simulator compiled and optimised: a
 * new Worker runs its first points several times slower than a warm one (in
 * Node, these six points take about 230 ms cold and 50 ms warm), and two
 * Workers would each pay that on their share of the sweep. It covers the
 * engine's common paths: chained FMAs, a product, an unordered reduction over
 * the ring, a unit-stride load and store, every lane alike (AVL 256) and a
 * ragged tail (250), under the three issue policies.
 */
const WARM_UP: SweepDefinition = sweepDefinitionSchema.parse({
  program: `    .equ AVL, 256
    .data
    .balign 8
buf:
    .zero 2048
    .text
    li a0, AVL
    vsetvli t0, a0, e64, m1, ta, ma
    la a1, buf
    vle64.v v1, (a1)
    vid.v v2
    vfcvt.f.xu.v v2, v2
    li t1, 16
loop:
    vfmacc.vv v3, v1, v2
    vfmacc.vv v4, v2, v1
    vfmul.vv v5, v3, v4
    vfredusum.vs v6, v5, v4
    vse64.v v5, (a1)
    addi t1, t1, -1
    bnez t1, loop
`,
  parameters: [
    { path: 'AVL', spec: '256,250' },
    { path: 'issue', spec: 'staggered,serial,lockstep' },
  ],
})

/** Warm-up calls a Worker takes: its six points, twice (the second pass lets the optimiser finish). */
export const WARM_UP_STEPS = 12

export function createSweepService() {
  let runner: ReturnType<typeof createPointRunner> | null = null
  let warmRunner: { runner: ReturnType<typeof createPointRunner>; points: number } | null = null
  return {
    /**
     * Runs step `step` of the warm-up (a point of WARM_UP; its result is
     * dropped unless it failed, which throws); true while steps remain.
     */
    warm(step: number): boolean {
      if (!warmRunner) {
        const r = resolveSweep(WARM_UP)
        if (!r.ok) throw new Error(`the warm-up sweep does not resolve: ${r.issues[0]?.message}`)
        warmRunner = { runner: createPointRunner(r.sweep), points: r.sweep.count }
      }
      const p = warmRunner.runner.run(step % warmRunner.points)
      if (p.status !== 'ok') throw new Error(`the warm-up point ${p.index} failed: ${p.error?.message}`)
      if (step + 1 >= WARM_UP_STEPS) warmRunner = null
      return step + 1 < WARM_UP_STEPS
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
