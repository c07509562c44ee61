/**
 * Issue 14 "Classroom": a teacher invites a class from a pasted list. Each new
 * address gets the ordinary invitation e-mail (as viewer by default);
 * repeats, members and pending invitees are reported and not e-mailed; a bad
 * address fails the request with its line and column; the list's e-mails come
 * out of the hourly and daily budgets all or none (outbound limits per sender:
 * common practice; Retry-After in seconds per RFC 9110 section 10.2.3).
 */
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { BULK_INVITE_MAX_ADDRESSES, BULK_INVITE_TEXT_MAX_LENGTH } from '../../shared/schemas/classroom'
import { Invitation, MailSend, Membership, OutboxMessage, User } from '../../server/models'
import type { Runtime } from '../../server/runtime'
import { buildUser, buildWorkspace, linkToken, startTestServer, uniqueEmail, waitForMail, type BuiltUser } from './helpers'

let runtime: Runtime
beforeAll(async () => {
  runtime = await startTestServer({
    mailLimits: {
      enabled: true,
      regular: { perHour: 6, perDay: 9, recipientsPerMessage: 3 },
      newAccount: { perHour: 2, perDay: 3, recipientsPerMessage: 1 },
      newAccountDays: 3,
    },
  })
})
afterAll(async () => {
  await runtime.close()
})

const api = () => request(runtime.app)

async function teacher(): Promise<{ owner: BuiltUser; workspaceId: string }> {
  const owner = await buildUser(runtime, { name: 'Prof Ada' })
  // An established account: the regular budget applies.
  await User.update({ createdAt: new Date(Date.now() - 30 * 86_400_000) }, { where: { id: owner.user.id }, silent: true })
  await owner.user.reload()
  const workspace = await buildWorkspace([{ user: owner.user, role: 'owner' }], 'Architecture 101')
  return { owner, workspaceId: workspace.id }
}

const bulk = (owner: BuiltUser, workspaceId: string, body: object) => api().post(`/api/workspaces/${workspaceId}/invitations/bulk`).set(owner.auth).send(body)
const delivered = (to: string) => OutboxMessage.count({ where: { to: [to] } })

