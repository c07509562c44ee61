/**
 * The diff of two versions, readable by people: the program as a line diff
 * (line-diff.ts: Myers' diff within a budget), the machine fields that
 * changed, the other content fields that changed, and the run metrics before
 * and after. The route runs it on the work pool (work-tasks.ts).
 */
import { describeExpectation } from '../../shared/expectations/describe'
import type { Expectation } from '../../shared/schemas/expectation'
import type { ScenarioVersion, VersionDiff } from '../../shared/schemas/scenario'
import { lineDiff } from './line-diff'

/** Leaves of a JSON object as dotted paths, e.g. `units.fpu.latency`. */
function flatten(value: unknown, prefix = '', out: Record<string, unknown> = {}): Record<string, unknown> {
  if (value !== null && typeof value === 'object' && !Array.isArray(value)) {
    for (const [k, v] of Object.entries(value as Record<string, unknown>)) flatten(v, prefix ? `${prefix}.${k}` : k, out)
  } else out[prefix] = value
  return out
}

/** Claims of `a` that `b` lacks, counted as a multiset (a claim kept twice and dropped once is one removal). */
function missingFrom(a: Expectation[], b: Expectation[]): string[] {
  const left = new Map<string, number>()
  for (const e of b) left.set(JSON.stringify(e), (left.get(JSON.stringify(e)) ?? 0) + 1)
  return a.filter((e) => {
    const n = left.get(JSON.stringify(e)) ?? 0
    if (n > 0) left.set(JSON.stringify(e), n - 1)
    return n === 0
  }).map(describeExpectation)
}

const walkthroughTitles = (v: ScenarioVersion) => v.content.walkthroughs.map((w) => `${w.title} (${w.steps.length} steps)`)

export function diffVersions(from: ScenarioVersion, to: ScenarioVersion): VersionDiff {
  const a = flatten(from.content.machine)
  const b = flatten(to.content.machine)
  const machine = [...new Set([...Object.keys(a), ...Object.keys(b)])]
    .filter((field) => JSON.stringify(a[field]) !== JSON.stringify(b[field]))
    .map((field) => ({ field, before: a[field] ?? null, after: b[field] ?? null }))
  const fields: VersionDiff['fields'] = (['title', 'description', 'tags', 'initialData', 'view'] as const)
    .filter((f) => JSON.stringify(from.content[f]) !== JSON.stringify(to.content[f]))
    .map((field) => ({ field, before: from.content[field], after: to.content[field] }))
  // Walkthroughs are long; the diff names them by title and step count (the history shows the rest).
  if (JSON.stringify(from.content.walkthroughs) !== JSON.stringify(to.content.walkthroughs)) {
    fields.push({ field: 'walkthroughs', before: walkthroughTitles(from), after: walkthroughTitles(to) })
  }
  return {
    from: from.number,
    to: to.number,
    program: lineDiff(from.content.program, to.content.program),
    machine,
    fields,
    expectations: { added: missingFrom(to.content.expectations, from.content.expectations), removed: missingFrom(from.content.expectations, to.content.expectations) },
    metrics: { before: from.run, after: to.run },
  }
}
