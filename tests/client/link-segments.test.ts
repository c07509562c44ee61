import { describe, expect, it } from 'vitest'
import { linkSegments } from '@/utils/linkSegments'

describe('linkSegments', () => {
  it('splits a reset e-mail into text and its link', () => {
    const text = 'Choose a new password:\nhttp://127.0.0.1:3100/reset?token=abc_DEF-123\n\nIgnore this otherwise.'
    expect(linkSegments(text)).toEqual([
      { kind: 'text', text: 'Choose a new password:\n' },
      { kind: 'link', text: 'http://127.0.0.1:3100/reset?token=abc_DEF-123', href: 'http://127.0.0.1:3100/reset?token=abc_DEF-123' },
      { kind: 'text', text: '\n\nIgnore this otherwise.' },
    ])
  })

  // Safety, common practice: only http(s) URLs become anchors; anything a browser would run or guess stays text.
  it.each([
    ['javascript:alert(1)'],
    ['mailto:someone@vector-lab.test'],
    ['ftp://files.test/a'],
    ['//evil.test/path'],
    ['vector-lab.test/bench'],
    ['data:text/html,<script>alert(1)</script>'],
  ])('leaves %s as plain text', (text) => {
    expect(linkSegments(text).every((s) => s.kind === 'text')).toBe(true)
  })

  it('keeps the text whole when it has no link', () => {
    expect(linkSegments('No links here.')).toEqual([{ kind: 'text', text: 'No links here.' }])
    expect(linkSegments('')).toEqual([])
  })

  it('leaves trailing sentence punctuation out of the link', () => {
    const segments = linkSegments('Open https://chimeline.test/invite?token=x.')
    expect(segments[1]).toEqual({ kind: 'link', text: 'https://chimeline.test/invite?token=x', href: 'https://chimeline.test/invite?token=x' })
    expect(segments[2]).toEqual({ kind: 'text', text: '.' })
  })
})
