import { z } from 'zod'
import { textFieldError } from './text'
import { emailSchema, userSchema } from './user'
import { oneTimeTokenSchema } from './auth'
import { PRESET_IDS } from '../sim/presets'

/** What a member may do in a workspace: owners administer, editors write, viewers read. */
export const workspaceRoleSchema = z.enum(['owner', 'editor', 'viewer'])
export type WorkspaceRole = z.infer<typeof workspaceRoleSchema>

export const WORKSPACE_NAME_MAX_LENGTH = 80

export const workspaceNameSchema = z
  .string({ error: textFieldError('A workspace name') })
  .trim()
  .min(1, 'A workspace name is required')
  .max(WORKSPACE_NAME_MAX_LENGTH, `A workspace name has at most ${WORKSPACE_NAME_MAX_LENGTH} characters`)

/** A workspace as seen by one member: with that member's role. */
export const workspaceSummarySchema = z.object({
  id: z.uuid(),
  name: z.string(),
  role: workspaceRoleSchema,
  /** The preset imports start on unless they name one. */
  defaultPreset: z.string(),
})
export type WorkspaceSummary = z.infer<typeof workspaceSummarySchema>

/** GET /api/me */
export const meResponseSchema = z.object({ user: userSchema, workspaces: z.array(workspaceSummarySchema) })
export type MeResponse = z.infer<typeof meResponseSchema>

/** GET /api/workspaces */
export const workspaceListResponseSchema = z.object({ workspaces: z.array(workspaceSummarySchema) })
export type WorkspaceListResponse = z.infer<typeof workspaceListResponseSchema>

export const presetIdSchema = z.enum(PRESET_IDS, { error: `a preset is one of ${PRESET_IDS.join(', ')}` })

/** POST /api/workspaces */
export const workspaceBodySchema = z.object({ name: workspaceNameSchema })
export type WorkspaceBody = z.infer<typeof workspaceBodySchema>

/** PATCH /api/workspaces/:id: a new name, a new default preset, or both. */
export const workspacePatchSchema = z
  .object({ name: workspaceNameSchema.optional(), defaultPreset: presetIdSchema.optional() })
  .strict()
  .refine((b) => b.name !== undefined || b.defaultPreset !== undefined, { message: 'Send a name or a defaultPreset' })
export type WorkspacePatch = z.infer<typeof workspacePatchSchema>

/** GET, POST, PATCH /api/workspaces[/:id]; POST /api/invitations/accept */
export const workspaceResponseSchema = z.object({ workspace: workspaceSummarySchema })
export type WorkspaceResponse = z.infer<typeof workspaceResponseSchema>

export const memberSchema = z.object({
  userId: z.uuid(),
  email: z.string(),
  name: z.string(),
  role: workspaceRoleSchema,
})
export type Member = z.infer<typeof memberSchema>

/** A pending invitation (not yet accepted, not expired). */
export const invitationSchema = z.object({
  id: z.uuid(),
  email: z.string(),
  role: workspaceRoleSchema,
  invitedBy: z.string(),
  createdAt: z.iso.datetime(),
  expiresAt: z.iso.datetime(),
})
export type Invitation = z.infer<typeof invitationSchema>

/** GET /api/workspaces/:id/members */
export const membersResponseSchema = z.object({
  members: z.array(memberSchema),
  invitations: z.array(invitationSchema),
})
export type MembersResponse = z.infer<typeof membersResponseSchema>

/** POST /api/workspaces/:id/invitations -> 201 { invitation } */
export const invitationBodySchema = z.object({ email: emailSchema, role: workspaceRoleSchema })
export type InvitationBody = z.infer<typeof invitationBodySchema>
export const invitationResponseSchema = z.object({ invitation: invitationSchema })

/** POST /api/invitations/accept -> { workspace } */
export const acceptInvitationBodySchema = z.object({ token: oneTimeTokenSchema })
export type AcceptInvitationBody = z.infer<typeof acceptInvitationBodySchema>

/** PATCH /api/workspaces/:id/members/:userId -> { member } */
export const memberRoleBodySchema = z.object({ role: workspaceRoleSchema })
export type MemberRoleBody = z.infer<typeof memberRoleBodySchema>
export const memberResponseSchema = z.object({ member: memberSchema })

/** Invitations are valid for this long. */
export const INVITATION_TTL_SECONDS = 7 * 24 * 60 * 60
