import type { ErrorCode } from '@shared/schemas/errors'

/**
 * Codes the client adds to the server's: `network` when the server could not
 * be reached, `bad_response` when its answer did not match the shared schema.
 */
export type ApiErrorCode = ErrorCode | 'network' | 'bad_response'

/** Every failed API call ends in one of these, so callers branch on `code`. */
export class ApiError extends Error {
  override readonly name = 'ApiError'

  constructor(
    /** HTTP status; 0 when no answer arrived. */
    readonly status: number,
    readonly code: ApiErrorCode,
    message: string,
    /** Field path -> message, as the server's validation reported it. */
    readonly fields: Readonly<Record<string, string>> = {},
    /** The whole JSON error body, for answers that carry more than the error (a save conflict, an upload's diagnostics). */
    readonly body: unknown = undefined,
  ) {
    super(message)
  }
}

/** The code to assume when an error answer carries no JSON body of ours (e.g. a proxy's 502). */
export function codeForStatus(status: number): ErrorCode {
  switch (status) {
    case 400: return 'validation_failed'
    case 401: return 'unauthenticated'
    case 403: return 'forbidden'
    case 404: return 'not_found'
    case 409: return 'conflict'
    case 413: return 'payload_too_large'
    case 429: return 'rate_limited'
    default: return 'internal'
  }
}
