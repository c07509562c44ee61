import type { WorkspaceRole } from '@shared/schemas/workspace'

/** What each role may do, in the words the settings page shows. */
export const ROLE_HELP: Record<WorkspaceRole, string> = {
  owner: 'administers the workspace: members, roles, deletion',
  editor: 'saves, shares and deletes scenarios',
  viewer: 'opens and copies scenarios',
}

export const ROLE_OPTIONS: { label: string; value: WorkspaceRole }[] = [
  { label: 'owner', value: 'owner' },
  { label: 'editor', value: 'editor' },
  { label: 'viewer', value: 'viewer' },
]
