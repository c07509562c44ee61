import type { RequestHandler, Response } from 'express'
import { rateLimit } from 'express-rate-limit'
import {
  REFRESH_COOKIE_NAME,
  REFRESH_TOKEN_TTL_SECONDS,
  forgotBodySchema,
  resetBodySchema,
  signInBodySchema,
  signUpBodySchema,
  type ForgotBody,
  type NoSessionResponse,
  type ResetBody,
  type SignInBody,
  type SignUpBody,
} from '../../../shared/schemas/auth'
import { access } from '../../auth/access'
import type { AppContext } from '../../context'
import { errors } from '../../http/errors'
import type { SecureRouter } from '../../http/secure-router'
import * as auth from '../../services/auth'

/** One counter per route and client address; a lock-out answers 429 in the API's error shape. */
function limiter(ctx: AppContext): RequestHandler {
  const { max, windowMs } = ctx.config.authRateLimit
  return rateLimit({
    windowMs,
    limit: max,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, _res, next) => next(errors.rateLimited(windowMs / 1000)),
  })
}

function cookieOptions(ctx: AppContext) {
  return { httpOnly: true, sameSite: 'strict', secure: ctx.config.secureCookies, path: '/api/auth' } as const
}

function sendSession(ctx: AppContext, res: Response, session: auth.Session, status = 200): void {
  res.cookie(REFRESH_COOKIE_NAME, session.refreshToken, { ...cookieOptions(ctx), maxAge: REFRESH_TOKEN_TTL_SECONDS * 1000 })
  res.status(status).json({ user: session.user, accessToken: session.accessToken })
}

const refreshCookie = (cookies: unknown): string | undefined => {
  const value = (cookies as Record<string, unknown> | undefined)?.[REFRESH_COOKIE_NAME]
  return typeof value === 'string' ? value : undefined
}

export function authRoutes(ctx: AppContext, r: SecureRouter): void {
  r.post('/auth/signup', { access: access.public, before: [limiter(ctx)], body: signUpBodySchema }, async (req, res) => {
    sendSession(ctx, res, await auth.signUp(ctx, req.body as SignUpBody), 201)
  })

  r.post('/auth/signin', { access: access.public, before: [limiter(ctx)], body: signInBodySchema }, async (req, res) => {
    sendSession(ctx, res, await auth.signIn(ctx, req.body as SignInBody))
  })

  r.post('/auth/refresh', { access: access.public }, async (req, res) => {
    const token = refreshCookie(req.cookies)
    // No cookie at all: simply signed out (200, so browsers log no error on every signed-out load).
    if (token === undefined) {
      res.json({ user: null } satisfies NoSessionResponse)
      return
    }
    sendSession(ctx, res, await auth.refresh(ctx, token))
  })

  r.post('/auth/signout', { access: access.public }, async (req, res) => {
    await auth.signOut(refreshCookie(req.cookies))
    res.clearCookie(REFRESH_COOKIE_NAME, cookieOptions(ctx))
    res.status(204).end()
  })

  r.post('/auth/forgot', { access: access.public, before: [limiter(ctx)], body: forgotBodySchema }, (req, res) => {
    auth.requestPasswordReset(ctx, (req.body as ForgotBody).email)
    res.status(202).json({ message: 'If an account exists for this address, a reset link is on its way' })
  })

  r.post('/auth/reset', { access: access.public, before: [limiter(ctx)], body: resetBodySchema }, async (req, res) => {
    sendSession(ctx, res, await auth.resetPassword(ctx, req.body as ResetBody))
  })
}
