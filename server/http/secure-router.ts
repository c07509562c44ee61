import { Router, type RequestHandler } from 'express'
import type { z } from 'zod'
import { authorize, type Access } from '../auth/access'
import { errors } from './errors'
import { validateBody } from './validate'

export interface RouteOptions {
  access: Access
  /** Shared schema the JSON body must satisfy. */
  body?: z.ZodType
  /** Extra middleware before validation, e.g. a rate limiter. */
  before?: RequestHandler[]
}

type Method = 'get' | 'post' | 'patch' | 'delete'

/**
 * An Express router whose routes cannot be declared without an access rule:
 * authenticate (unless public) -> authorize -> validate the body -> handler.
 */
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i

/**
 * Path parameters that are ids, and what a malformed one is "not found" as:
 * it names no row, and handing it to PostgreSQL's uuid type was a 500.
 * (`:id`, the workspace, is checked by the workspace access rule.)
 */
const ID_PARAMS: Record<string, string> = { scenarioId: 'scenario', userId: 'member', linkId: 'share link' }

export function secureRouter(authenticate: RequestHandler) {
  const router = Router()
  for (const [name, what] of Object.entries(ID_PARAMS)) {
    router.param(name, (_req, _res, next, value: unknown) => next(typeof value === 'string' && UUID.test(value) ? undefined : errors.notFound(what)))
  }
  const add = (method: Method) => (path: string, options: RouteOptions, handler: RequestHandler) => {
    const chain: RequestHandler[] = [...(options.before ?? [])]
    if (options.access.kind !== 'public') chain.push(authenticate, authorize(options.access))
    if (options.body) chain.push(validateBody(options.body))
    router[method](path, ...chain, handler)
  }
  return { router, get: add('get'), post: add('post'), patch: add('patch'), delete: add('delete') }
}
export type SecureRouter = ReturnType<typeof secureRouter>
