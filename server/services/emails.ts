import type { Mail } from './mailer'

const escapeHtml = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c] as string)

function layout(paragraphs: string[], link: { href: string; label: string }): string {
  const body = paragraphs.map((p) => `<p>${escapeHtml(p)}</p>`).join('\n')
  return `<!doctype html>
<html><body style="font-family: 'IBM Plex Sans', sans-serif; line-height: 1.5">
<h2>Chimeline</h2>
${body}
<p><a href="${escapeHtml(link.href)}">${escapeHtml(link.label)}</a></p>
<p style="color:#666">If the button does not work, copy this address into your browser: ${escapeHtml(link.href)}</p>
</body></html>`
}

export function passwordResetMail(to: string, name: string, link: string, validMinutes: number): Mail {
  const lines = [
    `Hello ${name},`,
    `someone (hopefully you) asked to reset your Chimeline password. The link below works once, for ${validMinutes} minutes.`,
    'If you did not ask for this, ignore this message: your password stays as it is.',
  ]
  return {
    to,
    subject: 'Reset your Chimeline password',
    text: `${lines.join('\n\n')}\n\n${link}\n`,
    html: layout(lines, { href: link, label: 'Choose a new password' }),
  }
}

export function invitationMail(to: string, inviter: string, workspace: string, role: string, link: string): Mail {
  const lines = [
    `${inviter} invites you to the workspace "${workspace}" on Chimeline as ${role}.`,
    'Open the link to accept; if you have no account yet, sign up with this e-mail address first.',
  ]
  return {
    to,
    subject: `Join "${workspace}" on Chimeline`,
    text: `${lines.join('\n\n')}\n\n${link}\n`,
    html: layout(lines, { href: link, label: 'Accept the invitation' }),
  }
}
