/**
 * The value lists of a swept parameter: `A..B` (integers from A to B
 * inclusive), `A..B:STEP` (A, A+STEP, ... up to B) or a comma list
 * (`serial,staggered`, `1,2,4,8`, `true,false`).
 *
 * @example
 *   parseSpec('1..256:8') // { ok: true, values: [1, 9, 17, ..., 249] }
 */
import type { SweepValue } from '../schemas/sweep'

export type SpecResult = { ok: true; values: SweepValue[] } | { ok: false; message: string }

const RANGE = /^(-?\d+)\s*\.\.\s*(-?\d+)(?:\s*:\s*(\d+))?$/

/** "4" -> 4, "true" -> true, "serial" -> "serial": the machine schema or the assembler then judges the value. */
export function coerceSweepValue(raw: string): SweepValue {
  if (raw === 'true') return true
  if (raw === 'false') return false
  if (raw !== '' && Number.isFinite(Number(raw))) return Number(raw)
  return raw
}

/** Parses a SPEC; `maxValues` bounds a range before it is expanded. */
export function parseSpec(spec: string, maxValues: number): SpecResult {
  const text = spec.trim()
  if (text === '') return { ok: false, message: 'no values given (write A..B, A..B:STEP or a comma list)' }
  const range = RANGE.exec(text)
  if (range) {
    const from = Number(range[1])
    const to = Number(range[2])
    const step = range[3] === undefined ? 1 : Number(range[3])
    if (step < 1) return { ok: false, message: `"${text}": the step must be at least 1` }
    if (to < from) return { ok: false, message: `"${text}": the range ends (${to}) before it starts (${from})` }
    const count = Math.floor((to - from) / step) + 1
    if (count > maxValues) return { ok: false, message: `"${text}" has ${count} values, more than the limit of ${maxValues}` }
    return { ok: true, values: Array.from({ length: count }, (_, i) => from + i * step) }
  }
  if (text.includes('..')) return { ok: false, message: `"${text}" is not a range: write A..B or A..B:STEP with whole numbers` }
  const items = text.split(',').map((s) => s.trim())
  const empty = items.findIndex((s) => s === '')
  if (empty >= 0) return { ok: false, message: `"${text}": value ${empty + 1} of the list is empty` }
  if (items.length > maxValues) return { ok: false, message: `"${text}" has ${items.length} values, more than the limit of ${maxValues}` }
  const values = items.map(coerceSweepValue)
  const seen = new Set<string>()
  for (const v of values) {
    const key = JSON.stringify(v)
    if (seen.has(key)) return { ok: false, message: `"${text}": the value ${String(v)} is listed twice` }
    seen.add(key)
  }
  return { ok: true, values }
}
