import type { z } from 'zod'
import {
  createShareLinkBodySchema,
  createShareLinkResponseSchema,
  emailShareLinkResponseSchema,
  shareLinkListResponseSchema,
  shareLinkResponseSchema,
  sharedScenarioResponseSchema,
  type EmailShareLinkBody,
} from '@shared/schemas/share-link'
import { scenarioResponseSchema } from '@shared/schemas/scenario'
import type { Http } from './http'

/** Share links of a scenario, and the public reader's endpoint. */
export function createShareApi(http: Http) {
  const ws = (workspaceId: string) => `/api/workspaces/${encodeURIComponent(workspaceId)}`
  return {
    create: (workspaceId: string, scenarioId: string, body: z.input<typeof createShareLinkBodySchema>) =>
      http.request(`${ws(workspaceId)}/scenarios/${encodeURIComponent(scenarioId)}/share-links`, {
        method: 'POST',
        body,
        schema: createShareLinkResponseSchema,
      }),
    list: (workspaceId: string, scenarioId: string) =>
      http.request(`${ws(workspaceId)}/scenarios/${encodeURIComponent(scenarioId)}/share-links`, { schema: shareLinkListResponseSchema }),
    revoke: (workspaceId: string, linkId: string) =>
      http.request(`${ws(workspaceId)}/share-links/${encodeURIComponent(linkId)}/revoke`, { method: 'POST', body: {}, schema: shareLinkResponseSchema }),
    email: (workspaceId: string, linkId: string, body: EmailShareLinkBody) =>
      http.request(`${ws(workspaceId)}/share-links/${encodeURIComponent(linkId)}/email`, { method: 'POST', body, schema: emailShareLinkResponseSchema }),
    /** The reader's view; sent with the access token when there is one (for workspace-only links). */
    open: (token: string) => http.request(`/api/shares/${encodeURIComponent(token)}`, { schema: sharedScenarioResponseSchema }),
    copyToWorkspace: (workspaceId: string, token: string) =>
      http.request(`${ws(workspaceId)}/scenarios/copy-from-share`, { method: 'POST', body: { token }, schema: scenarioResponseSchema }),
  }
}
