import type { ShareAccessMode } from '../../shared/schemas/share-link'
import type { Mail } from './mailer'

const escapeHtml = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c] as string)

export interface ShareMailInput {
  to: string
  sender: string
  title: string
  version: number
  note: string
  url: string
  accessMode: ShareAccessMode
  expiresAt: Date | null
}

/** A share link by e-mail: plain text and HTML, the product's name, the sender's note quoted as text. */
export function shareLinkMail(m: ShareMailInput): Mail {
  const who = m.accessMode === 'anyone' ? 'Anyone with the link can open it, without signing in.' : 'It opens for members of the workspace: sign in first.'
  const until = m.expiresAt ? ` The link works until ${m.expiresAt.toISOString().replace('T', ' ').slice(0, 16)} UTC.` : ''
  const intro = `${m.sender} shares the Chimeline scenario "${m.title}" (version ${m.version}) with you: the Bench opens read-only at the cycle, zoom and instruction they chose.`
  const lines = [intro, `${who}${until}`]
  const note = m.note ? `${m.sender} wrote:\n\n${m.note}` : ''
  const text = [intro, note, `${who}${until}`, m.url, 'Chimeline results are model estimates, not sign-off for silicon.'].filter(Boolean).join('\n\n') + '\n'
  const noteHtml = m.note
    ? `<p>${escapeHtml(m.sender)} wrote:</p>\n<blockquote style="white-space: pre-wrap; border-left: 3px solid #ccc; margin: 0; padding-left: 12px">${escapeHtml(m.note)}</blockquote>`
    : ''
  const html = `<!doctype html>
<html><body style="font-family: 'IBM Plex Sans', sans-serif; line-height: 1.5">
<h2>Chimeline</h2>
<p>${escapeHtml(lines[0] as string)}</p>
${noteHtml}
<p>${escapeHtml(lines[1] as string)}</p>
<p><a href="${escapeHtml(m.url)}">Open "${escapeHtml(m.title)}" in Chimeline</a></p>
<p style="color:#666">If the link does not work, copy this address into your browser: ${escapeHtml(m.url)}</p>
<p style="color:#666">Chimeline results are model estimates, not sign-off for silicon.</p>
</body></html>`
  return { to: m.to, subject: `${m.sender} shared "${m.title}" on Chimeline`, text, html }
}
