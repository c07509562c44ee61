import type { ErrorBody, ErrorCode } from '../../shared/schemas/errors'

/** An error the API answers with as `{ error: { code, message, fields? } }`. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: ErrorCode,
    message: string,
    readonly fields?: Record<string, string>,
    /** Sent as the Retry-After header (RFC 9110, section 10.2.3) of a 429 or 503. */
    readonly retryAfterSeconds?: number,
  ) {
    super(message)
    this.name = 'ApiError'
  }

  toBody(): ErrorBody {
    return { error: { code: this.code, message: this.message, ...(this.fields ? { fields: this.fields } : {}) } }
  }
}

/** Factories with the API's stable codes; handlers throw these. */
export const errors = {
  validation: (fields: Record<string, string>, message = 'Some fields are not valid') =>
    new ApiError(400, 'validation_failed', message, fields),
  malformedJson: () => new ApiError(400, 'malformed_json', 'The request body is not valid JSON'),
  invalidToken: (what: string) => new ApiError(400, 'invalid_token', `This ${what} link is invalid or has expired`),
  unauthenticated: (message = 'Sign in to continue') => new ApiError(401, 'unauthenticated', message),
  // One message for unknown e-mail and wrong password alike.
  invalidCredentials: () => new ApiError(401, 'invalid_credentials', 'The e-mail address or password is not correct'),
  forbidden: (message = 'Your role does not allow this') => new ApiError(403, 'forbidden', message),
  notFound: (what = 'resource') => new ApiError(404, 'not_found', `No such ${what}`),
  conflict: (message: string, fields?: Record<string, string>) => new ApiError(409, 'conflict', message, fields),
  payloadTooLarge: (limitBytes: number) =>
    new ApiError(413, 'payload_too_large', `The request body is larger than the limit of ${formatBytes(limitBytes)}`),
  unsupportedMediaType: (header: string, message: string) =>
    new ApiError(415, 'unsupported_media_type', `The request body cannot be read: ${message}`, { [header]: message }),
  rateLimited: (retryAfterSeconds: number, message = 'Too many attempts') =>
    new ApiError(429, 'rate_limited', `${message}; try again in ${Math.max(1, Math.ceil(retryAfterSeconds / 60))} minute(s)`, undefined, Math.max(1, Math.ceil(retryAfterSeconds))),
  internal: () => new ApiError(500, 'internal', 'Something went wrong on the server'),
}

function formatBytes(n: number): string {
  if (n >= 1024 * 1024 && n % (1024 * 1024) === 0) return `${n / (1024 * 1024)} MiB`
  if (n >= 1024 && n % 1024 === 0) return `${n / 1024} KiB`
  return `${n} bytes`
}
