/**
 * Issue 9, hardening item 4: what an account can make the server e-mail is
 * limited (recipients per message, messages per hour and per day, stricter
 * for new accounts); over a limit nothing is sent and the answer is 429 with
 * Retry-After (RFC 9110, section 10.2.3, in seconds) or, for too many
 * recipients, 400 naming `to`. Limits on outbound mail per sender are common
 * practice for services that send on a user's behalf.
 */
import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { MailSend, OutboxMessage, User } from '../../server/models'
import type { Runtime } from '../../server/runtime'
import { buildUser, buildWorkspace, startTestServer, uniqueEmail, type BuiltUser } from './helpers'
import { buildScenario, buildTeam } from './scenario-helpers'

let runtime: Runtime
beforeAll(async () => {
  runtime = await startTestServer({
    mailLimits: {
      enabled: true,
      regular: { perHour: 5, perDay: 8, recipientsPerMessage: 3 },
      newAccount: { perHour: 2, perDay: 3, recipientsPerMessage: 1 },
      newAccountDays: 3,
    },
  })
})
afterAll(async () => {
  await runtime.close()
})

const api = () => request(runtime.app)

/** Makes a factory user (created now) look 30 days old. */
async function age(who: BuiltUser): Promise<void> {
  await User.update({ createdAt: new Date(Date.now() - 30 * 86_400_000) }, { where: { id: who.user.id }, silent: true })
  await who.user.reload()
}

const invite = (owner: BuiltUser, workspaceId: string, email = uniqueEmail('invitee')) => api().post(`/api/workspaces/${workspaceId}/invitations`).set(owner.auth).send({ email, role: 'viewer' })

/** Messages the sink received for an address; the routes answer after the SMTP hand-over, so a refusal has sent nothing by then. */
const delivered = (to: string) => OutboxMessage.count({ where: { to: [to] } })

describe('outbound e-mail limits', () => {
  it('a new account: its third invitation in an hour is 429 with Retry-After, and that e-mail is not sent', async () => {
    const owner = await buildUser(runtime)
    const ws = (await buildWorkspace([{ user: owner.user, role: 'owner' }])).id
    await invite(owner, ws).expect(201)
    await invite(owner, ws).expect(201)
    const third = uniqueEmail('third')
    const res = await invite(owner, ws, third)
    expect(res.status).toBe(429)
    expect(res.body.error.code).toBe('rate_limited')
    expect(res.body.error.message).toContain('younger than 3 day(s)')
    const retry = Number(res.headers['retry-after'])
    expect(retry).toBeGreaterThan(0)
    expect(retry).toBeLessThanOrEqual(3600)
    expect(await delivered(third)).toBe(0)
  })

  it('a new account may name one recipient per share e-mail; an older one three; more is 400 naming `to`', async () => {
    const team = await buildTeam(runtime, 'Mail lab')
    const scenario = await buildScenario(runtime, team)
    const link = (await api().post(`/api/workspaces/${team.workspace.id}/scenarios/${scenario.id}/share-links`).set(team.editor.auth).send({}).expect(201)).body
    const send = (to: string[]) => api().post(`/api/workspaces/${team.workspace.id}/share-links/${link.link.id}/email`).set(team.editor.auth).send({ token: link.token, to })
    const two = [uniqueEmail('r'), uniqueEmail('r')]
    const refused = await send(two)
    expect(refused.status).toBe(400)
    expect(refused.body.error.fields).toEqual({ to: 'At most 1 address(es) per message for an account younger than 3 day(s)' })
    expect(await delivered(two[0] as string)).toBe(0)
    await age(team.editor)
    await send([...two, uniqueEmail('r')]).expect(202)
    const four = await send([uniqueEmail('r'), uniqueEmail('r'), uniqueEmail('r'), uniqueEmail('r')])
    expect(four.status).toBe(400)
    expect(four.body.error.fields.to).toBe('At most 3 address(es) per message for an account')
  })

  it('an older account: the hourly limit counts recipients; the daily limit counts sends of the last 24 hours', async () => {
    const owner = await buildUser(runtime)
    await age(owner)
    const ws = (await buildWorkspace([{ user: owner.user, role: 'owner' }])).id
    for (let i = 0; i < 5; i++) await invite(owner, ws).expect(201)
    const sixth = await invite(owner, ws)
    expect(sixth.status).toBe(429)
    expect(sixth.body.error.message).toContain('5 e-mail(s) per hour')

    // Another account that sent 7 two to twenty hours ago: the hour is free, the day has room for one.
    const busy = await buildUser(runtime)
    await age(busy)
    const ws2 = (await buildWorkspace([{ user: busy.user, role: 'owner' }])).id
    const hoursAgo = (h: number) => new Date(Date.now() - h * 3_600_000)
    await MailSend.bulkCreate([{ userId: busy.user.id, kind: 'share', recipients: 3, createdAt: hoursAgo(20) }, { userId: busy.user.id, kind: 'share', recipients: 4, createdAt: hoursAgo(2) }])
    await invite(busy, ws2).expect(201)
    const over = await invite(busy, ws2)
    expect(over.status).toBe(429)
    expect(over.body.error.message).toContain('8 e-mail(s) per day')
    // Room comes back when the send of 20 hours ago is 24 hours old: about 4 hours from now.
    const retry = Number(over.headers['retry-after'])
    expect(retry).toBeGreaterThan(3 * 3600)
    expect(retry).toBeLessThanOrEqual(4 * 3600)
  })

  it('concurrent invitations cannot overdraw the budget together', async () => {
    const owner = await buildUser(runtime)
    const ws = (await buildWorkspace([{ user: owner.user, role: 'owner' }])).id
    const results = await Promise.all(Array.from({ length: 6 }, () => invite(owner, ws).then((r) => r.status)))
    expect(results.filter((s) => s === 201)).toHaveLength(2)
    expect(results.filter((s) => s === 429)).toHaveLength(4)
  })
})
