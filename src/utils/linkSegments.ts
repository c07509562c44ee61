import LinkifyIt from 'linkify-it'

export type TextSegment = { kind: 'text'; text: string } | { kind: 'link'; text: string; href: string }

// Only explicit http(s) links: no fuzzy "example.com" guesses, no mailto:, ftp: or scheme-relative links.
const linkify = new LinkifyIt({}, { fuzzyLink: false, fuzzyEmail: false, fuzzyIP: false })
const SAFE_SCHEMAS = new Set(['http:', 'https:'])

/**
 * Splits plain text into text and link pieces, so that a template can render
 * links as anchors without ever passing markup through `v-html`.
 *
 * @example linkSegments('Open https://a.test/x now')
 *   // [{kind:'text',text:'Open '},{kind:'link',text:'https://a.test/x',href:'https://a.test/x'},{kind:'text',text:' now'}]
 */
export function linkSegments(text: string): TextSegment[] {
  const segments: TextSegment[] = []
  let at = 0
  for (const match of linkify.match(text) ?? []) {
    if (!SAFE_SCHEMAS.has(match.schema.toLowerCase())) continue
    if (match.index > at) segments.push({ kind: 'text', text: text.slice(at, match.index) })
    segments.push({ kind: 'link', text: match.raw, href: match.url })
    at = match.lastIndex
  }
  if (at < text.length) segments.push({ kind: 'text', text: text.slice(at) })
  return segments
}
