import { describe, expect, it } from 'vitest'
import { labelled, percent, utilizationScale } from '@/lib/bench/utilization'

describe('utilization words and scales', () => {
  it.each([
    [0, '0.0%'],
    [0.0437, '4.4%'],
    [0.099, '9.9%'],
    [0.1, '10%'],
    [0.975, '98%'],
    [1, '100%'],
  ])('prints %f as %s', (v, text) => {
    expect(percent(v)).toBe(text)
  })

  it('refuses a value that is not a number', () => {
    expect(() => percent(Number.NaN)).toThrow(/finite number, got NaN/)
  })

  it.each([
    { values: [], top: 0.05, why: 'no values: the smallest scale' },
    { values: [0, 0], top: 0.05, why: 'all idle: the smallest scale' },
    { values: [0.037, 0.051, 0.014], top: 0.1, why: 'just above 5 %: the next top' },
    { values: [0.2], top: 0.2, why: 'a value on a top keeps it' },
    { values: [0.3, 0.05], top: 0.5, why: 'the largest value decides' },
    { values: [0.9], top: 1, why: 'busy banks: the whole range' },
    { values: [1.2], top: 1, why: 'never past the whole range' },
  ])('scales bars to $top when $why', ({ values, top }) => {
    expect(utilizationScale(values)).toBe(top)
  })

  it('labels every column of a short row and every other of a long one', () => {
    expect(Array.from({ length: 8 }, (_, i) => labelled(i, 8)).every(Boolean)).toBe(true)
    expect(Array.from({ length: 16 }, (_, i) => i).filter((i) => labelled(i, 16))).toEqual([0, 2, 4, 6, 8, 10, 12, 14])
  })
})
