import { Router, type RequestHandler } from 'express'
import type { z } from 'zod'
import { authorize, type Access } from '../auth/access'
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
export function secureRouter(authenticate: RequestHandler) {
  const router = Router()
  const add = (method: Method) => (path: string, options: RouteOptions, handler: RequestHandler) => {
    const chain: RequestHandler[] = [...(options.before ?? [])]
    if (options.access.kind !== 'public') chain.push(authenticate, authorize(options.access))
    if (options.body) chain.push(validateBody(options.body))
    router[method](path, ...chain, handler)
  }
  return { router, get: add('get'), post: add('post'), patch: add('patch'), delete: add('delete') }
}
export type SecureRouter = ReturnType<typeof secureRouter>
