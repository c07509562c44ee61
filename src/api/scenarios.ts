import { bundleSchema } from '@shared/schemas/bundle'
import {
  savedScenarioResponseSchema,
  scenarioListResponseSchema,
  scenarioResponseSchema,
  versionDiffResponseSchema,
  versionListResponseSchema,
  versionResponseSchema,
  type CreateScenarioBody,
  type SaveScenarioBody,
} from '@shared/schemas/scenario'
import type { Http } from './http'

/** The list query as the client builds it; the server's schema fills in the rest. */
export interface ScenarioListParams {
  page: number
  pageSize: number
  sort: 'updatedAt' | 'createdAt' | 'title' | 'author'
  order: 'asc' | 'desc'
  tags: string[]
  author: string | null
  q: string
  trash: boolean
}

/** The query string of a list request; empty filters are left out so the URL stays short. */
export function listQueryString(p: ScenarioListParams): string {
  const q = new URLSearchParams({ page: String(p.page), pageSize: String(p.pageSize), sort: p.sort, order: p.order })
  if (p.tags.length > 0) q.set('tag', p.tags.join(','))
  if (p.author) q.set('author', p.author)
  if (p.q.trim()) q.set('q', p.q.trim())
  if (p.trash) q.set('trash', 'true')
  return q.toString()
}

/** /api/workspaces/:id/scenarios and their versions. */
export function createScenarioApi(http: Http) {
  const ws = (workspaceId: string) => `/api/workspaces/${encodeURIComponent(workspaceId)}/scenarios`
  const one = (workspaceId: string, id: string) => `${ws(workspaceId)}/${encodeURIComponent(id)}`
  return {
    list: (workspaceId: string, params: ScenarioListParams) =>
      http.request(`${ws(workspaceId)}?${listQueryString(params)}`, { schema: scenarioListResponseSchema }),
    get: (workspaceId: string, id: string) => http.request(one(workspaceId, id), { schema: scenarioResponseSchema }),
    create: (workspaceId: string, body: CreateScenarioBody) =>
      http.request(ws(workspaceId), { method: 'POST', body, schema: scenarioResponseSchema }),
    /** A 409 carries saveConflictBodySchema in ApiError.body. */
    save: (workspaceId: string, id: string, body: SaveScenarioBody) =>
      http.request(`${one(workspaceId, id)}/versions`, { method: 'POST', body, schema: savedScenarioResponseSchema }),
    duplicate: (workspaceId: string, id: string, title?: string) =>
      http.request(`${one(workspaceId, id)}/duplicate`, { method: 'POST', body: title ? { title } : {}, schema: scenarioResponseSchema }),
    /** Soft delete (owners): the scenario goes to the trash for 30 days. */
    remove: (workspaceId: string, id: string) => http.request(one(workspaceId, id), { method: 'DELETE' }),
    undelete: (workspaceId: string, id: string) =>
      http.request(`${one(workspaceId, id)}/undo-delete`, { method: 'POST', schema: scenarioResponseSchema }),
    versions: (workspaceId: string, id: string) => http.request(`${one(workspaceId, id)}/versions`, { schema: versionListResponseSchema }),
    version: (workspaceId: string, id: string, n: number) =>
      http.request(`${one(workspaceId, id)}/versions/${n}`, { schema: versionResponseSchema }),
    diff: (workspaceId: string, id: string, from: number, to: number) =>
      http.request(`${one(workspaceId, id)}/versions/diff?from=${from}&to=${to}`, { schema: versionDiffResponseSchema }),
    restore: (workspaceId: string, id: string, n: number, message = '') =>
      http.request(`${one(workspaceId, id)}/versions/${n}/restore`, { method: 'POST', body: { message }, schema: savedScenarioResponseSchema }),
    exportBundle: (workspaceId: string, scenarioIds: string[]) =>
      http.request(`${ws(workspaceId)}/export`, { method: 'POST', body: { scenarioIds }, schema: bundleSchema }),
  }
}
