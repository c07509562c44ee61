/**
 * Entry of the CLI's sweep threads (sweep.ts): one task is one chunk of point
 * indexes of a sweep definition, run in order with the shared point runner.
 * Each thread keeps the sweep it resolved last, so a chunk does not resolve
 * (and assemble) again.
 */
import type { SweepDefinition, SweepPointResult } from '../../shared/schemas/sweep'
import { resolveSweep, type ResolvedSweep } from '../../shared/sweep/resolve'
import { createPointRunner } from '../../shared/sweep/runPoint'

export interface SweepChunkTask {
  definition: SweepDefinition
  indexes: number[]
  /** Date.now() past which no new point starts (the sweep's time limit). */
  deadline: number
}

let cached: { key: string; runner: ReturnType<typeof createPointRunner> } | null = null

function runnerFor(definition: SweepDefinition) {
  const key = JSON.stringify(definition)
  if (cached?.key !== key) {
    const r = resolveSweep(definition)
    if (!r.ok) throw new Error(r.issues.map((i) => i.message).join('; '))
    cached = { key, runner: createPointRunner(r.sweep as ResolvedSweep) }
  }
  return cached.runner
}

export default function runChunk({ definition, indexes, deadline }: SweepChunkTask): SweepPointResult[] {
  const runner = runnerFor(definition)
  const out: SweepPointResult[] = []
  for (const i of indexes) {
    if (Date.now() > deadline) break
    out.push(runner.run(i))
  }
  return out
}
