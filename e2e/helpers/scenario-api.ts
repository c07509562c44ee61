import type { APIRequestContext } from '@playwright/test'

/** Set-up and read-back through the API, for what a test is not about; failures say what the server answered. */
export function scenarioApi(request: APIRequestContext, token: string, ws: string) {
  const headers = { Authorization: `Bearer ${token}` }
  const base = `/api/workspaces/${ws}/scenarios`
  async function json<T>(what: string, res: Awaited<ReturnType<APIRequestContext['get']>>, status = 200): Promise<T> {
    if (res.status() !== status) throw new Error(`${what}: ${res.status()} ${await res.text()}`)
    return (await res.json()) as T
  }
  return {
    async create(content: Record<string, unknown>): Promise<string> {
      const body = await json<{ scenario: { id: string } }>(`creating ${String(content.title)}`, await request.post(base, { headers, data: { content } }), 201)
      return body.scenario.id
    },
    async save(id: string, baseVersion: number, content: Record<string, unknown>, message = ''): Promise<void> {
      await json(`saving ${id} over v${baseVersion}`, await request.post(`${base}/${id}/versions`, { headers, data: { baseVersion, message, content } }), 201)
    },
    async program(id: string, version?: number): Promise<string> {
      if (version === undefined) return (await json<{ scenario: { content: { program: string } } }>(`reading ${id}`, await request.get(`${base}/${id}`, { headers }))).scenario.content.program
      return (await json<{ version: { content: { program: string } } }>(`reading ${id} v${version}`, await request.get(`${base}/${id}/versions/${version}`, { headers }))).version.content.program
    },
    async exportBundle(ids: string[]): Promise<unknown> {
      return json('exporting', await request.post(`${base}/export`, { headers, data: { scenarioIds: ids } }))
    },
  }
}
