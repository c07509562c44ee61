// @vitest-environment happy-dom
/**
 * Issue 10: scenario descriptions are Markdown, shown rendered (the share
 * page showed `**Expected**` raw) and never as raw HTML from the user.
 * Markdown syntax per CommonMark 0.31 (spec.commonmark.org), as markdown-it implements it.
 */
import { describe, expect, it } from 'vitest'
import { renderMarkdown } from '@/utils/markdown'

describe('descriptions as Markdown', () => {
  it('renders emphasis, lists and code (CommonMark 0.31, sections 6.2, 5.2, 6.1)', () => {
    const html = renderMarkdown('**Expected**: the tail costs a beat.\n\n- lanes 0–1 have `32`\n- lanes 2–7 have 31\n')
    expect(html).toContain('<strong>Expected</strong>')
    expect(html).toContain('<li>lanes 0–1 have <code>32</code></li>')
  })

  it('keeps raw HTML as text and drops script and event handlers', () => {
    const html = renderMarkdown('<script>alert(1)</script> <img src=x onerror="alert(2)"> <b>bold</b>')
    expect(html).not.toContain('<script')
    expect(html).not.toContain('<img')
    expect(html).not.toContain('<b>')
    expect(html).toContain('&lt;script&gt;')
  })

  it('refuses javascript: links and opens real ones in a new tab without the opener', () => {
    expect(renderMarkdown('[x](javascript:alert(1))')).not.toContain('href="javascript:')
    const link = renderMarkdown('See https://example.org/notes')
    expect(link).toContain('href="https://example.org/notes"')
    expect(link).toContain('target="_blank"')
    expect(link).toContain('rel="noopener noreferrer"')
  })
})
