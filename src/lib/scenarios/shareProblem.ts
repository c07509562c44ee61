/**
 * What the share page says when a link does not open: unknown (404), expired
 * or revoked (410), or for workspace members only while signed out (401).
 * Never an error trace.
 */
import { ApiError } from '@/api'

export interface ShareProblem {
  status: '404' | '403' | 'warning' | 'error' | 'info'
  title: string
  description: string
  /** Signing in may open it. */
  signIn: boolean
}

export function shareProblem(err: unknown): ShareProblem {
  if (err instanceof ApiError) {
    switch (err.code) {
      case 'share_expired':
        return { status: 'warning', title: 'This share link has expired', description: `${err.message}.`, signIn: false }
      case 'share_revoked':
        return { status: 'warning', title: 'This share link was revoked', description: 'Its sender turned it off. Ask them for a new link.', signIn: false }
      case 'unauthenticated':
        return { status: '403', title: 'Sign in to open this link', description: 'This link is for members of its workspace only.', signIn: true }
      case 'not_found':
        return { status: '404', title: 'No such share link', description: 'The link is unknown, or you are not a member of the workspace it belongs to. Check that it was copied whole.', signIn: false }
      case 'network':
        return { status: 'error', title: 'Chimeline cannot be reached', description: err.message, signIn: false }
      default:
        return { status: 'error', title: 'The link could not be opened', description: err.message, signIn: false }
    }
  }
  return { status: 'error', title: 'The link could not be opened', description: 'Something went wrong in the page. Reload it and try again.', signIn: false }
}
