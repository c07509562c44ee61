/**
 * Text the database cannot keep is refused at the door, naming the field.
 * PostgreSQL cannot store the character U+0000 in text (its documentation,
 * "Character Types"), and a lone UTF-16 surrogate is not a Unicode scalar
 * value, so it has no UTF-8 form. Without this check the first reached the
 * database and failed as a 500 (or, in short columns, was stored as the two
 * characters `\0`), and the second was silently replaced.
 */
import type { RequestHandler } from 'express'
import { errors } from './errors'

const NUL_MESSAGE = 'NUL (U+0000) is not allowed in text'
const SURROGATE_MESSAGE = 'This text holds a lone UTF-16 surrogate (U+D800..U+DFFF), which is not valid Unicode'

/** A high surrogate not followed by a low one, or a low one not preceded by a high one (String#isWellFormed, spelt out for ES2022). */
const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/

function problemOf(s: string): string | null {
  if (s.includes('\u0000')) return NUL_MESSAGE
  if (LONE_SURROGATE.test(s)) return SURROGATE_MESSAGE
  return null
}

/**
 * The fields (dotted paths, as in validation errors) whose text, or key, is
 * NUL-bearing or not well-formed; empty when all is well. Depth is bounded by
 * the JSON parser's own input, so plain recursion is fine.
 */
export function badTextFields(value: unknown, path: string[] = [], out: Record<string, string> = {}): Record<string, string> {
  if (typeof value === 'string') {
    const problem = problemOf(value)
    if (problem) out[path.length ? path.join('.') : 'body'] ??= problem
  } else if (Array.isArray(value)) {
    value.forEach((v, i) => badTextFields(v, [...path, String(i)], out))
  } else if (value !== null && typeof value === 'object') {
    for (const [k, v] of Object.entries(value as Record<string, unknown>)) {
      const keyProblem = problemOf(k)
      if (keyProblem) out[[...path, k].join('.')] ??= `A field name: ${keyProblem}`
      else badTextFields(v, [...path, k], out)
    }
  }
  return out
}

/** Throws a 400 naming each bad field of a parsed value. */
export function assertGoodText(value: unknown): void {
  const fields = badTextFields(value)
  if (Object.keys(fields).length) throw errors.validation(fields, 'Some text holds characters that cannot be stored')
}

/** Checks the JSON body and the query string of every API request. */
export const refuseBadText: RequestHandler = (req, _res, next) => {
  assertGoodText(req.query)
  if (req.body !== undefined) assertGoodText(req.body)
  next()
}
