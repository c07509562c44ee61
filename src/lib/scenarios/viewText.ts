/**
 * A view (cursor cycle, zoom window, selected instruction, the chart's
 * switches and the register shown) in words, for the share dialog and the
 * share page. A window is [start, end) in cycles: the last cycle it shows is
 * end - 1, so the whole of a 23-cycle run reads "cycles 0–22".
 *
 * @example
 *   viewText({ cursor: 42, window: { start: 0, end: 120 }, selected: 3 }) // 'cycle 42, cycles 0–119, instruction #3'
 */
import type { ScenarioView } from '@shared/schemas/scenario'
import { formatInteger } from '@/utils/format'

export function viewText(view: ScenarioView): string {
  const parts: string[] = []
  if (view.cursor !== null) parts.push(`cycle ${formatInteger(view.cursor)}`)
  if (view.window) parts.push(`cycles ${formatInteger(view.window.start)}–${formatInteger(view.window.end - 1)}`)
  if (view.selected !== null) parts.push(`instruction #${view.selected}`)
  if (view.subRows) parts.push('R/E/W rows')
  if (view.dependencies) parts.push('dependency arrows')
  if (view.register !== null && view.register !== undefined) parts.push(`register v${view.register}`)
  return parts.length > 0 ? parts.join(', ') : 'the whole run'
}
