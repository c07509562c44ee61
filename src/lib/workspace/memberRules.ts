/**
 * What the signed-in user may do to one member of a workspace, mirroring the
 * server's rules (server/routes/workspaces: owners change roles and remove
 * members, anyone may leave, a workspace always keeps an owner), so that the
 * settings page offers only actions that can succeed.
 *
 * @example
 *   memberActions({ myId: 'a', myRole: 'owner', ownerCount: 1 }, { userId: 'b', role: 'editor' })
 *   // { changeRole: true, remove: true, leave: false, makeOwner: true }
 */
import type { WorkspaceRole } from '@shared/schemas/workspace'

export interface Viewer {
  myId: string
  myRole: WorkspaceRole
  /** Owners of the workspace, the viewer included. */
  ownerCount: number
}

export interface MemberActions {
  changeRole: boolean
  remove: boolean
  /** Only on one's own row. */
  leave: boolean
  /** Hand ownership to this member (the viewer becomes an editor). */
  makeOwner: boolean
}

export function memberActions(viewer: Viewer, member: { userId: string; role: WorkspaceRole }): MemberActions {
  const self = member.userId === viewer.myId
  const owner = viewer.myRole === 'owner'
  // The last owner can neither step down nor leave: the server answers 409.
  const lastOwner = member.role === 'owner' && viewer.ownerCount <= 1
  return {
    changeRole: owner && !lastOwner,
    remove: owner && !self && !lastOwner,
    leave: self && !lastOwner,
    makeOwner: owner && !self && member.role !== 'owner',
  }
}

/** Why the viewer cannot leave, or null when they can. */
export function leaveBlocker(viewer: Viewer): string | null {
  if (viewer.myRole === 'owner' && viewer.ownerCount <= 1) {
    return 'You are the only owner. Make someone else owner first, then leave.'
  }
  return null
}
