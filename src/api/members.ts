import {
  invitationResponseSchema,
  memberResponseSchema,
  membersResponseSchema,
  type InvitationBody,
  type WorkspaceRole,
} from '@shared/schemas/workspace'
import { bulkInvitationResultSchema, type BulkInvitationBody } from '@shared/schemas/classroom'
import type { Http } from './http'

/** /api/workspaces/:id/members and invitations: who belongs to a workspace, with which role. */
export function createMembersApi(http: Http) {
  const base = (workspaceId: string) => `/api/workspaces/${encodeURIComponent(workspaceId)}`
  return {
    list: (workspaceId: string) => http.request(`${base(workspaceId)}/members`, { schema: membersResponseSchema }),
    invite: (workspaceId: string, body: InvitationBody) =>
      http.request(`${base(workspaceId)}/invitations`, { method: 'POST', body, schema: invitationResponseSchema }),
    /** A class at once, from a pasted list of addresses. */
    inviteClass: (workspaceId: string, body: BulkInvitationBody) =>
      http.request(`${base(workspaceId)}/invitations/bulk`, { method: 'POST', body, schema: bulkInvitationResultSchema }),
    changeRole: (workspaceId: string, userId: string, role: WorkspaceRole) =>
      http.request(`${base(workspaceId)}/members/${encodeURIComponent(userId)}`, {
        method: 'PATCH',
        body: { role },
        schema: memberResponseSchema,
      }),
    /** Removes a member; with one's own id, leaves the workspace. */
    remove: (workspaceId: string, userId: string) =>
      http.request(`${base(workspaceId)}/members/${encodeURIComponent(userId)}`, { method: 'DELETE' }),
  }
}
