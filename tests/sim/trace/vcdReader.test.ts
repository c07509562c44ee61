import { describe, expect, it } from 'vitest'
import { parseVcd, valueAt } from './vcdReader'

// The reader that checks Chimeline's dumps must itself follow IEEE 1364-2005
// section 18.2 (from memory); these cases are written from that grammar.
const sample = `$date today $end
$version any writer $end
$timescale 1 ns $end
$scope module top $end
$var wire 1 ! clk $end
$var reg 4 "# count [3:0] $end
$upscope $end
$enddefinitions $end
#0
$dumpvars
0!
bx "#
$end
#1
1!
b101 "#
#3
0!
b1 "#
`

describe('the test VCD reader (IEEE 1364-2005 section 18.2)', () => {
  it('reads declarations, scopes and identifier codes of several characters', () => {
    const f = parseVcd(sample)
    expect(f.timescale).toEqual({ number: 1, unit: 'ns' })
    expect(f.vars.map((v) => [v.id, v.size, v.reference, v.scope.join('.')])).toEqual([
      ['!', 1, 'clk', 'top'],
      ['"#', 4, 'count [3:0]', 'top'],
    ])
  })

  it('left-extends vector values with 0, or with x when the leftmost bit is x', () => {
    const f = parseVcd(sample)
    expect(valueAt(f, '"#', 0)).toBe('xxxx')
    expect(valueAt(f, '"#', 2)).toBe('0101')
    expect(valueAt(f, '"#', 9)).toBe('0001')
    expect(valueAt(f, '!', 2)).toBe('1')
  })

  it.each([
    ['a value change before $enddefinitions', sample.replace('$enddefinitions $end', '1! $enddefinitions $end')],
    ['times that do not increase', sample.replace('#3', '#1')],
    ['an undeclared identifier code', sample.replace('b1 "#', 'b1 %')],
    ['a bad scope type', sample.replace('$scope module', '$scope lane')],
    ['a value wider than its variable', sample.replace('b101 "#', 'b10101 "#')],
    ['a missing $end', sample.replace('$date today $end', '$date today')],
  ])('rejects %s', (_what, text) => {
    expect(() => parseVcd(text)).toThrow(/VCD|wider/)
  })
})
