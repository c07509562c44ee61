import type { APIRequestContext } from '@playwright/test'
import { DEMO_PASSWORD } from './auth'

/** An access token for calling the API directly (set-up steps that are not what a test is about). */
export async function accessToken(request: APIRequestContext, email: string, password = DEMO_PASSWORD): Promise<string> {
  const res = await request.post('/api/auth/signin', { data: { email, password } })
  if (!res.ok()) throw new Error(`sign-in as ${email} failed: ${res.status()} ${await res.text()}`)
  return ((await res.json()) as { accessToken: string }).accessToken
}

export async function workspaceId(request: APIRequestContext, token: string, name = 'Vector Lab'): Promise<string> {
  const res = await request.get('/api/me', { headers: { Authorization: `Bearer ${token}` } })
  const me = (await res.json()) as { workspaces: { id: string; name: string }[] }
  const ws = me.workspaces.find((w) => w.name === name)
  if (!ws) throw new Error(`not a member of ${name}`)
  return ws.id
}

export async function createScenario(request: APIRequestContext, token: string, ws: string, content: { title: string; tags?: string[]; program: string }) {
  const res = await request.post(`/api/workspaces/${ws}/scenarios`, { headers: { Authorization: `Bearer ${token}` }, data: { content } })
  if (res.status() !== 201) throw new Error(`creating ${content.title} failed: ${res.status()} ${await res.text()}`)
  return ((await res.json()) as { scenario: { id: string } }).scenario
}

export interface OutboxMessage {
  to: string[]
  subject: string
  text: string
}

/** The sink's messages to one address, newest first, as the admin Outbox API lists them. */
export async function mailTo(request: APIRequestContext, adminToken: string, address: string): Promise<OutboxMessage[]> {
  const res = await request.get('/api/admin/outbox', { headers: { Authorization: `Bearer ${adminToken}` } })
  const { messages } = (await res.json()) as { messages: OutboxMessage[] }
  return messages.filter((m) => m.to.some((t) => t.toLowerCase().includes(address.toLowerCase())))
}
