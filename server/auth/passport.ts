import type { RequestHandler } from 'express'
import { Passport } from 'passport'
import { ExtractJwt, Strategy as JwtStrategy } from 'passport-jwt'
import { User } from '../models'
import { errors } from '../http/errors'
import { sessionIsLive } from './session-cache'
import { JWT_AUDIENCE, JWT_ISSUER } from './tokens'

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i

/** The user of a token whose session is live, or false. */
async function userOf(payload: { sub?: unknown; sid?: unknown }): Promise<User | false> {
  const { sub, sid } = payload
  if (typeof sub !== 'string' || typeof sid !== 'string' || !UUID.test(sid)) return false
  if (!(await sessionIsLive(sid, sub))) return false
  return (await User.findByPk(sub)) ?? false
}

/**
 * Bearer-token authentication through passport-jwt. The token's session is
 * checked (through a small cache) and the user loaded on every request, so a
 * sign-out, a password reset, a deleted user or a changed site role takes
 * effect at once.
 */
export function createAuthenticator(jwtSecret: string): RequestHandler {
  const passport = new Passport()
  passport.use(
    new JwtStrategy(
      {
        jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(),
        secretOrKey: jwtSecret,
        algorithms: ['HS256'],
        issuer: JWT_ISSUER,
        audience: JWT_AUDIENCE,
      },
      (payload: { sub?: unknown; sid?: unknown }, done: (err: unknown, user?: User | false) => void) => {
        userOf(payload).then((user) => done(null, user), done)
      },
    ),
  )
  const authenticate = passport.initialize()
  return (req, res, next) => {
    authenticate(req, res, () => {
      passport.authenticate('jwt', { session: false }, (err: unknown, user: User | false) => {
        if (err) return next(err)
        if (!user) return next(errors.unauthenticated())
        req.user = user
        next()
      })(req, res, next)
    })
  }
}
