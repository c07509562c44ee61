import type { z } from 'zod'
import { createSweepBodySchema, sweepCreatedResponseSchema, sweepListResponseSchema, sweepResponseSchema } from '@shared/schemas/sweep'
import type { Http } from './http'

/** A workspace's saved and server sweeps. */
export function createSweepApi(http: Http) {
  const base = (workspaceId: string) => `/api/workspaces/${encodeURIComponent(workspaceId)}/sweeps`
  return {
    /** The workspace's sweeps, or one scenario's (each with its version number). */
    list: (workspaceId: string, scenarioId?: string) =>
      http.request(scenarioId ? `${base(workspaceId)}?scenarioId=${encodeURIComponent(scenarioId)}` : base(workspaceId), { schema: sweepListResponseSchema }),
    create: (workspaceId: string, body: z.input<typeof createSweepBodySchema>) => http.request(base(workspaceId), { method: 'POST', body, schema: sweepCreatedResponseSchema }),
    get: (workspaceId: string, id: string) => http.request(`${base(workspaceId)}/${encodeURIComponent(id)}`, { schema: sweepResponseSchema }),
    cancel: (workspaceId: string, id: string) => http.request(`${base(workspaceId)}/${encodeURIComponent(id)}/cancel`, { method: 'POST', body: {}, schema: sweepCreatedResponseSchema }),
  }
}
