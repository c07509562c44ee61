/**
 * The common case of GET /api/shares/:token, answered before Express: a
 * signed-out reader opening an `anyone` link this process has cached. Express
 * alone (its request set-up and routing, before any middleware of ours) costs
 * several times what Node's http server does per request, which a crowd on one
 * link multiplies (README, "Share-link load"). The answer is the full route's
 * (same body, ETag, cache and security headers; tests/server/share-links.test.ts
 * compares them), from parts prepared once per link. Everything else (a cold
 * link, 404, 410, a workspace link, a reader with a token, HEAD, an
 * If-None-Match that is not exactly the ETag) goes to the Express app.
 *
 * One open in `shareOpenLogEvery` is logged here (the token as redactUrl
 * leaves it), as the request log does for the share opens it sees.
 */
import type { IncomingMessage, RequestListener, ServerResponse } from 'node:http'
import type { RequestHandler } from 'express'
import type { AppContext } from '../../context'
import { redactUrl } from '../../http/request-log'
import type { OpenLink } from '../../services/share-links-open'

const PREFIX = '/api/shares/'
const TOKEN = /^[A-Za-z0-9_-]{1,200}$/

/** The headers a middleware sets, read once from a stand-in response (helmet sets fixed values). */
function headersOf(middleware: RequestHandler): Record<string, string> {
  const headers: Record<string, string> = {}
  let done = false
  const res = {
    setHeader: (name: string, value: unknown) => void (headers[name.toLowerCase()] = String(value)),
    removeHeader: (name: string) => void delete headers[name.toLowerCase()],
  }
  void middleware({ headers: {} } as never, res as never, () => (done = true))
  if (!done) throw new Error('the security headers middleware did not finish at once: the share fast path cannot copy its headers')
  return headers
}

export function withShareFastOpen(ctx: AppContext, app: RequestListener, securityHeaders: RequestHandler): RequestListener {
  const base = { ...headersOf(securityHeaders), 'cache-control': 'private, no-cache' }
  const prepared = new WeakMap<OpenLink, { ok: Record<string, string>; notModified: Record<string, string> }>()
  const every = ctx.config.shareOpenLogEvery
  let seen = 0
  return (req: IncomingMessage, res: ServerResponse) => {
    const url = req.url ?? ''
    if (!url.startsWith(PREFIX) || req.method !== 'GET' || req.headers.authorization !== undefined) return app(req, res)
    const token = url.slice(PREFIX.length)
    if (!TOKEN.test(token)) return app(req, res)
    const inm = req.headers['if-none-match']
    const link = ctx.shares.warmAnyone(token)
    if (!link || (inm !== undefined && inm !== link.etag)) return app(req, res)
    ctx.shares.counts.record(link.linkId)
    let h = prepared.get(link)
    if (!h) {
      // A 304 has no body, so (as Express sends it) no Content-Type or Content-Length.
      h = { ok: { ...base, etag: link.etag, 'content-type': 'application/json; charset=utf-8', 'content-length': String(link.body.length) }, notModified: { ...base, etag: link.etag } }
      prepared.set(link, h)
    }
    const status = inm === undefined ? 200 : 304
    res.writeHead(status, status === 200 ? h.ok : h.notModified)
    res.end(status === 200 ? link.body : undefined)
    if (every === 1 || ++seen % every === 0) {
      ctx.logger.info({ req: { method: 'GET', url: redactUrl(url) }, res: { statusCode: status }, sampledOneIn: every }, 'request completed')
    }
  }
}
