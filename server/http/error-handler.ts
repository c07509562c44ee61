import type { ErrorRequestHandler, RequestHandler } from 'express'
import { JSON_BODY_LIMIT_BYTES } from '../../shared/schemas/errors'
import { ApiError, errors } from './errors'

/**
 * body-parser marks its errors with a `type`; the router marks a path it
 * cannot percent-decode with a URIError of status 400. Each becomes a 4xx
 * naming the header or the path part at fault.
 */
function requestError(err: unknown): ApiError | null {
  const e = err as { type?: unknown; charset?: unknown; encoding?: unknown; status?: unknown; message?: unknown } | null
  const type = e?.type
  if (type === 'entity.too.large') return errors.payloadTooLarge(JSON_BODY_LIMIT_BYTES)
  if (type === 'entity.parse.failed') return errors.malformedJson()
  if (type === 'charset.unsupported') {
    return errors.unsupportedMediaType('Content-Type', `charset "${String(e?.charset)}" is not supported: JSON is sent as utf-8 (RFC 8259, section 8.1)`)
  }
  if (type === 'encoding.unsupported') {
    return errors.unsupportedMediaType('Content-Encoding', `content coding "${String(e?.encoding)}" is not supported: send the body as is, gzip, deflate or br`)
  }
  if (type === 'request.aborted' || type === 'request.size.invalid') return errors.validation({ body: 'The request body ended before its announced length' })
  if (err instanceof URIError && e?.status === 400) {
    const part = /'([^']*)'/.exec(String(e.message))?.[1] ?? ''
    return errors.validation({ path: `"${part}" is not valid percent-encoding (RFC 3986, section 2.1)` }, 'The address holds a malformed percent-encoding')
  }
  return null
}

/** The one error handler: known errors keep their code; anything else is a 500 that leaks nothing. */
export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  const known = err instanceof ApiError ? err : requestError(err)
  const apiError = known ?? errors.internal()
  if (!known) req.log?.error({ err }, 'unhandled error')
  if (apiError.retryAfterSeconds !== undefined) res.setHeader('Retry-After', String(apiError.retryAfterSeconds))
  res.status(apiError.status).json(apiError.toBody())
}

export const apiNotFound: RequestHandler = (req, _res, next) => {
  next(errors.notFound(`API route: ${req.method} ${req.originalUrl.split('?')[0]}`))
}
