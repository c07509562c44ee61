import type { ErrorRequestHandler, RequestHandler } from 'express'
import { JSON_BODY_LIMIT_BYTES } from '../../shared/schemas/errors'
import { ApiError, errors } from './errors'

/** body-parser marks its errors with a `type`. */
function bodyParserError(err: unknown): ApiError | null {
  const type = (err as { type?: unknown } | null)?.type
  if (type === 'entity.too.large') return errors.payloadTooLarge(JSON_BODY_LIMIT_BYTES)
  if (type === 'entity.parse.failed') return errors.malformedJson()
  return null
}

/** The one error handler: known errors keep their code; anything else is a 500 that leaks nothing. */
export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  const known = err instanceof ApiError ? err : bodyParserError(err)
  const apiError = known ?? errors.internal()
  if (!known) req.log?.error({ err }, 'unhandled error')
  res.status(apiError.status).json(apiError.toBody())
}

export const apiNotFound: RequestHandler = (req, _res, next) => {
  next(errors.notFound(`API route: ${req.method} ${req.originalUrl.split('?')[0]}`))
}
