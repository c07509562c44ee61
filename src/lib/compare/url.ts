/**
 * The Side-by-side URL: `/compare?a=RUN&b=RUN&c=CURSOR&w=START-END`, each
 * RUN the JSON of a `CompareRun` in base64url (UTF-8), so that a program in
 * the link survives any character.
 *
 * @example
 *   compareQuery({ a: { kind: 'version', scenarioId, version: 2 }, b: { kind: 'version', scenarioId, version: 3 }, cursor: 40, window: null })
 *   // { a: 'eyJraW5kIjoi...', b: '...', c: '40' }
 */
import { compareRunSchema, type CompareRun } from '@shared/schemas/compare'
import type { CycleWindow } from '@/lib/lanechart/window'

export interface CompareState {
  a: CompareRun
  b: CompareRun
  cursor: number | null
  window: CycleWindow | null
}

function toBase64Url(text: string): string {
  const bytes = new TextEncoder().encode(text)
  let bin = ''
  for (const b of bytes) bin += String.fromCharCode(b)
  return btoa(bin).replace(/\+/g, '-').replace(/\//g, '_').replace(/=+$/, '')
}

function fromBase64Url(text: string): string {
  const bin = atob(text.replace(/-/g, '+').replace(/_/g, '/'))
  return new TextDecoder('utf-8', { fatal: true }).decode(Uint8Array.from(bin, (c) => c.charCodeAt(0)))
}

export function encodeRun(run: CompareRun): string {
  return toBase64Url(JSON.stringify(run))
}

/** The run a query value names, or a message saying what is wrong with it. */
export function decodeRun(value: unknown, name: 'a' | 'b'): { ok: true; run: CompareRun } | { ok: false; message: string } {
  if (typeof value !== 'string' || value === '') return { ok: false, message: `The link names no run ${name.toUpperCase()}` }
  let json: unknown
  try {
    json = JSON.parse(fromBase64Url(value))
  } catch {
    return { ok: false, message: `Run ${name.toUpperCase()} in the link is not readable (cut short when copied?)` }
  }
  const r = compareRunSchema.safeParse(json)
  if (!r.success) return { ok: false, message: `Run ${name.toUpperCase()} in the link: ${r.error.issues.map((i) => `${i.path.join('.') || 'run'}: ${i.message}`).join('; ')}` }
  return { ok: true, run: r.data }
}

/** The query of a state; whole cycles, as the Bench's view keeps them. */
export function compareQuery(s: CompareState): Record<string, string> {
  const q: Record<string, string> = { a: encodeRun(s.a), b: encodeRun(s.b) }
  if (s.cursor !== null) q.c = String(Math.round(s.cursor))
  if (s.window) q.w = `${Math.floor(s.window.start)}-${Math.ceil(s.window.end)}`
  return q
}

/** Cursor and window from the query; anything unreadable is left out (the page then shows the whole runs). */
export function viewFromQuery(q: Record<string, unknown>): { cursor: number | null; window: CycleWindow | null } {
  const c = typeof q.c === 'string' && /^\d+$/.test(q.c) ? Number(q.c) : null
  const m = typeof q.w === 'string' ? /^(\d+)-(\d+)$/.exec(q.w) : null
  const window = m && Number(m[2]) > Number(m[1]) ? { start: Number(m[1]), end: Number(m[2]) } : null
  return { cursor: c, window }
}
