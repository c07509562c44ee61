import { describe, expect, it } from 'vitest'
import { decodeView, encodeView, hasView, sameView, withView, EMPTY_VIEW } from '@/lib/bench/viewState'

describe('the view in the URL', () => {
  it('round-trips cursor, window and selection', () => {
    const view = { cursor: 40, window: { start: 10, end: 120 }, selected: 3, subRows: false, dependencies: false, register: null }
    expect(encodeView(view)).toEqual({ cycle: '40', from: '10', to: '120', sel: '3' })
    expect(decodeView(encodeView(view))).toEqual(view)
  })

  it('round-trips the R/E/W and Dependencies switches and the register shown (issue 10)', () => {
    const view = { cursor: 11, window: null, selected: 3, subRows: true, dependencies: true, register: 8 }
    expect(encodeView(view)).toEqual({ cycle: '11', sel: '3', rew: '1', deps: '1', reg: '8' })
    expect(decodeView(encodeView(view))).toEqual(view)
    expect(hasView(decodeView({ reg: '8' }))).toBe(true)
    expect(hasView(decodeView({ scenario: 'x' }))).toBe(false)
    // v32 does not exist in RISC-V V 1.0 (32 vector registers, section 3.2).
    expect(decodeView({ reg: '32' }).register).toBeNull()
  })

  it('leaves out what is not set', () => {
    expect(encodeView(EMPTY_VIEW)).toEqual({})
    expect(decodeView({})).toEqual(EMPTY_VIEW)
  })

  it.each([
    [{ cycle: '-3' }, 'a negative cycle'],
    [{ cycle: '1e3' }, 'an exponent'],
    [{ cycle: '12abc' }, 'trailing letters'],
    [{ cycle: '5000001' }, 'a cycle beyond the 5,000,000-cycle limit'],
    [{ from: '50', to: '20' }, 'a window that ends before it starts'],
    [{ from: '50' }, 'half a window'],
    [{ sel: '' }, 'an empty selection'],
  ] as [Record<string, string>, string][])('drops %j (%s)', (query) => {
    expect(decodeView(query)).toEqual(EMPTY_VIEW)
  })

  it('takes the first of repeated query values', () => {
    expect(decodeView({ cycle: ['7', '9'] }).cursor).toBe(7)
  })

  it('compares views by what they write', () => {
    expect(sameView({ ...EMPTY_VIEW, cursor: 4.2 }, { ...EMPTY_VIEW, cursor: 4 })).toBe(true)
    expect(sameView({ ...EMPTY_VIEW, cursor: 4, selected: 1 }, { ...EMPTY_VIEW, cursor: 4, selected: 2 })).toBe(false)
  })

  it('keeps query keys it does not own (scenario, repeated values) and replaces its own', () => {
    const query = { scenario: 'abc-123', cycle: '7', sel: '2', tag: ['a', 'b'], from: '1', to: '9' }
    expect(withView(query, { ...EMPTY_VIEW, cursor: 40 })).toEqual({ scenario: 'abc-123', tag: ['a', 'b'], cycle: '40' })
  })

  it('leaves only the other keys when the view is empty', () => {
    expect(withView({ scenario: 'abc-123', cycle: '7' }, EMPTY_VIEW)).toEqual({ scenario: 'abc-123' })
  })
})
