import type { RequestHandler, Router } from 'express'
import { createAuthenticator } from '../../auth/passport'
import { access } from '../../auth/access'
import type { AppContext } from '../../context'
import { secureRouter } from '../../http/secure-router'
import { optionalUser } from '../../services/share-links'

/** Authenticates when an Authorization header is present; otherwise goes on as an anonymous reader. */
function optionalAuth(ctx: AppContext): RequestHandler {
  const authenticate = createAuthenticator(ctx.config.jwtSecret)
  return (req, res, next) => (req.headers.authorization ? authenticate(req, res, next) : next())
}

/**
 * The public reader's endpoint of share links: no sign-in for `anyone` links.
 * Its own router, which app.ts mounts before the body parsers and the other
 * routes: a crowd opening one link should cost little more per open than the
 * cache look-up (README, "Share-link load").
 */
export function shareOpenRouter(ctx: AppContext): Router {
  const r = secureRouter(createAuthenticator(ctx.config.jwtSecret))
  r.get('/shares/:token', { access: access.public, before: [optionalAuth(ctx)] }, async (req, res) => {
    const link = await ctx.shares.open(String(req.params.token), optionalUser(req))
    // A browser may keep the answer but must ask again before each use (a reload
    // answers 304 by the ETag), so a revoke or an expiry shows on the next open.
    // `private`: no shared cache keeps it. The answer names no token.
    res.setHeader('Cache-Control', 'private, no-cache')
    res.setHeader('ETag', link.etag)
    res.setHeader('Content-Type', 'application/json; charset=utf-8')
    // res.send answers 304 when the request's If-None-Match holds the ETag.
    res.send(link.body)
  })
  return r.router
}
