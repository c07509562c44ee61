import { describe, expect, it } from 'vitest'
import { clampCycle, nextEvent, previousEvent, scrubberEvents } from '@/lib/bench/events'
import { handTrace } from './fixtures'

const trace = handTrace(
  [
    { text: 'vfadd.vv v1,v2,v3', lanes: [[2, 2, 1, 2, 2, 7, 6, 7], [0, 0, -1, -1, -1, -1, -1, -1]] },
    { text: 'vfmul.vv v4,v1,v1', lanes: [[2, 2, 7, 8, 8, 12, 12, 13], [1, 1, 7, 7, 8, 11, 11, 11]] },
  ],
  [{ lane: 1, start: 3, length: 4, reason: 0, instruction: 1 }],
)

describe('scrubberEvents', () => {
  it('lists every phase start and end and every stall start once, in order', () => {
    expect([...scrubberEvents(trace)]).toEqual([1, 2, 3, 6, 7, 8, 11, 12, 13])
  })

  it('leaves out the phases of a lane with no active element', () => {
    expect([...scrubberEvents(trace)]).not.toContain(-1)
  })
})

describe('nextEvent and previousEvent', () => {
  const ev = scrubberEvents(trace)
  it.each([
    [0, 1, null],
    [1, 2, null],
    [4, 6, 3],
    [7, 8, 6],
    [13, null, 12],
    [50, null, 13],
  ])('from cycle %i the next event is %s and the previous %s', (c, next, prev) => {
    expect(nextEvent(ev, c)).toBe(next)
    expect(previousEvent(ev, c)).toBe(prev)
  })
})

describe('clampCycle', () => {
  it.each([
    [-5, 100, 0],
    [42.4, 100, 42],
    [150, 100, 99],
    [Number.NaN, 100, 0],
    [3, 0, 0],
  ])('clamps %s into a run of %i cycles as %i', (c, cycles, expected) => {
    expect(clampCycle(c, cycles)).toBe(expected)
  })
})

describe('shortcutFor', async () => {
  const { shortcutFor, isTypingTarget, SHORTCUTS } = await import('@/lib/bench/shortcuts')
  it.each([
    [{ key: ' ' }, 'play'],
    [{ key: 'ArrowRight' }, 'step-forward'],
    [{ key: 'ArrowRight', shiftKey: true }, 'next-event'],
    [{ key: 'ArrowLeft', shiftKey: true }, 'previous-event'],
    [{ key: '?', shiftKey: true }, 'help'],
    [{ key: 'r', ctrlKey: true }, null],
    [{ key: 'x' }, null],
  ])('maps %j to %s', (e, action) => {
    expect(shortcutFor(e)).toBe(action)
  })

  it('gives every action exactly one entry in the help table', () => {
    expect(new Set(SHORTCUTS.map((s) => s.action)).size).toBe(SHORTCUTS.length)
  })

  it('leaves keys typed into fields alone', () => {
    expect(isTypingTarget({ tagName: 'INPUT' })).toBe(true)
    expect(isTypingTarget({ tagName: 'DIV', isContentEditable: true })).toBe(true)
    expect(isTypingTarget({ tagName: 'BUTTON', closest: () => null })).toBe(false)
  })
})
