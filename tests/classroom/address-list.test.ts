/**
 * The pasted list of a class: the entry forms mail programs and spreadsheets
 * produce (bare addresses, `Name <address>` and `"Last, First" <address>` as
 * RFC 5322 section 3.4 writes a mailbox with a display name; separators by
 * common practice: newline, comma, semicolon, tab, space), each bad entry
 * placed by line and column, repeats compared in lower case.
 */
import { describe, expect, it } from 'vitest'
import { parseAddressList } from '../../shared/classroom/address-list'

describe('parseAddressList', () => {
  it('reads bare and named addresses, several a line, and skips blank lines', () => {
    const r = parseAddressList('ada@example.org\n\nBob Smith <Bob@Example.org>, "Lovelace, Ada" <ada2@example.org>\tcarl@example.org; dee@example.org eve@example.org')
    expect(r.errors).toEqual([])
    expect(r.addresses).toEqual([
      { email: 'ada@example.org', line: 1 },
      { email: 'bob@example.org', line: 3 },
      { email: 'ada2@example.org', line: 3 },
      { email: 'carl@example.org', line: 3 },
      { email: 'dee@example.org', line: 3 },
      { email: 'eve@example.org', line: 3 },
    ])
  })

  it('keeps a bare address before a named one on the same line (never swallowed into a display name)', () => {
    expect(parseAddressList('ada@x.org Bob <bob@y.org>').addresses.map((a) => a.email)).toEqual(['ada@x.org', 'bob@y.org'])
  })

  it('reports repeats (in lower case) with every line they are on, and lists them once', () => {
    const r = parseAddressList('ada@example.org\nADA@example.org\r\nbob@example.org\rada@example.org')
    expect(r.addresses.map((a) => a.email)).toEqual(['ada@example.org', 'bob@example.org'])
    expect(r.duplicates).toEqual([{ email: 'ada@example.org', lines: [1, 2, 4] }])
  })

  it('places every bad entry by line and column', () => {
    const r = parseAddressList('ok@example.org\n  bob@, fine@example.org\nAda Lovelace\n"open')
    expect(r.errors.map((e) => [e.line, e.column, e.text])).toEqual([
      [2, 3, 'bob@'],
      [3, 1, 'Ada'],
      [3, 5, 'Lovelace'],
      [4, 1, '"open'],
    ])
    expect(r.errors[0]?.message).toBe('Line 2, column 3: "bob@" is not an e-mail address (Enter a valid e-mail address)')
    expect(r.addresses.map((a) => a.email)).toEqual(['ok@example.org', 'fine@example.org'])
  })

  it('an empty or blank text is an empty list, not an error', () => {
    expect(parseAddressList('  \n\n')).toEqual({ addresses: [], duplicates: [], errors: [] })
  })
})
