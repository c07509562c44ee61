import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { membersResponseSchema } from '../../shared/schemas/workspace'
import { outboxResponseSchema } from '../../shared/schemas/outbox'
import type { Runtime } from '../../server/runtime'
import { buildUser, buildWorkspace, linkToken, startTestServer, waitForMail } from './helpers'

let runtime: Runtime
beforeAll(async () => {
  runtime = await startTestServer()
})
afterAll(async () => {
  await runtime.close()
})

describe('invitations by e-mail', () => {
  it('the owner invites, the e-mail carries an /invite link, the invitee accepts with the invited role', async () => {
    const owner = await buildUser(runtime, { name: 'Olga Owner' })
    const invitee = await buildUser(runtime)
    const workspace = await buildWorkspace([{ user: owner.user, role: 'owner' }], 'Ring Lab')
    const since = new Date()

    const created = await request(runtime.app)
      .post(`/api/workspaces/${workspace.id}/invitations`)
      .set(owner.auth)
      .send({ email: invitee.user.email, role: 'editor' })
    expect(created.status).toBe(201)
    expect(created.body.invitation).toMatchObject({ email: invitee.user.email, role: 'editor', invitedBy: 'Olga Owner' })

    const pending = membersResponseSchema.parse((await request(runtime.app).get(`/api/workspaces/${workspace.id}/members`).set(owner.auth)).body)
    expect(pending.invitations.map((i) => i.email)).toEqual([invitee.user.email])

    const mail = await waitForMail(invitee.user.email, since)
    expect(mail.subject).toBe('Join "Ring Lab" on Chimeline')
    expect(mail.text).toContain('Olga Owner invites you')
    const token = linkToken(mail.text, '/invite')

    const accepted = await request(runtime.app).post('/api/invitations/accept').set(invitee.auth).send({ token })
    expect(accepted.status).toBe(200)
    expect(accepted.body.workspace).toEqual({ id: workspace.id, name: 'Ring Lab', role: 'editor', defaultPreset: 'default-8' })

    const after = membersResponseSchema.parse((await request(runtime.app).get(`/api/workspaces/${workspace.id}/members`).set(invitee.auth)).body)
    expect(after.members.map((m) => m.role)).toEqual(['owner', 'editor'])
    expect(after.invitations).toEqual([])

    const reused = await request(runtime.app).post('/api/invitations/accept').set(invitee.auth).send({ token })
    expect(reused.status).toBe(400)
    expect(reused.body.error.code).toBe('invalid_token')
  })

  it('only the address the invitation was sent to may accept it (issue 9, item 8); the link stays valid for that address', async () => {
    const owner = await buildUser(runtime)
    const invitee = await buildUser(runtime)
    const forwardedTo = await buildUser(runtime)
    const workspace = await buildWorkspace([{ user: owner.user, role: 'owner' }], 'Address lab')
    const since = new Date()
    await request(runtime.app).post(`/api/workspaces/${workspace.id}/invitations`).set(owner.auth).send({ email: invitee.user.email.toUpperCase(), role: 'editor' }).expect(201)
    const token = linkToken((await waitForMail(invitee.user.email, since)).text, '/invite')

    const refused = await request(runtime.app).post('/api/invitations/accept').set(forwardedTo.auth).send({ token })
    expect(refused.status).toBe(403)
    expect(refused.body.error.code).toBe('forbidden')
    expect(refused.body.error.message).toContain('another e-mail address')
    await request(runtime.app).get(`/api/workspaces/${workspace.id}`).set(forwardedTo.auth).expect(404)

    const accepted = await request(runtime.app).post('/api/invitations/accept').set(invitee.auth).send({ token })
    expect(accepted.status).toBe(200)
    expect(accepted.body.workspace.role).toBe('editor')
  })

  it('refuses to invite someone who is a member already', async () => {
    const owner = await buildUser(runtime)
    const editor = await buildUser(runtime)
    const workspace = await buildWorkspace([{ user: owner.user, role: 'owner' }, { user: editor.user, role: 'editor' }])
    const res = await request(runtime.app).post(`/api/workspaces/${workspace.id}/invitations`).set(owner.auth).send({ email: editor.user.email, role: 'viewer' })
    expect(res.status).toBe(409)
  })

  it('accepting needs a signed-in user', async () => {
    const res = await request(runtime.app).post('/api/invitations/accept').send({ token: 'whatever' })
    expect(res.status).toBe(401)
  })

  it('the admin Outbox lists delivered messages newest first', async () => {
    const admin = await buildUser(runtime, { role: 'admin' })
    const owner = await buildUser(runtime)
    const workspace = await buildWorkspace([{ user: owner.user, role: 'owner' }])
    const since = new Date()
    for (const n of [1, 2]) {
      await request(runtime.app).post(`/api/workspaces/${workspace.id}/invitations`).set(owner.auth).send({ email: `outbox-${n}-${workspace.id}@example.test`, role: 'viewer' }).expect(201)
    }
    await waitForMail(`outbox-2-${workspace.id}@example.test`, since)
    const res = await request(runtime.app).get('/api/admin/outbox').set(admin.auth)
    const { messages } = outboxResponseSchema.parse(res.body)
    const ours = messages.filter((m) => m.to.some((t) => t.endsWith(`${workspace.id}@example.test`)))
    expect(ours.map((m) => m.to[0])).toEqual([`outbox-2-${workspace.id}@example.test`, `outbox-1-${workspace.id}@example.test`])
    expect(ours[0]?.html).toContain('/invite?token=')
  })
})
