/**
 * The keys of a walkthrough being played: Space and → next, ← previous,
 * Home first, Esc leave, and in Present mode `b` blanks the screen. Pure:
 * the player component binds it to the window.
 */
export type WalkthroughKeyAction = 'next' | 'previous' | 'first' | 'leave' | 'blank'

export function walkthroughKeyAction(e: { key: string; ctrlKey?: boolean; metaKey?: boolean; altKey?: boolean }, presenting: boolean): WalkthroughKeyAction | null {
  if (e.ctrlKey || e.metaKey || e.altKey) return null
  switch (e.key) {
    case ' ':
    case 'ArrowRight':
      return 'next'
    case 'ArrowLeft':
      return 'previous'
    case 'Home':
      return 'first'
    case 'Escape':
      return 'leave'
    case 'b':
    case 'B':
      return presenting ? 'blank' : null
    default:
      return null
  }
}
