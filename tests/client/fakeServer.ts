import { vi } from 'vitest'

/**
 * A stand-in for the network at the `fetch` boundary: routes "METHOD /path" to
 * handlers that answer like the API contract (the API contract of issue 2, as in shared/schemas/errors.ts:
 * JSON bodies, `{ error: { code, message, fields? } }` on failure). Everything
 * above fetch (the client, the stores, the router) runs for real.
 */
export interface FakeRequest {
  method: string
  path: string
  headers: Record<string, string>
  body: unknown
}

type Handler = (req: FakeRequest) => Response | Promise<Response>

export function json(status: number, body?: unknown): Response {
  if (body === undefined) return new Response(null, { status })
  return new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } })
}

export function apiError(status: number, code: string, message: string, fields?: Record<string, string>): Response {
  return json(status, { error: { code, message, ...(fields ? { fields } : {}) } })
}

export function installFakeServer(routes: Record<string, Handler>) {
  const requests: FakeRequest[] = []
  const fetchMock = vi.fn(async (input: RequestInfo | URL, init: RequestInit = {}) => {
    const url = new URL(String(input), 'http://app.test')
    const headers = Object.fromEntries(Object.entries((init.headers ?? {}) as Record<string, string>))
    const req: FakeRequest = {
      method: init.method ?? 'GET',
      path: url.pathname + url.search,
      headers,
      body: typeof init.body === 'string' ? JSON.parse(init.body) : undefined,
    }
    requests.push(req)
    const handler = routes[`${req.method} ${url.pathname}`]
    return handler ? handler(req) : apiError(404, 'not_found', `No route ${req.method} ${url.pathname}`)
  })
  vi.stubGlobal('fetch', fetchMock)
  return { requests, fetchMock, count: (route: string) => requests.filter((r) => `${r.method} ${r.path}` === route).length }
}

export const editor = {
  id: '6f1c2a3e-4b5d-4e6f-8a9b-0c1d2e3f4a5b',
  email: 'editor@vector-lab.test',
  name: 'Eda Editor',
  role: 'member',
} as const

export const admin = { ...editor, id: '7a2d3b4f-5c6e-4f70-9bac-1d2e3f4a5b6c', email: 'admin@vector-lab.test', name: 'Ada Admin', role: 'admin' } as const

export const vectorLab = { id: '0b1c2d3e-4f50-4617-8293-a4b5c6d7e8f9', name: 'Vector Lab', role: 'editor', defaultPreset: 'default-8' } as const
