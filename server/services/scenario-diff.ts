/**
 * The diff of two versions, readable by people: the program as a line diff
 * (the `diff` package's Myers diff), the machine fields that changed, the
 * other content fields that changed, and the run metrics before and after.
 */
import { diffLines } from 'diff'
import type { LineChange, ScenarioVersion, VersionDiff } from '../../shared/schemas/scenario'

/** Leaves of a JSON object as dotted paths, e.g. `units.fpu.latency`. */
function flatten(value: unknown, prefix = '', out: Record<string, unknown> = {}): Record<string, unknown> {
  if (value !== null && typeof value === 'object' && !Array.isArray(value)) {
    for (const [k, v] of Object.entries(value as Record<string, unknown>)) flatten(v, prefix ? `${prefix}.${k}` : k, out)
  } else out[prefix] = value
  return out
}

/** Line changes with 1-based start lines on each side. */
export function lineChanges(before: string, after: string): { changes: LineChange[]; added: number; removed: number } {
  const changes: LineChange[] = []
  let oldLine = 1
  let newLine = 1
  let added = 0
  let removed = 0
  for (const part of diffLines(before, after)) {
    const lines = part.value.replace(/\n$/, '').split('\n')
    if (part.added) {
      changes.push({ op: 'insert', oldStart: null, newStart: newLine, lines })
      newLine += lines.length
      added += lines.length
    } else if (part.removed) {
      changes.push({ op: 'delete', oldStart: oldLine, newStart: null, lines })
      oldLine += lines.length
      removed += lines.length
    } else {
      changes.push({ op: 'equal', oldStart: oldLine, newStart: newLine, lines })
      oldLine += lines.length
      newLine += lines.length
    }
  }
  return { changes, added, removed }
}

export function diffVersions(from: ScenarioVersion, to: ScenarioVersion): VersionDiff {
  const a = flatten(from.content.machine)
  const b = flatten(to.content.machine)
  const machine = [...new Set([...Object.keys(a), ...Object.keys(b)])]
    .filter((field) => JSON.stringify(a[field]) !== JSON.stringify(b[field]))
    .map((field) => ({ field, before: a[field] ?? null, after: b[field] ?? null }))
  const fields = (['title', 'description', 'tags', 'initialData', 'view'] as const)
    .filter((f) => JSON.stringify(from.content[f]) !== JSON.stringify(to.content[f]))
    .map((field) => ({ field, before: from.content[field], after: to.content[field] }))
  return {
    from: from.number,
    to: to.number,
    program: lineChanges(from.content.program, to.content.program),
    machine,
    fields,
    metrics: { before: from.run, after: to.run },
  }
}
