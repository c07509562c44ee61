/**
 * The `redirect` query parameter comes from a URL anyone can craft: follow it
 * only to a path of this app, never to another origin ("//evil.test" or
 * "/\evil.test" are read as hosts by browsers).
 */
export function safeRedirect(value: unknown, fallback = '/bench'): string {
  if (typeof value !== 'string' || !value.startsWith('/')) return fallback
  if (value.startsWith('//') || value.startsWith('/\\')) return fallback
  return value
}
