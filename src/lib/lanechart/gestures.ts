/**
 * Which pointer gestures the Lane chart takes for itself. The wheel scrolls
 * the page unless the user asks the chart for it: Ctrl (Cmd on a Mac) held,
 * or the chart clicked first (it has the focus). Dragging pans as before;
 * the default filter of d3-zoom (no secondary button) applies to the rest.
 *
 * @example
 *   chartTakesGesture({ type: 'wheel', ctrlKey: false, metaKey: false, button: 0 }, false) // false: the page scrolls
 */
export interface GestureLike {
  type: string
  ctrlKey: boolean
  metaKey: boolean
  button: number
}

export function chartTakesGesture(e: GestureLike, engaged: boolean): boolean {
  if (e.type === 'wheel') return e.ctrlKey || e.metaKey || engaged
  // d3-zoom's own default: a Ctrl+click is a context click on a Mac, and only the main button drags.
  return !e.ctrlKey && !e.button
}
