/**
 * A class invited at once: the teacher pastes a list of e-mail addresses
 * (one a line, or separated by commas or semicolons, `Name <address>` too)
 * and every new address gets the workspace's ordinary invitation.
 *
 * POST /api/workspaces/:id/invitations/bulk
 *   { addresses: "ada@example.org\nbob@example.org", role?: "viewer" }
 *   -> 201 BulkInvitationResult
 */
import { z } from 'zod'
import { textFieldError } from './text'
import { invitationSchema, workspaceRoleSchema } from './workspace'

/** Addresses one request may list (after duplicates are dropped): a large lecture course. */
export const BULK_INVITE_MAX_ADDRESSES = 200
/** Characters of the pasted text: 200 addresses of about 100 characters with names. */
export const BULK_INVITE_TEXT_MAX_LENGTH = 20_000

export const bulkInvitationBodySchema = z
  .object({
    addresses: z
      .string({ error: textFieldError('The list of addresses') })
      .max(BULK_INVITE_TEXT_MAX_LENGTH, `The list has at most ${BULK_INVITE_TEXT_MAX_LENGTH} characters`),
    /** Students join as viewers unless the teacher says otherwise. */
    role: workspaceRoleSchema.default('viewer'),
  })
  .strict()
export type BulkInvitationBody = z.input<typeof bulkInvitationBodySchema>

/** An address of the list and the line it was on (1-based). */
export const listedAddressSchema = z.object({ email: z.string(), line: z.number().int() })

export const bulkInvitationResultSchema = z.object({
  /** One invitation e-mailed per new address. */
  invited: z.array(invitationSchema),
  /** Addresses listed more than once: invited once; `lines` are every line they were on. */
  duplicates: z.array(z.object({ email: z.string(), lines: z.array(z.number().int()) })),
  /** Already members of the workspace: nothing sent. */
  members: z.array(listedAddressSchema),
  /** Invited before and not yet accepted nor expired: nothing sent again (the earlier link still works). */
  pending: z.array(listedAddressSchema),
  /** The mail server refused the message: the invitation was withdrawn, so pasting the list again retries it. */
  failed: z.array(listedAddressSchema.extend({ message: z.string() })),
})
export type BulkInvitationResult = z.infer<typeof bulkInvitationResultSchema>
