/**
 * The five Learn lessons, in teaching order. Served to the client as code
 * (no database): every signed-in user reads the same lessons, they change
 * only with the code, and tests/learn checks exactly what ships.
 */
import { bankConflicts } from './bank-conflicts'
import { chaining } from './chaining'
import { lanesAndBeats } from './lanes-and-beats'
import type { Lesson } from './lesson'
import { reduction } from './reduction'
import { unevenLanes } from './uneven-lanes'

export const LESSONS: readonly Lesson[] = [lanesAndBeats, unevenLanes, chaining, bankConflicts, reduction]

export function lessonById(id: string): Lesson | null {
  return LESSONS.find((l) => l.id === id) ?? null
}

export { questionCount, type Lesson } from './lesson'
