import { z } from 'zod'

/**
 * Stable error codes of the API. Clients branch on `code`, never on `message`,
 * which is for people.
 */
export const errorCodeSchema = z.enum([
  'validation_failed', // 400: `fields` says which field and why
  'malformed_json', // 400: the body is not JSON
  'unauthenticated', // 401: no or an expired access token
  'invalid_credentials', // 401: sign-in failed (never says which half was wrong)
  'invalid_token', // 400: a reset/invitation/refresh token that is unknown, used or expired
  'forbidden', // 403: signed in, but the role does not allow it
  'not_found', // 404
  'conflict', // 409: e.g. the e-mail is taken, the last owner would leave
  'version_conflict', // 409: someone saved the scenario since the version the save started from
  'share_expired', // 410: the share link's expiry time has passed
  'share_revoked', // 410: the share link was revoked (or its scenario deleted)
  'undo_expired', // 410: the 30 days to undo a delete are over
  'invalid_file', // 400: an upload that cannot be read; `diagnostics` says where
  'payload_too_large', // 413
  'unsupported_media_type', // 415: a body in a charset or content coding the server does not read; `fields` names the header
  'rate_limited', // 429
  'internal', // 500: nothing internal is leaked
  'server_busy', // 503: the run summaries of saves are queued to their limit; nothing was saved, try again
])
export type ErrorCode = z.infer<typeof errorCodeSchema>

/** The one error body of the API: `{ error: { code, message, fields? } }`. */
export const errorBodySchema = z.object({
  error: z.object({
    code: errorCodeSchema,
    message: z.string(),
    /** Field path (dot-joined, e.g. `password` or `members.0.role`) -> message. */
    fields: z.record(z.string(), z.string()).optional(),
  }),
})
export type ErrorBody = z.infer<typeof errorBodySchema>

/** The largest JSON body the API accepts. */
export const JSON_BODY_LIMIT_BYTES = 1024 * 1024
