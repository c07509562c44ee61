/**
 * What a sweep Worker exposes through Comlink, kept apart from the Worker
 * entry so that tests can call it directly: load a definition once, then run
 * its points one index at a time (the pool feeds them). The Worker keeps the
 * programs it assembled for the sweep, so a swept machine field assembles once.
 */
import type { SweepDefinition, SweepPointResult } from '@shared/schemas/sweep'
import { resolveSweep, type SweepDefinitionIssue } from '@shared/sweep/resolve'
import { createPointRunner } from '@shared/sweep/runPoint'

export function createSweepService() {
  let runner: ReturnType<typeof createPointRunner> | null = null
  return {
    /** Resolves the definition; answers its issues, or null when it is ready to run. */
    load(definition: SweepDefinition): SweepDefinitionIssue[] | null {
      const r = resolveSweep(definition)
      runner = r.ok ? createPointRunner(r.sweep) : null
      return r.ok ? null : r.issues
    },
    run(index: number): SweepPointResult {
      if (!runner) throw new Error('no sweep loaded')
      return runner.run(index)
    },
  }
}

export type SweepService = ReturnType<typeof createSweepService>
