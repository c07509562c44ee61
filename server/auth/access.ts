import type { Request, RequestHandler } from 'express'
import type { SiteRole } from '../../shared/schemas/user'
import type { WorkspaceRole } from '../../shared/schemas/workspace'
import { Membership, Workspace, type User } from '../models'
import { errors } from '../http/errors'

/**
 * Who may call a route. Every route declares one (see secure-router.ts), so
 * there is no route without an authorization decision.
 * - public: anyone;
 * - signedIn: any signed-in user;
 * - site: a signed-in user whose site role is listed;
 * - workspace: a member of the workspace `:id` whose role is listed, or, with
 *   `orSelf`, the user named by that route parameter (leaving a workspace).
 * A non-member gets 404, not 403, so workspace ids cannot be probed. A
 * soft-deleted workspace is not found either, except by rules with
 * `allowDeleted` (its undo).
 */
export type Access =
  | { kind: 'public' }
  | { kind: 'signedIn' }
  | { kind: 'site'; roles: readonly SiteRole[] }
  | { kind: 'workspace'; roles: readonly WorkspaceRole[]; orSelf?: string; allowDeleted?: boolean }

export const access = {
  public: { kind: 'public' } as Access,
  signedIn: { kind: 'signedIn' } as Access,
  site: (...roles: SiteRole[]): Access => ({ kind: 'site', roles }),
  workspace: (roles: readonly WorkspaceRole[], options: { orSelf?: string; allowDeleted?: boolean } = {}): Access => ({ kind: 'workspace', roles, ...options }),
}

export const ALL_WORKSPACE_ROLES: readonly WorkspaceRole[] = ['owner', 'editor', 'viewer']

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i

/** The signed-in user; only valid behind an access rule other than public. */
export function currentUser(req: Request): User {
  if (!req.user) throw errors.unauthenticated()
  return req.user as User
}

/** The caller's membership of the route's workspace, loaded by the workspace rule. */
export function currentMembership(req: Request): Membership {
  const membership = (req as Request & { membership?: Membership }).membership
  if (!membership) throw new Error('currentMembership used on a route without a workspace access rule')
  return membership
}

/** The middleware that enforces a rule; runs after authentication. */
export function authorize(rule: Access): RequestHandler {
  return async (req, _res, next) => {
    if (rule.kind === 'public' || rule.kind === 'signedIn') return next()
    const user = currentUser(req)
    if (rule.kind === 'site') {
      if (!rule.roles.includes(user.role)) throw errors.forbidden('Only a site administrator may do this')
      return next()
    }
    const workspaceId = req.params.id
    if (typeof workspaceId !== 'string' || !UUID.test(workspaceId)) throw errors.notFound('workspace')
    const membership = await Membership.findOne({
      where: { workspaceId, userId: user.id },
      include: [{ model: Workspace, as: 'workspace', required: true, paranoid: !rule.allowDeleted }],
    })
    if (!membership) throw errors.notFound('workspace')
    ;(req as Request & { membership?: Membership }).membership = membership
    const self = rule.orSelf !== undefined && req.params[rule.orSelf] === user.id
    if (!self && !rule.roles.includes(membership.role)) {
      throw errors.forbidden(`A workspace ${membership.role} may not do this`)
    }
    next()
  }
}
