import { bundleSchema } from '@shared/schemas/bundle'
import {
  suiteListResponseSchema,
  suiteResponseSchema,
  suiteRunCreatedResponseSchema,
  suiteRunListResponseSchema,
  suiteRunResponseSchema,
  type SuiteBodyInput,
  type SuiteRunBody,
} from '@shared/schemas/suite'
import type { Http } from './http'

/** A workspace's suites and their runs. */
export function createSuiteApi(http: Http) {
  const base = (workspaceId: string) => `/api/workspaces/${encodeURIComponent(workspaceId)}/suites`
  const one = (workspaceId: string, id: string) => `${base(workspaceId)}/${encodeURIComponent(id)}`
  return {
    list: (workspaceId: string) => http.request(base(workspaceId), { schema: suiteListResponseSchema }),
    create: (workspaceId: string, body: SuiteBodyInput) => http.request(base(workspaceId), { method: 'POST', body, schema: suiteResponseSchema }),
    get: (workspaceId: string, id: string) => http.request(one(workspaceId, id), { schema: suiteResponseSchema }),
    update: (workspaceId: string, id: string, body: SuiteBodyInput) => http.request(one(workspaceId, id), { method: 'PATCH', body, schema: suiteResponseSchema }),
    remove: (workspaceId: string, id: string) => http.request(one(workspaceId, id), { method: 'DELETE' }),
    exportBundle: (workspaceId: string, id: string) => http.request(`${one(workspaceId, id)}/export`, { schema: bundleSchema }),
    run: (workspaceId: string, id: string, body: SuiteRunBody = {}) => http.request(`${one(workspaceId, id)}/runs`, { method: 'POST', body, schema: suiteRunCreatedResponseSchema }),
    runs: (workspaceId: string, id: string) => http.request(`${one(workspaceId, id)}/runs`, { schema: suiteRunListResponseSchema }),
    getRun: (workspaceId: string, id: string, runId: string) => http.request(`${one(workspaceId, id)}/runs/${encodeURIComponent(runId)}`, { schema: suiteRunResponseSchema }),
  }
}
