/**
 * The request work that may take more than a few tens of milliseconds, by
 * name: each runs on the work pool (work-pool.ts), never on the thread that
 * answers requests. A task is a pure function of structured-cloneable input.
 */
import type { ScenarioVersion, VersionDiff } from '../../shared/schemas/scenario'
import { diffVersions } from './scenario-diff'
import { uploadWork } from './uploads'

export const WORK_TASKS = {
  /** The diff of two versions: 0.7 s for two 200,000-character programs on one core. */
  diff: (input: { from: ScenarioVersion; to: ScenarioVersion }): VersionDiff => diffVersions(input.from, input.to),
  /** Reading an uploaded file: 1.2 s for a 40,000-line .s on a loaded core. */
  upload: uploadWork,
}

export type WorkKind = keyof typeof WORK_TASKS
export type WorkInput<K extends WorkKind> = Parameters<(typeof WORK_TASKS)[K]>[0]
export type WorkResult<K extends WorkKind> = ReturnType<(typeof WORK_TASKS)[K]>
