/**
 * Share link lifetimes offered in the dialog, as the absolute expiry time the
 * API takes (createShareLinkBodySchema: ISO 8601, in the future, at most
 * SHARE_MAX_DAYS away, or null for never).
 *
 * @example
 *   expiryFor('7d', new Date('2026-03-01T10:00:00Z')) // '2026-03-08T10:00:00.000Z'
 */
export const EXPIRY_CHOICES = [
  { value: '1d', label: '1 day', days: 1 },
  { value: '7d', label: '7 days', days: 7 },
  { value: '30d', label: '30 days', days: 30 },
  { value: '365d', label: '1 year', days: 365 },
  { value: 'never', label: 'Never', days: null },
] as const

export type ExpiryChoice = (typeof EXPIRY_CHOICES)[number]['value']

export function expiryFor(choice: ExpiryChoice, now: Date): string | null {
  const days = EXPIRY_CHOICES.find((c) => c.value === choice)?.days ?? null
  return days === null ? null : new Date(now.getTime() + days * 86_400_000).toISOString()
}

/**
 * Splits what a user types into the recipients box (commas, semicolons,
 * spaces or new lines between addresses), without duplicates, in order.
 */
export function splitRecipients(text: string): string[] {
  const seen = new Set<string>()
  for (const part of text.split(/[\s,;]+/)) {
    const a = part.trim().toLowerCase()
    if (a) seen.add(a)
  }
  return [...seen]
}
