import type { RequestHandler } from 'express'
import { createAuthenticator } from '../../auth/passport'
import { access } from '../../auth/access'
import type { AppContext } from '../../context'
import type { SecureRouter } from '../../http/secure-router'
import { openShare, optionalUser } from '../../services/share-links'

/** Authenticates when an Authorization header is present; otherwise goes on as an anonymous reader. */
function optionalAuth(ctx: AppContext): RequestHandler {
  const authenticate = createAuthenticator(ctx.config.jwtSecret)
  return (req, res, next) => (req.headers.authorization ? authenticate(req, res, next) : next())
}

/** The public reader's endpoint of share links: no sign-in for `anyone` links. */
export function shareRoutes(ctx: AppContext, r: SecureRouter): void {
  r.get('/shares/:token', { access: access.public, before: [optionalAuth(ctx)] }, async (req, res) => {
    // A shared version never changes, but revocation must take effect at once.
    res.setHeader('Cache-Control', 'no-store')
    res.json({ share: await openShare(ctx, String(req.params.token), optionalUser(req)) })
  })
}
