/**
 * Cache headers of the built client's files. Vite names everything under
 * dist/assets/ after a hash of its content, so a name never changes content:
 * browsers may keep those a year without asking (RFC 8246 `immutable`).
 * index.html names the current assets, so it is revalidated on every load
 * (ETag, 304 when unchanged); other top-level files (favicon) keep an hour.
 */
import type { ServerResponse } from 'node:http'
import path from 'node:path'

export const IMMUTABLE = 'public, max-age=31536000, immutable'

export function clientCacheHeaders(res: ServerResponse, file: string): void {
  if (file.split(path.sep).includes('assets')) res.setHeader('Cache-Control', IMMUTABLE)
  else if (file.endsWith('.html')) res.setHeader('Cache-Control', 'no-cache')
}
