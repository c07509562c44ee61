/**
 * A suite run's link to the Bench: the scenario, the version that ran, and
 * the preset the run used instead of the scenario's own machine, so the
 * Bench shows exactly the run the suite judged. `/bench?scenario=ID&version=N&preset=P`.
 */
import type { LocationQueryRaw, LocationQuery } from 'vue-router'
import { parseMachine } from '@shared/schemas/machine'
import type { ScenarioContent } from '@shared/schemas/scenario'
import { findPreset } from '@shared/sim/presets'

/** The query of a run's scenario on the Bench; with a deciding point, the cursor on its cycle and its instruction selected. */
export function benchQuery(scenarioId: string, version: number | null, presetId: string | null, at?: { cycle: number; instruction: number | null } | null): LocationQueryRaw {
  return {
    scenario: scenarioId,
    ...(version === null ? {} : { version: String(version) }),
    ...(presetId ? { preset: presetId } : {}),
    ...(at ? { cycle: String(at.cycle), ...(at.instruction === null ? {} : { sel: String(at.instruction) }) } : {}),
  }
}

/** The version a link asks for, when it is not the newest (null: the newest). */
export function linkedVersion(query: LocationQuery, newest: number): number | null {
  const n = Number(query.version)
  return Number.isInteger(n) && n >= 1 && n !== newest ? n : null
}

/** The content with the linked preset's machine, when the link names a known preset. */
export function withLinkedPreset(content: ScenarioContent, query: LocationQuery): ScenarioContent {
  const preset = typeof query.preset === 'string' ? findPreset(query.preset) : undefined
  return preset ? { ...content, machine: parseMachine(preset.machine) } : content
}