describe('POST /api/workspaces/:id/invitations/bulk', () => {
  it('invites each new address once as viewer, reports repeats, members and pending invitees, and a student accepts as viewer', async () => {
    const { owner, workspaceId } = await teacher()
    const member = await buildUser(runtime)
    await Membership.create({ workspaceId, userId: member.user.id, role: 'editor' })
    const pendingOne = uniqueEmail('pending')
    await api().post(`/api/workspaces/${workspaceId}/invitations`).set(owner.auth).send({ email: pendingOne, role: 'viewer' }).expect(201)
    const [a, b] = [uniqueEmail('student'), uniqueEmail('student')]
    const since = new Date()
    const text = `${a}\nBea Student <${b.toUpperCase()}>, ${a}\n\n${member.user.email}\n${pendingOne}`
    const res = await bulk(owner, workspaceId, { addresses: text })
    expect(res.status).toBe(201)
    expect(res.body.invited.map((i: { email: string; role: string }) => [i.email, i.role])).toEqual([
      [a, 'viewer'],
      [b, 'viewer'],
    ])
    expect(res.body.duplicates).toEqual([{ email: a, lines: [1, 2] }])
    expect(res.body.members).toEqual([{ email: member.user.email, line: 4 }])
    expect(res.body.pending).toEqual([{ email: pendingOne, line: 5 }])
    expect(res.body.failed).toEqual([])
    // One e-mail each to the new addresses, none to the member, the pending one only its first.
    expect(await delivered(a)).toBe(1)
    expect(await delivered(member.user.email)).toBe(0)
    expect(await delivered(pendingOne)).toBe(1)

    const mail = await waitForMail(b, since)
    expect(mail.subject).toBe('Join "Architecture 101" on Chimeline')
    const student = await buildUser(runtime, { email: b })
    const accepted = await api().post('/api/invitations/accept').set(student.auth).send({ token: linkToken(mail.text, '/invite') })
    expect(accepted.status).toBe(200)
    expect(accepted.body.workspace.role).toBe('viewer')
    // The budget counted two e-mails for the list (plus the single invite before it).
    expect(await MailSend.sum('recipients', { where: { userId: owner.user.id } })).toBe(3)
  })

  it('takes another role when asked (a teaching assistant as editor)', async () => {
    const { owner, workspaceId } = await teacher()
    const res = await bulk(owner, workspaceId, { addresses: uniqueEmail('ta'), role: 'editor' })
    expect(res.status).toBe(201)
    expect(res.body.invited[0].role).toBe('editor')
  })

  it('a bad address fails the whole list with one field per line (line and column), and nothing is sent', async () => {
    const { owner, workspaceId } = await teacher()
    const good = uniqueEmail('good')
    const res = await bulk(owner, workspaceId, { addresses: `${good}\n  bob@, Ada Lovelace\nfine@example.test` })
    expect(res.status).toBe(400)
    expect(res.body.error.code).toBe('validation_failed')
    expect(res.body.error.message).toBe('3 entries are not e-mail addresses (first on line 2); nothing was sent')
    expect(res.body.error.fields).toEqual({
      'addresses.line.2':
        'Line 2, column 3: "bob@" is not an e-mail address (Enter a valid e-mail address); Line 2, column 9: "Ada" is not an e-mail address (Enter a valid e-mail address); Line 2, column 13: "Lovelace" is not an e-mail address (Enter a valid e-mail address)',
    })
    expect(await Invitation.count({ where: { workspaceId } })).toBe(0)
    expect(await delivered(good)).toBe(0)
  })

  it('an empty list, a list over the address limit and a text over the length limit are 400 naming `addresses`', async () => {
    const { owner, workspaceId } = await teacher()
    const empty = await bulk(owner, workspaceId, { addresses: ' \n ' })
    expect(empty.status).toBe(400)
    expect(empty.body.error.fields).toEqual({ addresses: 'Paste at least one e-mail address' })
    const many = Array.from({ length: BULK_INVITE_MAX_ADDRESSES + 1 }, (_, i) => `s${i}@x.test`).join('\n')
    const over = await bulk(owner, workspaceId, { addresses: many })
    expect(over.status).toBe(400)
    expect(over.body.error.fields).toEqual({ addresses: `At most ${BULK_INVITE_MAX_ADDRESSES} addresses per list; this one has ${BULK_INVITE_MAX_ADDRESSES + 1}: send it in parts` })
    const long = await bulk(owner, workspaceId, { addresses: 'a'.repeat(BULK_INVITE_TEXT_MAX_LENGTH + 1) })
    expect(long.status).toBe(400)
    expect(long.body.error.fields.addresses).toBe(`The list has at most ${BULK_INVITE_TEXT_MAX_LENGTH} characters`)
    const role = await bulk(owner, workspaceId, { addresses: 'a@x.test', role: 'student' })
    expect(role.status).toBe(400)
    expect(Object.keys(role.body.error.fields)).toEqual(['role'])
    expect(await Invitation.count({ where: { workspaceId } })).toBe(0)
  })

  it('past the e-mail limits: a list larger than the hourly budget is 400 (send it in parts); one that does not fit yet is 429 with Retry-After and how many are left; nothing is sent either way', async () => {
    const { owner, workspaceId } = await teacher()
    const seven = Array.from({ length: 7 }, () => uniqueEmail('big'))
    const tooBig = await bulk(owner, workspaceId, { addresses: seven.join('\n') })
    expect(tooBig.status).toBe(400)
    expect(tooBig.body.error.fields).toEqual({ addresses: 'This list needs 7 e-mails, and an account may have the server send at most 6 an hour: send it in parts of at most 6' })

    const first = Array.from({ length: 4 }, () => uniqueEmail('first'))
    await bulk(owner, workspaceId, { addresses: first.join(', ') }).expect(201)
    const next = Array.from({ length: 3 }, () => uniqueEmail('next'))
    const refused = await bulk(owner, workspaceId, { addresses: next.join('\n') })
    expect(refused.status).toBe(429)
    expect(refused.body.error.code).toBe('rate_limited')
    expect(refused.body.error.message).toContain('6 e-mail(s) per hour (2 left, 3 needed); nothing was sent')
    const retry = Number(refused.headers['retry-after'])
    expect(retry).toBeGreaterThan(0)
    expect(retry).toBeLessThanOrEqual(3600)
    for (const e of [...seven, ...next]) expect(await delivered(e)).toBe(0)
    expect(await Invitation.count({ where: { workspaceId } })).toBe(4)
    // Members, repeats and pending invitees cost nothing: the four again plus two new ones fit the 2 left.
    const two = [uniqueEmail('fits'), uniqueEmail('fits')]
    const fits = await bulk(owner, workspaceId, { addresses: [...first, ...two].join('\n') })
    expect(fits.status).toBe(201)
    expect(fits.body.invited).toHaveLength(2)
    expect(fits.body.pending).toHaveLength(4)
  })

  it('a new account has the smaller budget: three students are already over its hour', async () => {
    const owner = await buildUser(runtime)
    const ws = (await buildWorkspace([{ user: owner.user, role: 'owner' }])).id
    const res = await bulk(owner, ws, { addresses: [uniqueEmail('s'), uniqueEmail('s'), uniqueEmail('s')].join('\n') })
    expect(res.status).toBe(400)
    expect(res.body.error.fields.addresses).toContain('an account younger than 3 day(s) may have the server send at most 2 an hour')
  })

  it('a message the mail server refuses is reported as failed and its invitation withdrawn, so pasting the list again retries just that one', async () => {
    const { owner, workspaceId } = await teacher()
    const [ok, bounce] = [uniqueEmail('ok'), uniqueEmail('bounce')]
    const mailer = runtime.ctx.mailer
    const send = mailer.send.bind(mailer)
    // The SMTP hand-over failing for one recipient (a refused RCPT, a dropped connection).
    mailer.send = async (mail) => {
      if (mail.to === bounce) throw new Error('550 mailbox unavailable')
      return send(mail)
    }
    try {
      const res = await bulk(owner, workspaceId, { addresses: `${ok}\n${bounce}` })
      expect(res.status).toBe(201)
      expect(res.body.invited.map((i: { email: string }) => i.email)).toEqual([ok])
      expect(res.body.failed).toEqual([{ email: bounce, line: 2, message: 'The mail server did not take the message; paste the list again to retry' }])
      expect(await Invitation.count({ where: { workspaceId, email: bounce } })).toBe(0)
    } finally {
      mailer.send = send
    }
    const again = await bulk(owner, workspaceId, { addresses: `${ok}\n${bounce}` })
    expect(again.status).toBe(201)
    expect(again.body.invited.map((i: { email: string }) => i.email)).toEqual([bounce])
    expect(again.body.pending).toEqual([{ email: ok, line: 1 }])
  })
})
