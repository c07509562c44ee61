/**
 * The Bench's state as scenario content and back. The Bench edits named data
 * in the program text itself (src/lib/bench/dataTable.ts), so a scenario made
 * on the Bench keeps its data there and `initialData` stays as loaded.
 *
 * @example
 *   sameContent(a, { ...a, view: { cursor: 3, window: null, selected: null } }) // false
 */
import type { Expectation } from '@shared/schemas/expectation'
import type { Machine } from '@shared/schemas/machine'
import type { ScenarioContent, ScenarioView } from '@shared/schemas/scenario'
import type { Walkthrough } from '@shared/schemas/walkthrough'

export interface BenchSnapshot {
  program: string
  machine: Machine
  view: ScenarioView
  expectations: Expectation[]
  walkthroughs: Walkthrough[]
}

/** The content fields the Bench edits itself; the rest come from the scenario. */
export type BenchFields = 'program' | 'machine' | 'view' | 'expectations' | 'walkthroughs'

/** Content to save: the Bench's program, machine, view, expectations and walkthroughs over the scenario's other fields. */
export function contentFrom(base: Omit<ScenarioContent, BenchFields>, bench: BenchSnapshot): ScenarioContent {
  return {
    ...base,
    program: bench.program,
    machine: structuredClone(bench.machine),
    view: { ...bench.view },
    expectations: structuredClone(bench.expectations),
    walkthroughs: structuredClone(bench.walkthroughs),
  }
}

/** Stable JSON: object keys sorted, so that two equal contents give equal text whatever the key order. */
export function stableJson(v: unknown): string {
  if (Array.isArray(v)) return `[${v.map(stableJson).join(',')}]`
  if (v && typeof v === 'object') {
    const entries = Object.entries(v as Record<string, unknown>).filter(([, x]) => x !== undefined)
    entries.sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))
    return `{${entries.map(([k, x]) => `${JSON.stringify(k)}:${stableJson(x)}`).join(',')}}`
  }
  return JSON.stringify(v)
}

export function sameContent(a: ScenarioContent, b: ScenarioContent): boolean {
  return stableJson(a) === stableJson(b)
}

/** A file name for a downloaded bundle: the title when there is one scenario, else the date. */
export function bundleFileName(titles: string[], now: Date): string {
  const slug = (s: string) =>
    s
      .toLowerCase()
      .replace(/[^\p{L}\p{N}]+/gu, '-')
      .replace(/^-+|-+$/g, '')
      .slice(0, 60) || 'scenario'
  const stem = titles.length === 1 && titles[0] ? slug(titles[0]) : `scenarios-${now.toISOString().slice(0, 10)}`
  return `${stem}.chimeline.json`
}
