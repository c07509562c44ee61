/**
 * Where "Make my copy" puts a shared scenario: a workspace of the reader's
 * own. Sign-up gives everyone one they own, so an owned workspace comes
 * first (the current one when it is owned); a reader who owns none copies
 * into one they may edit; a reader who may only view everywhere has none.
 */
import type { WorkspaceSummary } from '@shared/schemas/workspace'

export function copyTarget(workspaces: readonly WorkspaceSummary[], currentId: string | null): WorkspaceSummary | null {
  const rank = (w: WorkspaceSummary) => (w.role === 'owner' ? 0 : w.role === 'editor' ? 1 : 2)
  const writable = workspaces.filter((w) => rank(w) < 2)
  if (writable.length === 0) return null
  const best = Math.min(...writable.map(rank))
  const candidates = writable.filter((w) => rank(w) === best)
  return candidates.find((w) => w.id === currentId) ?? candidates[0] ?? null
}
