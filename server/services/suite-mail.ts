import type { Mail } from './mailer'

const escapeHtml = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c] as string)

export interface SuiteRunMailInput {
  to: string
  suite: string
  failed: number
  total: number
  modelVersion: number
  /** The first failing claims in words, `scenario › claim (measured ...)`. */
  failures: string[]
  url: string
}

/** A red suite run, to a watcher: how many claims failed, the first few, and the link to the run. */
export function suiteRunMail(m: SuiteRunMailInput): Mail {
  const intro = `The suite "${m.suite}" ran with ${m.failed} of ${m.total} expectations failing (timing model version ${m.modelVersion}).`
  const list = m.failures.map((f) => `- ${f}`).join('\n')
  const note = 'Chimeline results are model estimates, not sign-off for silicon. You get this because you watch the suite.'
  const text = [intro, list, m.url, note].filter(Boolean).join('\n\n') + '\n'
  const html = `<!doctype html>
<html><body style="font-family: 'IBM Plex Sans', sans-serif; line-height: 1.5">
<h2>Chimeline</h2>
<p>${escapeHtml(intro)}</p>
<ul>${m.failures.map((f) => `<li>${escapeHtml(f)}</li>`).join('')}</ul>
<p><a href="${escapeHtml(m.url)}">Open the run of "${escapeHtml(m.suite)}"</a></p>
<p style="color:#666">If the link does not work, copy this address into your browser: ${escapeHtml(m.url)}</p>
<p style="color:#666">${escapeHtml(note)}</p>
</body></html>`
  return { to: m.to, subject: `Suite "${m.suite}": ${m.failed} expectation(s) failing`, text, html }
}
