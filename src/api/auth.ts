import { authResponseSchema, refreshResponseSchema, type ForgotBody, type ResetBody, type SignInBody, type SignUpBody } from '@shared/schemas/auth'
import type { Http } from './http'

/** /api/auth: these calls carry the refresh cookie, never the access token, and never retry. */
export function createAuthApi(http: Http) {
  return {
    signIn: (body: SignInBody) =>
      http.request('/api/auth/signin', { method: 'POST', body, schema: authResponseSchema, auth: false }),
    signUp: (body: SignUpBody) =>
      http.request('/api/auth/signup', { method: 'POST', body, schema: authResponseSchema, auth: false }),
    /** A new session from the refresh cookie, or `{ user: null }` when the browser has no cookie. */
    refresh: () => http.request('/api/auth/refresh', { method: 'POST', schema: refreshResponseSchema, auth: false }),
    signOut: () => http.request('/api/auth/signout', { method: 'POST', auth: false }),
    forgot: (body: ForgotBody) => http.request('/api/auth/forgot', { method: 'POST', body, auth: false }),
    reset: (body: ResetBody) =>
      http.request('/api/auth/reset', { method: 'POST', body, schema: authResponseSchema, auth: false }),
  }
}
