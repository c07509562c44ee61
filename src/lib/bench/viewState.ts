/**
 * The Bench view in the URL query: cursor cycle, zoom window and selected
 * instruction, so that a reload or a shared URL shows the same view.
 * Query keys: `cycle`, `from` and `to` (the zoom window's start and end
 * cycles as the Lane chart reports them), `sel` (an InstructionTrace.index).
 * Anything malformed is dropped, never guessed. Other keys of the query (e.g.
 * `scenario`, which the Scenarios page sets) belong to others and are kept.
 *
 * @example
 *   encodeView({ cursor: 40, window: { start: 0, end: 120 }, selected: 3 }) // { cycle: '40', from: '0', to: '120', sel: '3' }
 */

export interface CycleWindow {
  start: number
  end: number
}

export interface BenchView {
  cursor: number | null
  window: CycleWindow | null
  selected: number | null
}

export const EMPTY_VIEW: BenchView = { cursor: null, window: null, selected: null }

/** Largest cycle the URL accepts: the default cycle limit of the timing model (5,000,000). */
export const MAX_URL_CYCLE = 5_000_000

type QueryValue = string | null | undefined | (string | null)[]

function cycleOf(v: QueryValue): number | null {
  const s = Array.isArray(v) ? v[0] : v
  if (typeof s !== 'string' || !/^\d{1,7}$/.test(s)) return null
  const n = Number(s)
  return n <= MAX_URL_CYCLE ? n : null
}

/**
 * The window as whole cycles, the form a view is saved, shared and put in the
 * URL in: the start rounded down and the end up, so the whole cycles the chart
 * showed stay in view. Zooming leaves fractions (6.388…–16.611…); the schema
 * of a saved view takes integers only. A thousandth of a cycle of float noise
 * is not a cycle more.
 */
export function wholeWindow(w: CycleWindow | null): CycleWindow | null {
  if (!w) return null
  const start = Math.max(0, Math.floor(w.start + 1e-3))
  return { start, end: Math.max(start + 1, Math.ceil(w.end - 1e-3)) }
}

/** The cursor as a whole cycle (the chart reports whole cycles; this guards the saved form). */
export function wholeCycle(c: number | null): number | null {
  return c === null ? null : Math.max(0, Math.round(c))
}

/** Reads the view from a route query; bad or missing values become null. */
export function decodeView(query: Record<string, QueryValue>): BenchView {
  const from = cycleOf(query.from)
  const to = cycleOf(query.to)
  return {
    cursor: cycleOf(query.cycle),
    window: from !== null && to !== null && from < to ? { start: from, end: to } : null,
    selected: cycleOf(query.sel),
  }
}

/** The view as query entries; null parts are left out. */
export function encodeView(view: BenchView): Record<string, string> {
  const q: Record<string, string> = {}
  if (view.cursor !== null) q.cycle = String(Math.round(view.cursor))
  if (view.window) {
    q.from = String(Math.round(view.window.start))
    q.to = String(Math.round(view.window.end))
  }
  if (view.selected !== null) q.sel = String(view.selected)
  return q
}

/** The query keys the view owns. */
export const VIEW_KEYS = ['cycle', 'from', 'to', 'sel'] as const

/** `query` with the view's keys replaced by `view`'s entries, every other key kept as it is. */
export function withView(query: Record<string, QueryValue>, view: BenchView): Record<string, QueryValue> {
  const out: Record<string, QueryValue> = {}
  for (const [key, value] of Object.entries(query)) if (!(VIEW_KEYS as readonly string[]).includes(key)) out[key] = value
  return { ...out, ...encodeView(view) }
}

/** True when two views would write the same query. */
export function sameView(a: BenchView, b: BenchView): boolean {
  const qa = encodeView(a)
  const qb = encodeView(b)
  return qa.cycle === qb.cycle && qa.from === qb.from && qa.to === qb.to && qa.sel === qb.sel
}
