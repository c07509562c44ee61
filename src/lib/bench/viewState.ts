/**
 * The Bench view in the URL query: cursor cycle, zoom window, selected
 * instruction, the chart's R/E/W rows and Dependencies switches and the
 * register the inspector shows, so that a reload or a shared URL shows the
 * same view. Query keys: `cycle`, `from` and `to` (the zoom window's start and
 * end cycles, whole), `sel` (an InstructionTrace.index), `rew=1`, `deps=1`,
 * `reg` (a vector register number, 0..31).
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
  /** The R/E/W rows switch. */
  subRows: boolean
  /** The Dependencies switch. */
  dependencies: boolean
  /** The vector register whose values the inspector shows. */
  register: number | null
}

export const EMPTY_VIEW: BenchView = { cursor: null, window: null, selected: null, subRows: false, dependencies: false, register: null }

/** A view as saved or shared (the switches and register are optional there: older views lack them) on the Bench's terms. */
export function benchViewOf(v: Partial<BenchView> & Pick<BenchView, 'cursor' | 'window' | 'selected'>): BenchView {
  return { cursor: v.cursor, window: v.window, selected: v.selected, subRows: v.subRows ?? false, dependencies: v.dependencies ?? false, register: v.register ?? null }
}

/** True when the view sets anything (a URL with any view key wins over a scenario's saved view). */
export function hasView(v: BenchView): boolean {
  return v.cursor !== null || v.window !== null || v.selected !== null || v.subRows || v.dependencies || v.register !== null
}

/** Largest cycle the URL accepts: the default cycle limit of the timing model (5,000,000). */
export const MAX_URL_CYCLE = 5_000_000

type QueryValue = string | null | undefined | (string | null)[]

function flagOf(v: QueryValue): boolean {
  return (Array.isArray(v) ? v[0] : v) === '1'
}

function registerOf(v: QueryValue): number | null {
  const s = Array.isArray(v) ? v[0] : v
  return typeof s === 'string' && /^\d{1,2}$/.test(s) && Number(s) < 32 ? Number(s) : null
}

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
    subRows: flagOf(query.rew),
    dependencies: flagOf(query.deps),
    register: registerOf(query.reg),
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
  if (view.subRows) q.rew = '1'
  if (view.dependencies) q.deps = '1'
  if (view.register !== null) q.reg = String(view.register)
  return q
}

/** The query keys the view owns. */
export const VIEW_KEYS = ['cycle', 'from', 'to', 'sel', 'rew', 'deps', 'reg'] as const

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
  return VIEW_KEYS.every((k) => qa[k] === qb[k])
}
