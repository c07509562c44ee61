/**
 * One format for numbers and dates across the client, through Intl and the
 * browser's locale (en-US writes 35,494 and 14.22). Every count, cycle,
 * rate and time the user reads goes through these, so a page never shows
 * "35494" beside "35,494".
 *
 * @example
 *   formatInteger(35494)   // '35,494' (en-US)
 *   formatDecimal(14.2167) // '14.22'
 */
const integers = new Intl.NumberFormat(undefined, { maximumFractionDigits: 0 })
const decimals = new Map<number, Intl.NumberFormat>()
const dateTime = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' })
const dateOnly = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium' })

/** A whole number with the locale's grouping (rounded first). */
export function formatInteger(n: number): string {
  return integers.format(Math.round(n))
}

/** A number with exactly `digits` decimals (default 2). */
export function formatDecimal(n: number, digits = 2): string {
  let f = decimals.get(digits)
  if (!f) decimals.set(digits, (f = new Intl.NumberFormat(undefined, { minimumFractionDigits: digits, maximumFractionDigits: digits })))
  return f.format(n)
}

/** A time as text (ISO string or Date): medium date, short time. */
export function formatDateTime(t: string | Date): string {
  return dateTime.format(typeof t === 'string' ? new Date(t) : t)
}

/** A day as text: medium date. */
export function formatDate(t: string | Date): string {
  return dateOnly.format(typeof t === 'string' ? new Date(t) : t)
}
