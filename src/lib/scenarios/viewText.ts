/**
 * A view (cursor cycle, zoom window, selected instruction) in words, for the
 * share dialog and the share page.
 *
 * @example
 *   viewText({ cursor: 42, window: { start: 0, end: 120 }, selected: 3 }) // 'cycle 42, cycles 0–120, instruction #3'
 */
import type { ScenarioView } from '@shared/schemas/scenario'

export function viewText(view: ScenarioView): string {
  const parts: string[] = []
  if (view.cursor !== null) parts.push(`cycle ${view.cursor}`)
  if (view.window) parts.push(`cycles ${view.window.start}–${view.window.end}`)
  if (view.selected !== null) parts.push(`instruction #${view.selected}`)
  return parts.length > 0 ? parts.join(', ') : 'the whole run'
}
