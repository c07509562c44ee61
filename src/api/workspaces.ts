import { meResponseSchema, workspaceResponseSchema, type AcceptInvitationBody, type WorkspaceBody, type WorkspacePatch } from '@shared/schemas/workspace'
import type { Http } from './http'

export function createWorkspaceApi(http: Http) {
  return {
    /** The signed-in user and the workspaces they belong to, with their role in each. */
    me: () => http.request('/api/me', { schema: meResponseSchema }),
    create: (body: WorkspaceBody) => http.request('/api/workspaces', { method: 'POST', body, schema: workspaceResponseSchema }),
    update: (id: string, body: WorkspacePatch) =>
      http.request(`/api/workspaces/${encodeURIComponent(id)}`, { method: 'PATCH', body, schema: workspaceResponseSchema }),
    acceptInvitation: (body: AcceptInvitationBody) =>
      http.request('/api/invitations/accept', { method: 'POST', body, schema: workspaceResponseSchema }),
  }
}
