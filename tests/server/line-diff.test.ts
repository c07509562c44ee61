/**
 * The bounded line diff (server/services/line-diff.ts) against an outside
 * reference: the length of a longest common subsequence by the textbook
 * dynamic programme (Cormen, Leiserson, Rivest, Stein, "Introduction to
 * Algorithms", section 15.4 "Longest common subsequence", from memory). A
 * minimal line diff of texts of N and M lines has exactly N + M - 2 * LCS
 * edits (Myers 1986, section 1: D = N + M - 2L), and replaying it must give
 * back both texts.
 */
import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { lineDiff, splitLines, type ProgramDiff } from '../../server/services/line-diff'

function lcsLength(a: string[], b: string[]): number {
  const row = new Array<number>(b.length + 1).fill(0)
  for (let i = 1; i <= a.length; i++) {
    let diag = 0
    for (let j = 1; j <= b.length; j++) {
      const up = row[j] as number
      row[j] = a[i - 1] === b[j - 1] ? diag + 1 : Math.max(up, row[j - 1] as number)
      diag = up
    }
  }
  return row[b.length] as number
}

/** Replays a diff: the old text from equal + delete, the new from equal + insert, checking each start line. */
function replay(diff: ProgramDiff): { before: string[]; after: string[] } {
  const before: string[] = []
  const after: string[] = []
  for (const c of diff.changes) {
    if (c.op !== 'insert') {
      expect(c.oldStart).toBe(before.length + 1)
      before.push(...c.lines)
    }
    if (c.op !== 'delete') {
      expect(c.newStart).toBe(after.length + 1)
      after.push(...c.lines)
    }
  }
  return { before, after }
}

const text = (lines: string[]) => lines.map((l) => `${l}\n`).join('')

describe('bounded line diff', () => {
  it('is minimal and replays to both texts on random programs of a small alphabet (LCS reference, CLRS 15.4)', () => {
    const line = fc.constantFrom('  nop', '  vadd.vv v1, v2, v3', 'loop:', '  bnez a0, loop', '  li a0, 4')
    fc.assert(
      fc.property(fc.array(line, { maxLength: 40 }), fc.array(line, { maxLength: 40 }), (a, b) => {
        const diff = lineDiff(text(a), text(b))
        expect(diff.exact).toBe(true)
        expect(replay(diff)).toEqual({ before: a, after: b })
        expect(diff.added + diff.removed).toBe(a.length + b.length - 2 * lcsLength(a, b))
      }),
      { numRuns: 300 },
    )
  })

  it('a worked example: one line changed in the middle of five (Myers 1986, D = N + M - 2L = 2)', () => {
    const diff = lineDiff('a\nb\nc\nd\ne\n', 'a\nb\nX\nd\ne\n')
    expect(diff).toEqual({
      exact: true,
      added: 1,
      removed: 1,
      changes: [
        { op: 'equal', oldStart: 1, newStart: 1, lines: ['a', 'b'] },
        { op: 'delete', oldStart: 3, newStart: null, lines: ['c'] },
        { op: 'insert', oldStart: null, newStart: 3, lines: ['X'] },
        { op: 'equal', oldStart: 4, newStart: 4, lines: ['d', 'e'] },
      ],
    })
  })

  it('past the edit budget it answers a correct, coarse diff: common head and tail, one replaced block, exact false', () => {
    const a = ['head', ...Array.from({ length: 50 }, (_, i) => `a${i}`), 'tail']
    const b = ['head', ...Array.from({ length: 50 }, (_, i) => `b${i}`), 'tail']
    const diff = lineDiff(text(a), text(b), { edits: 10, steps: 1_000_000 })
    expect(diff.exact).toBe(false)
    expect(replay(diff)).toEqual({ before: a, after: b })
    expect(diff.changes.map((c) => [c.op, c.lines.length])).toEqual([['equal', 1], ['delete', 50], ['insert', 50], ['equal', 1]])
  })

  it('past the step budget too (many equal lines along many diagonals)', () => {
    const a = Array.from({ length: 400 }, (_, i) => (i % 2 ? 'x' : 'y'))
    const b = Array.from({ length: 400 }, (_, i) => (i % 3 ? 'x' : 'y'))
    const diff = lineDiff(text(a), text(b), { edits: 10_000, steps: 50 })
    expect(diff.exact).toBe(false)
    expect(replay(diff)).toEqual({ before: a, after: b })
  })

  it('splits lines as a text editor does: a final newline ends the last line', () => {
    expect(splitLines('')).toEqual([])
    expect(splitLines('a')).toEqual(['a'])
    expect(splitLines('a\n')).toEqual(['a'])
    expect(splitLines('a\n\n')).toEqual(['a', ''])
  })

  it('two 200,000-character programs with every line different finish within the budget, coarse but correct', () => {
    const a = Array.from({ length: 20_000 }, (_, i) => `  addi a${i % 8}, a1, ${i}`)
    const b = Array.from({ length: 20_000 }, (_, i) => `  addi t${i % 7}, a2, ${i}`)
    const diff = lineDiff(text(a).slice(0, 200_000), text(b).slice(0, 200_000))
    expect(diff.exact).toBe(false)
    const replayed = replay(diff)
    expect(replayed.before.join('\n')).toBe(splitLines(text(a).slice(0, 200_000)).join('\n'))
    expect(replayed.after.join('\n')).toBe(splitLines(text(b).slice(0, 200_000)).join('\n'))
  })
})
