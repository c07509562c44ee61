/**
 * The Bench's keyboard shortcuts: one table for the help overlay and for the
 * key handler, so that what the overlay shows is what the keys do.
 *
 * @example
 *   shortcutFor({ key: 'ArrowRight', shiftKey: true }) // 'next-event'
 */

export type ShortcutAction = 'play' | 'step-forward' | 'step-back' | 'next-event' | 'previous-event' | 'first-cycle' | 'last-cycle' | 'go-to-cycle' | 'run' | 'help' | 'deselect'

export interface Shortcut {
  action: ShortcutAction
  keys: string[]
  label: string
  /** The KeyboardEvent.key it answers to, and whether Shift must be held. */
  key: string
  shift?: boolean
}

export const SHORTCUTS: readonly Shortcut[] = [
  { action: 'play', keys: ['Space'], key: ' ', label: 'Play or pause the cursor' },
  { action: 'step-forward', keys: ['→'], key: 'ArrowRight', label: 'Forward one cycle' },
  { action: 'step-back', keys: ['←'], key: 'ArrowLeft', label: 'Back one cycle' },
  { action: 'next-event', keys: ['Shift', '→'], key: 'ArrowRight', shift: true, label: 'Next event (a phase starts or ends, a stall starts)' },
  { action: 'previous-event', keys: ['Shift', '←'], key: 'ArrowLeft', shift: true, label: 'Previous event' },
  { action: 'first-cycle', keys: ['Home'], key: 'Home', label: 'First cycle' },
  { action: 'last-cycle', keys: ['End'], key: 'End', label: 'Last cycle' },
  { action: 'go-to-cycle', keys: ['g'], key: 'g', label: 'Go to cycle… (focuses the cycle field)' },
  { action: 'run', keys: ['r'], key: 'r', label: 'Run now' },
  { action: 'deselect', keys: ['Esc'], key: 'Escape', label: 'Clear the selected instruction' },
  { action: 'help', keys: ['?'], key: '?', label: 'Show this help' },
]

export interface KeyLike {
  key: string
  shiftKey?: boolean
  ctrlKey?: boolean
  metaKey?: boolean
  altKey?: boolean
}

/** The action of a key press, or null (modifier combinations other than Shift are left to the browser). */
export function shortcutFor(e: KeyLike): ShortcutAction | null {
  if (e.ctrlKey || e.metaKey || e.altKey) return null
  // '?' needs Shift on most layouts: match it by the character alone.
  const hit = SHORTCUTS.find((s) => s.key === e.key && (s.key === '?' || Boolean(s.shift) === Boolean(e.shiftKey)))
  return hit?.action ?? null
}

/** True when a key press belongs to a text field or the editor, not to the Bench. */
export function isTypingTarget(el: { tagName?: string; isContentEditable?: boolean; closest?: (s: string) => unknown } | null): boolean {
  if (!el) return false
  if (el.isContentEditable) return true
  const tag = (el.tagName ?? '').toLowerCase()
  if (tag === 'input' || tag === 'textarea' || tag === 'select') return true
  return Boolean(el.closest?.('.cm-editor, [role="listbox"], [role="slider"]'))
}
