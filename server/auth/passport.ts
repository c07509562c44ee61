import type { RequestHandler } from 'express'
import { Passport } from 'passport'
import { ExtractJwt, Strategy as JwtStrategy } from 'passport-jwt'
import { User } from '../models'
import { errors } from '../http/errors'
import { JWT_AUDIENCE, JWT_ISSUER } from './tokens'

/**
 * Bearer-token authentication through passport-jwt. The user is loaded on every
 * request, so a deleted user or a changed site role takes effect at once.
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
      (payload: { sub?: string }, done: (err: unknown, user?: User | false) => void) => {
        if (!payload.sub) return done(null, false)
        User.findByPk(payload.sub).then((user) => done(null, user ?? false), done)
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
