import crypto from 'node:crypto'
import jwt from 'jsonwebtoken'
import { ACCESS_TOKEN_TTL_SECONDS } from '../../shared/schemas/auth'

export const JWT_ISSUER = 'chimeline'
export const JWT_AUDIENCE = 'chimeline-api'

/** An access token of one session: `sub` the user, `sid` the session (sessions table), checked per request. */
export function signAccessToken(userId: string, sessionId: string, secret: string): string {
  return jwt.sign({ sid: sessionId }, secret, {
    algorithm: 'HS256',
    subject: userId,
    issuer: JWT_ISSUER,
    audience: JWT_AUDIENCE,
    expiresIn: ACCESS_TOKEN_TTL_SECONDS,
  })
}

/** An opaque one-time token (refresh, reset, invitation): 256 random bits. */
export function randomToken(): string {
  return crypto.randomBytes(32).toString('base64url')
}

/** Only this hash is stored, so a leaked table grants nothing. */
export function hashToken(token: string): string {
  return crypto.createHash('sha256').update(token).digest('hex')
}
