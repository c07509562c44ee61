import { meResponseSchema, workspaceResponseSchema, type AcceptInvitationBody } from '@shared/schemas/workspace'
import type { Http } from './http'

export function createWorkspaceApi(http: Http) {
  return {
    /** The signed-in user and the workspaces they belong to, with their role in each. */
    me: () => http.request('/api/me', { schema: meResponseSchema }),
    acceptInvitation: (body: AcceptInvitationBody) =>
      http.request('/api/invitations/accept', { method: 'POST', body, schema: workspaceResponseSchema }),
  }
}
