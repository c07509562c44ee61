import { z } from 'zod'
import { textFieldError } from './text'
import { emailSchema, userNameSchema, userSchema } from './user'

export const PASSWORD_MIN_LENGTH = 10
/** argon2 accepts long inputs, but an unbounded one is a cheap way to burn CPU. */
export const PASSWORD_MAX_LENGTH = 128

export const passwordSchema = z
  .string({ error: textFieldError('A password') })
  .min(PASSWORD_MIN_LENGTH, `A password has at least ${PASSWORD_MIN_LENGTH} characters`)
  .max(PASSWORD_MAX_LENGTH, `A password has at most ${PASSWORD_MAX_LENGTH} characters`)

/**
 * The rule a schema cannot see on its own: the password may not be the e-mail
 * address (or its local part). Returns the message, or null when it is fine.
 * Shared so that the sign-up form, the reset form and the server agree.
 */
export function passwordEmailProblem(password: string, email: string): string | null {
  const p = password.trim().toLowerCase()
  const e = email.trim().toLowerCase()
  const local = e.split('@')[0] ?? ''
  if (p === e || (local.length > 0 && p === local)) return 'The password must not be your e-mail address'
  return null
}

export const signUpBodySchema = z
  .object({ email: emailSchema, name: userNameSchema, password: passwordSchema })
  .superRefine((body, ctx) => {
    const problem = passwordEmailProblem(body.password, body.email)
    if (problem) ctx.addIssue({ code: 'custom', path: ['password'], message: problem })
  })
export type SignUpBody = z.infer<typeof signUpBodySchema>

/** Sign-in checks only presence and bounds: the rules are for new passwords. */
export const signInBodySchema = z.object({
  email: emailSchema,
  password: z
    .string({ error: textFieldError('A password') })
    .min(1, 'A password is required')
    .max(PASSWORD_MAX_LENGTH, `A password has at most ${PASSWORD_MAX_LENGTH} characters`),
})
export type SignInBody = z.infer<typeof signInBodySchema>

export const forgotBodySchema = z.object({ email: emailSchema })
export type ForgotBody = z.infer<typeof forgotBodySchema>

/** One-time tokens (reset, invitation) are base64url strings of 32 random bytes. */
export const oneTimeTokenSchema = z
  .string({ error: textFieldError('A token') })
  .min(1, 'A token is required')
  .max(200, 'The token is too long')

export const resetBodySchema = z.object({ token: oneTimeTokenSchema, password: passwordSchema })
export type ResetBody = z.infer<typeof resetBodySchema>

/** Answer of signup, signin, refresh and reset. */
export const authResponseSchema = z.object({ user: userSchema, accessToken: z.string().min(1) })
export type AuthResponse = z.infer<typeof authResponseSchema>

/**
 * Answer of refresh when the request carries no refresh cookie at all: nobody
 * is signed in, which is no error (every signed-out page load asks). A cookie
 * that is present but unknown, expired or reused is still a 401.
 */
export const noSessionResponseSchema = z.object({ user: z.null() })
export type NoSessionResponse = z.infer<typeof noSessionResponseSchema>

/** Answer of POST /api/auth/refresh: a new session, or none. */
export const refreshResponseSchema = z.union([authResponseSchema, noSessionResponseSchema])
export type RefreshResponse = z.infer<typeof refreshResponseSchema>

/** The refresh cookie (httpOnly, SameSite=Strict, path /api/auth). */
export const REFRESH_COOKIE_NAME = 'chimeline_refresh'
export const ACCESS_TOKEN_TTL_SECONDS = 15 * 60
export const REFRESH_TOKEN_TTL_SECONDS = 7 * 24 * 60 * 60
