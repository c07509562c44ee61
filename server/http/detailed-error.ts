import type { ErrorCode } from '../../shared/schemas/errors'
import { ApiError } from './errors'

/**
 * An ApiError whose body carries more than `{ error }`: the two versions of a
 * save conflict, or where in an uploaded file the problem is. The extra keys
 * sit beside `error`, so clients that only know the error shape still work.
 */
export class DetailedApiError extends ApiError {
  constructor(
    status: number,
    code: ErrorCode,
    message: string,
    readonly details: Record<string, unknown>,
    fields?: Record<string, string>,
  ) {
    super(status, code, message, fields)
  }

  override toBody() {
    return { ...super.toBody(), ...this.details }
  }
}
