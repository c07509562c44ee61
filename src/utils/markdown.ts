/**
 * User Markdown (scenario descriptions) as safe HTML: markdown-it with raw
 * HTML off (a `<script>` or `<img onerror>` in the text stays text), links
 * recognised, then DOMPurify over the result as a second wall, with links
 * opened in a new tab without the opener. The one place user text becomes
 * HTML; components show it through components/common/MarkdownText.vue.
 *
 * @example
 *   renderMarkdown('**Expected**: 2 cycles') // '<p><strong>Expected</strong>: 2 cycles</p>\n'
 */
import DOMPurify from 'dompurify'
import MarkdownIt from 'markdown-it'

const md = new MarkdownIt({ html: false, linkify: true, breaks: false })
// Every link leaves Chimeline in a new tab that cannot reach back to this page.
md.renderer.rules.link_open = (tokens, idx, options, _env, self) => {
  tokens[idx]!.attrSet('target', '_blank')
  tokens[idx]!.attrSet('rel', 'noopener noreferrer')
  return self.renderToken(tokens, idx, options)
}

export function renderMarkdown(text: string): string {
  return DOMPurify.sanitize(md.render(text), { USE_PROFILES: { html: true }, FORBID_TAGS: ['style', 'img', 'form', 'input'], ADD_ATTR: ['target'] })
}
