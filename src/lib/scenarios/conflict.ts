/**
 * Reading a lost save race: the server answers 409 `version_conflict` with the
 * newest version (theirs) and the content that was sent (mine); see
 * saveConflictBodySchema. Either way out keeps both: "keep mine" saves mine as
 * a new version on top of theirs, "reload theirs" loads theirs and sets mine
 * aside so it can still be saved as a scenario of its own.
 */
import { saveConflictBodySchema, type SaveConflictBody } from '@shared/schemas/scenario'
import { ApiError } from '@/api'

export type SaveConflict = SaveConflictBody['conflict']

/** The conflict carried by a failed save, or null when the failure was something else. */
export function conflictOf(err: unknown): SaveConflict | null {
  if (!(err instanceof ApiError) || err.status !== 409) return null
  const parsed = saveConflictBodySchema.safeParse(err.body)
  return parsed.success ? parsed.data.conflict : null
}
