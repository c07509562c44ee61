import { describe, expect, it } from 'vitest'
import { decodeView, encodeView, sameView, withView, EMPTY_VIEW } from '@/lib/bench/viewState'

describe('the view in the URL', () => {
  it('round-trips cursor, window and selection', () => {
    const view = { cursor: 40, window: { start: 10, end: 120 }, selected: 3 }
    expect(encodeView(view)).toEqual({ cycle: '40', from: '10', to: '120', sel: '3' })
    expect(decodeView(encodeView(view))).toEqual(view)
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
    expect(sameView({ cursor: 4.2, window: null, selected: null }, { cursor: 4, window: null, selected: null })).toBe(true)
    expect(sameView({ cursor: 4, window: null, selected: 1 }, { cursor: 4, window: null, selected: 2 })).toBe(false)
  })

  it('keeps query keys it does not own (scenario, repeated values) and replaces its own', () => {
    const query = { scenario: 'abc-123', cycle: '7', sel: '2', tag: ['a', 'b'], from: '1', to: '9' }
    expect(withView(query, { cursor: 40, window: null, selected: null })).toEqual({ scenario: 'abc-123', tag: ['a', 'b'], cycle: '40' })
  })

  it('leaves only the other keys when the view is empty', () => {
    expect(withView({ scenario: 'abc-123', cycle: '7' }, EMPTY_VIEW)).toEqual({ scenario: 'abc-123' })
  })
})
