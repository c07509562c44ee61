import type { Request } from 'express'
import type { z } from 'zod'
import { errors } from '../../http/errors'
import { issuesToFields } from '../../http/validate'

/** Validates the query string against a shared schema; errors name the parameter. */
export function parseQuery<S extends z.ZodType>(schema: S, req: Request): z.output<S> {
  const r = schema.safeParse(req.query)
  if (!r.success) throw errors.validation(issuesToFields(r.error.issues), 'Some query parameters are not valid')
  return r.data
}
