import type { WorkspaceRole } from '@shared/schemas/workspace'

/** What each role may do, in the words the settings page shows. */
export const ROLE_HELP: Record<WorkspaceRole, string> = {
  owner: 'administers the workspace (members, roles) and deletes or restores scenarios',
  editor: 'saves, duplicates, imports and shares scenarios',
  viewer: 'opens and copies scenarios',
}

export const ROLE_OPTIONS: { label: string; value: WorkspaceRole }[] = [
  { label: 'owner', value: 'owner' },
  { label: 'editor', value: 'editor' },
  { label: 'viewer', value: 'viewer' },
]
