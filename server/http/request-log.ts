/**
 * The server's logger and the request log, with credentials kept out:
 * the Authorization header, cookies in and out, and tokens in URLs (share
 * links /api/shares/<token> and /s/<token>, `?token=` of reset and invitation
 * links) never reach it. A token is replaced by `~` and the first 8 hex digits
 * of its SHA-256, which is how the database keys it, so a line can still be
 * matched to its share link row without the log granting anything.
 *
 * Writing is asynchronous (buffered), and share-link opens, the one route
 * that takes crowds, are logged one in `shareOpenLogEvery`.
 */
import fs from 'node:fs'
import path from 'node:path'
import type { IncomingHttpHeaders } from 'node:http'
import type { RequestHandler } from 'express'
import { pino, type Logger } from 'pino'
import { pinoHttp } from 'pino-http'
import { hashToken } from '../auth/tokens'
import type { ServerConfig } from '../config'

const TOKEN_IN_PATH = /(\/api\/shares\/|\/s\/)([^/?#\s]+)/g
const TOKEN_IN_QUERY = /([?&]token=)([^&#\s]*)/gi
const REDACTED = '[Redacted]'

function tokenTag(raw: string): string {
  let token = raw
  try {
    token = decodeURIComponent(raw)
  } catch {
    // Malformed percent-encoding: tag the raw text.
  }
  return `~${hashToken(token).slice(0, 8)}`
}

/** A path or URL with every token replaced by a short prefix of its hash. */
export function redactUrl(url: string): string {
  return url.replace(TOKEN_IN_PATH, (_m, prefix: string, token: string) => prefix + tokenTag(token)).replace(TOKEN_IN_QUERY, (_m, prefix: string, token: string) => prefix + tokenTag(token))
}

function redactHeaders(headers: IncomingHttpHeaders | Record<string, unknown> | undefined): Record<string, unknown> {
  const out: Record<string, unknown> = { ...headers }
  for (const name of ['authorization', 'cookie', 'set-cookie']) if (name in out) out[name] = REDACTED
  // The share page's own address may come back as the Referer of its API call.
  for (const name of ['referer', 'origin']) if (typeof out[name] === 'string') out[name] = redactUrl(out[name])
  return out
}

interface SerializedReq {
  id: unknown
  method: string
  url: string
  headers: IncomingHttpHeaders
  remoteAddress?: string
}

/** Creates the log file (and its folder) readable by its owner only, also when it existed before. */
function privateLogFile(file: string): number {
  fs.mkdirSync(path.dirname(file), { recursive: true, mode: 0o700 })
  const fd = fs.openSync(file, 'a', 0o600)
  fs.fchmodSync(fd, 0o600)
  return fd
}

export function createLogger(config: Pick<ServerConfig, 'logLevel' | 'logFile'>): Logger {
  if (config.logLevel === 'silent') return pino({ level: 'silent' })
  const dest = config.logFile ? privateLogFile(config.logFile) : 1
  return pino(
    {
      level: config.logLevel,
      // A second guard for lines that log a request or answer some other way than the serialisers below.
      redact: { paths: ['req.headers.authorization', 'req.headers.cookie', 'res.headers["set-cookie"]'], censor: REDACTED },
    },
    pino.destination({ dest, sync: false }),
  )
}

const isShareOpen = (url: string) => url.startsWith('/api/shares/')

/** pino-http with the serialisers above, no line for health checks, and share opens sampled. */
export function requestLogger(logger: Logger, config: Pick<ServerConfig, 'shareOpenLogEvery'>): RequestHandler {
  const every = config.shareOpenLogEvery
  const http = pinoHttp({
    logger,
    // No `query` or `params`: both would hold the tokens redactUrl removes.
    serializers: {
      req: (req: SerializedReq) => ({ id: req.id, method: req.method, url: redactUrl(req.url), headers: redactHeaders(req.headers), remoteAddress: req.remoteAddress }),
      res: (res: { statusCode: number; headers?: Record<string, unknown> }) => ({ statusCode: res.statusCode, headers: redactHeaders(res.headers) }),
    },
    customSuccessObject: (req, _res, line: object) => (every > 1 && isShareOpen((req as { originalUrl?: string }).originalUrl ?? '') ? { ...line, sampledOneIn: every } : line),
    autoLogging: { ignore: (req) => req.url === '/api/health' },
  })
  let seen = 0
  return (req, res, next) => {
    if (every > 1 && isShareOpen(req.url) && ++seen % every !== 0) {
      // Skipped: pino-http would serialise the request for its child logger even unlogged.
      // Errors still reach the log through the server's logger.
      req.log = logger
      next()
      return
    }
    http(req, res, next)
  }
}
