import request from 'supertest'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Runtime } from '../../server/runtime'
import { DOCUMENTED_ROUTES } from '../../server/services/openapi'
import { startTestServer } from './helpers'

let runtime: Runtime
beforeAll(async () => {
  runtime = await startTestServer()
})
afterAll(async () => {
  await runtime.close()
})

interface Doc {
  openapi: string
  info: { title: string }
  paths: Record<string, Record<string, { requestBody?: { content: Record<string, { schema: { properties?: Record<string, unknown>; required?: string[] } }> }; parameters?: { name: string; in: string }[]; responses: Record<string, unknown> }>>
}

/** Every route the Express router answers, as "METHOD /api/path". */
function expressRoutes(): string[] {
  const stack = (runtime.app as unknown as { router: { stack: { handle?: { stack?: { route?: { path: string; methods: Record<string, boolean> } }[] } }[] } }).router.stack
  const out: string[] = []
  for (const layer of stack) {
    for (const inner of layer.handle?.stack ?? []) {
      if (inner.route) for (const m of Object.keys(inner.route.methods)) out.push(`${m.toUpperCase()} /api${inner.route.path}`)
    }
  }
  return out
}

describe('GET /api/docs', () => {
  it('serves an OpenAPI 3.1 document generated from the zod schemas (OpenAPI Specification 3.1.0)', async () => {
    const res = await request(runtime.app).get('/api/docs').expect(200)
    const doc = res.body as Doc
    expect(doc.openapi).toBe('3.1.0')
    expect(doc.info.title).toBe('Chimeline API')
    const save = doc.paths['/api/workspaces/{id}/scenarios/{scenarioId}/versions']?.post
    const body = save?.requestBody?.content['application/json']?.schema
    expect(body?.required).toEqual(['baseVersion', 'content'])
    expect(Object.keys(save?.responses ?? {})).toEqual(expect.arrayContaining(['201', '409']))
    expect(save?.parameters?.map((p) => `${p.in}:${p.name}`)).toEqual(['path:id', 'path:scenarioId'])
    const list = doc.paths['/api/workspaces/{id}/scenarios']?.get
    expect(list?.parameters?.filter((p) => p.in === 'query').map((p) => p.name)).toEqual(['page', 'pageSize', 'sort', 'order', 'tag', 'author', 'q', 'trash'])
  })

  it('describes every route the app answers, and nothing it does not', () => {
    const documented = DOCUMENTED_ROUTES.map((r) => `${r.method.toUpperCase()} ${r.path}`).sort()
    expect(documented).toEqual([...new Set(expressRoutes())].sort())
  })
})
