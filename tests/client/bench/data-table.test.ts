import { describe, expect, it } from 'vitest'
import { assemble } from '@shared/sim/isa'
import { checkValue, dataEntries, setEntryValues, splitValues } from '@/lib/bench/dataTable'

const src = [
  '    .data',
  '    .balign 8',
  'a:  .float 2.5',
  'x:  .float 1.0, 2.0, 3.0  # first row',
  '    .float 4.0, 5.0',
  'n:  .word 7',
  'out:',
  '    .zero 16',
  '    .text',
  'main: li a0, 1',
].join('\n')

describe('dataEntries', () => {
  it('lists each data label with its directive and values, continuation lines included', () => {
    const e = dataEntries(src)
    expect(e.map((x) => [x.name, x.directive, x.values.map((v) => v.text), x.editable])).toEqual([
      ['a', '.float', ['2.5'], true],
      ['x', '.float', ['1.0', '2.0', '3.0', '4.0', '5.0'], true],
      ['n', '.word', ['7'], true],
      ['out', '.zero', [], false],
    ])
    expect(e[3]?.bytes).toBe(16)
  })

  it('leaves text labels out', () => {
    expect(dataEntries(src).map((x) => x.name)).not.toContain('main')
  })

  it('marks a label that mixes directive sizes as not editable', () => {
    expect(dataEntries('.data\nm: .word 1\n .dword 2\n')[0]?.editable).toBe(false)
  })
})

describe('setEntryValues', () => {
  it('replaces the same number of values in place, keeping layout and comments', () => {
    const x = dataEntries(src)[1]!
    const r = setEntryValues(src, x, ['9', '8', '7', '6', '-5.5'])
    expect(r.ok && r.text.split('\n').slice(3, 5)).toEqual(['x:  .float 9, 8, 7  # first row', '    .float 6, -5.5'])
  })

  it('rewrites onto the first line when the number of values changes, and the result assembles', () => {
    const x = dataEntries(src)[1]!
    const r = setEntryValues(src, x, ['1', '2'])
    expect(r.ok).toBe(true)
    if (!r.ok) return
    expect(r.text.split('\n')[3]).toBe('x:  .float 1, 2  # first row')
    expect(r.text.split('\n')[4]).toBe('n:  .word 7')
    // The assembler (shared/sim/isa) is the reference: 8 bytes of x, so n follows at x + 8.
    const a = assemble(r.text)
    expect(a.ok && a.program.symbols.n! - a.program.symbols.x!).toBe(8)
  })

  it.each([
    [1, ['abc'], "x[0]: 'abc' is not a number .float accepts"],
    [2, ['1.5'], "n[0]: '1.5' is not an integer"],
    [2, ['4294967296'], 'n[0]: 4294967296 does not fit in 4 bytes (.word)'],
    [2, [], 'n needs at least one value'],
  ])('refuses a bad edit of entry %i with a message naming the element', (at, values, message) => {
    const e = dataEntries(src)[at]!
    const r = setEntryValues(src, e, values)
    expect(r).toMatchObject({ ok: false, message })
  })

  it('refuses to edit reserved space', () => {
    const r = setEntryValues(src, dataEntries(src)[3]!, ['1'])
    expect(r.ok).toBe(false)
  })
})

describe('checkValue', () => {
  // GNU as accepts the signed and unsigned ranges of a size (binutils as manual, .byte/.word): -2^(n-1) .. 2^n - 1.
  it.each([
    ['.byte', 1, '255', null],
    ['.byte', 1, '-128', null],
    ['.byte', 1, '256', '256 does not fit in 1 byte (.byte)'],
    ['.byte', 1, '-129', '-129 does not fit in 1 byte (.byte)'],
    ['.word', 4, '0x7fffffff', null],
  ])('%s %s', (directive, bytes, value, expected) => {
    expect(checkValue({ kind: 'int', bytes, directive }, value)).toBe(expected)
  })
})

describe('splitValues', () => {
  it('splits on commas and white space', () => {
    expect(splitValues(' 1, 2 3,,4 ')).toEqual(['1', '2', '3', '4'])
  })
})
