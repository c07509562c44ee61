import type { RequestHandler } from 'express'
import type { z } from 'zod'
import { errors } from './errors'

/** zod issues as `{ "field.path": "message" }`; the first message per field wins. */
export function issuesToFields(issues: z.core.$ZodIssue[]): Record<string, string> {
  const fields: Record<string, string> = {}
  for (const issue of issues) {
    const key = issue.path.length ? issue.path.map(String).join('.') : 'body'
    fields[key] ??= issue.message
  }
  return fields
}

/**
 * Validates the JSON body against a shared schema and replaces it with the
 * parsed (trimmed, normalised) value. A missing body counts as `{}`, so each
 * missing field is named.
 */
export function validateBody(schema: z.ZodType): RequestHandler {
  return (req, _res, next) => {
    const result = schema.safeParse(req.body ?? {})
    if (!result.success) throw errors.validation(issuesToFields(result.error.issues))
    req.body = result.data
    next()
  }
}
