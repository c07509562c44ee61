/**
 * Walkthrough steps and the Bench view: a step recorded from what the Bench
 * shows, the view a step puts back, edits of the step list, and the short
 * cursor glide between two steps. Pure (no Vue, no DOM).
 *
 * @example
 *   const step = stepFromView(bench.view, { note: 'Lane 7 waits.', lane: 7 })
 *   viewOfStep(step, bench.view) // the view to show: cursor, window, selection, switches
 */
import type { WalkthroughStep } from '@shared/schemas/walkthrough'
import type { BenchView } from '@/lib/bench/viewState'

export interface StepFields {
  note: string
  /** The lane to highlight (the Bench has no lane selection of its own). */
  lane: number | null
  question?: WalkthroughStep['question']
}

/** A step at the Bench's view: its cursor (0 when none), window, selected instruction and register, switches. */
export function stepFromView(view: BenchView, fields: StepFields): WalkthroughStep {
  return {
    cursor: view.cursor ?? 0,
    window: view.window ? { start: view.window.start, end: view.window.end } : null,
    highlight: { instruction: view.selected, lane: fields.lane, register: view.register },
    subRows: view.subRows,
    dependencies: view.dependencies,
    note: fields.note,
    ...(fields.question ? { question: fields.question } : {}),
    checks: [],
  }
}

/**
 * The view a step shows. What the step leaves open (switches it does not
 * set, no register) stays as the viewer had it; no instruction clears the
 * selection, since a highlight left over from another step would mislead.
 */
export function viewOfStep(step: WalkthroughStep, current: BenchView): BenchView {
  return {
    cursor: step.cursor,
    window: step.window,
    selected: step.highlight.instruction ?? null,
    subRows: step.subRows ?? current.subRows,
    dependencies: step.dependencies ?? current.dependencies,
    register: step.highlight.register ?? current.register,
  }
}

/** The list with the step at `from` moved to `to` (both clamped to the list). */
export function moveStep<T>(steps: readonly T[], from: number, to: number): T[] {
  const out = [...steps]
  if (from < 0 || from >= out.length) return out
  const [item] = out.splice(from, 1)
  out.splice(Math.max(0, Math.min(out.length, to)), 0, item as T)
  return out
}

export function replaceStep<T>(steps: readonly T[], index: number, step: T): T[] {
  return steps.map((s, i) => (i === index ? step : s))
}

export function removeStep<T>(steps: readonly T[], index: number): T[] {
  return steps.filter((_, i) => i !== index)
}

/** Milliseconds the cursor takes to glide to a step: short enough not to hold a lecture up. */
export const GLIDE_MS = 450

/**
 * The cursor's cycle `t` of the way (0..1) from `from` to `to`, eased in and
 * out, in whole cycles (the Bench's cursor is a whole cycle).
 */
export function glideCycle(from: number, to: number, t: number): number {
  const u = Math.max(0, Math.min(1, t))
  const eased = u < 0.5 ? 2 * u * u : 1 - 2 * (1 - u) * (1 - u)
  return Math.round(from + (to - from) * eased)
}
