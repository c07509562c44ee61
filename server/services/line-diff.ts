/**
 * A line diff with a bounded budget, so that no pair of programs can make it
 * slow: the greedy shortest-edit-script algorithm of E. W. Myers, "An O(ND)
 * Difference Algorithm and Its Variations" (Algorithmica 1, 1986), section 2,
 * run on lines interned to numbers after the common head and tail are cut off.
 * Its cost is O((N + M) + D^2 + snake steps) for D edits; both D and the
 * snake steps are capped. Past either cap the answer is still a correct diff,
 * only not a minimal one: the common head and tail, and everything between
 * as one deleted and one inserted block, flagged `exact: false`.
 *
 * Pure work without I/O: the server runs it on the work pool (work-pool.ts).
 */
import type { LineChange } from '../../shared/schemas/scenario'

export interface DiffBudget {
  /** Most edits (inserted plus deleted lines) of an exact answer. */
  edits: number
  /** Most line comparisons along diagonals ("snakes") of an exact answer. */
  steps: number
}

/** 2,000 edits keep the kept frontier rows under 4 million numbers (16 MB). */
export const DEFAULT_DIFF_BUDGET: DiffBudget = { edits: 2000, steps: 20_000_000 }

export interface ProgramDiff {
  changes: LineChange[]
  added: number
  removed: number
  /** False when the budget ran out and the middle is shown as one replaced block. */
  exact: boolean
}

/** Lines of a text; a final newline ends the last line rather than starting an empty one. */
export function splitLines(text: string): string[] {
  if (text === '') return []
  const lines = text.split('\n')
  if (lines[lines.length - 1] === '') lines.pop()
  return lines
}

type Op = 'equal' | 'insert' | 'delete'

/**
 * The edit script of a[lo..] vs b[lo..] as ops, one per line, or null when
 * the budget runs out. `a` and `b` are interned lines.
 */
function myers(a: Int32Array, b: Int32Array, budget: DiffBudget): Op[] | null {
  const n = a.length
  const m = b.length
  const max = Math.min(n + m, budget.edits)
  const offset = max + 1
  const v = new Int32Array(2 * max + 3)
  const trace: Int32Array[] = []
  let steps = 0
  for (let d = 0; d <= max; d++) {
    // Keep only the diagonals this round can reach: row d covers k in [-d, d].
    trace.push(v.slice(offset - d - 1, offset + d + 2))
    for (let k = -d; k <= d; k += 2) {
      let x = k === -d || (k !== d && (v[offset + k - 1] as number) < (v[offset + k + 1] as number)) ? (v[offset + k + 1] as number) : (v[offset + k - 1] as number) + 1
      let y = x - k
      while (x < n && y < m && a[x] === b[y]) {
        x++
        y++
        steps++
      }
      v[offset + k] = x
      if (x >= n && y >= m) return backtrack(trace, d, n, m)
      if (steps > budget.steps) return null
    }
  }
  return null
}

/** Walks the kept frontiers back from (n, m) to (0, 0). */
function backtrack(trace: Int32Array[], last: number, n: number, m: number): Op[] {
  const ops: Op[] = []
  let x = n
  let y = m
  for (let d = last; d > 0; d--) {
    // trace[d] is v as it was before round d, holding k in [-d-1, d+1] at index k + d + 1.
    const row = trace[d] as Int32Array
    const at = (k: number) => row[k + d + 1] as number
    const k = x - y
    const prevK = k === -d || (k !== d && at(k - 1) < at(k + 1)) ? k + 1 : k - 1
    const prevX = at(prevK)
    const prevY = prevX - prevK
    while (x > prevX && y > prevY) {
      ops.push('equal')
      x--
      y--
    }
    // One step from (prevX, prevY): down is an inserted line, right a deleted one.
    if (x === prevX) {
      ops.push('insert')
      y--
    } else {
      ops.push('delete')
      x--
    }
  }
  while (x > 0 && y > 0) {
    ops.push('equal')
    x--
    y--
  }
  return ops.reverse()
}

/** Line changes with 1-based start lines on each side, within the budget. */
export function lineDiff(before: string, after: string, budget: DiffBudget = DEFAULT_DIFF_BUDGET): ProgramDiff {
  const oldLines = splitLines(before)
  const newLines = splitLines(after)
  let head = 0
  while (head < oldLines.length && head < newLines.length && oldLines[head] === newLines[head]) head++
  let tail = 0
  while (tail < oldLines.length - head && tail < newLines.length - head && oldLines[oldLines.length - 1 - tail] === newLines[newLines.length - 1 - tail]) tail++

  const ids = new Map<string, number>()
  const intern = (lines: string[]) => {
    const out = new Int32Array(lines.length - head - tail)
    for (let i = 0; i < out.length; i++) {
      const line = lines[head + i] as string
      let id = ids.get(line)
      if (id === undefined) ids.set(line, (id = ids.size))
      out[i] = id
    }
    return out
  }
  const a = intern(oldLines)
  const b = intern(newLines)
  const middle = myers(a, b, budget)
  const ops: Op[] = []
  for (let i = 0; i < head; i++) ops.push('equal')
  if (middle) ops.push(...middle)
  else {
    for (let i = 0; i < a.length; i++) ops.push('delete')
    for (let i = 0; i < b.length; i++) ops.push('insert')
  }
  for (let i = 0; i < tail; i++) ops.push('equal')
  return { ...group(ops, oldLines, newLines), exact: middle !== null }
}

/** Runs of one op become one change, with its lines and starts. */
function group(ops: Op[], oldLines: string[], newLines: string[]): Omit<ProgramDiff, 'exact'> {
  const changes: LineChange[] = []
  let x = 0
  let y = 0
  let added = 0
  let removed = 0
  let current: LineChange | null = null
  for (const op of ops) {
    if (!current || current.op !== op) {
      current = { op, oldStart: op === 'insert' ? null : x + 1, newStart: op === 'delete' ? null : y + 1, lines: [] }
      changes.push(current)
    }
    if (op === 'insert') {
      current.lines.push(newLines[y++] as string)
      added++
    } else if (op === 'delete') {
      current.lines.push(oldLines[x++] as string)
      removed++
    } else {
      current.lines.push(oldLines[x++] as string)
      y++
    }
  }
  return { changes, added, removed }
}
