import path from 'node:path'
import compression from 'compression'
import cookieParser from 'cookie-parser'
import express, { type Express } from 'express'
import helmet from 'helmet'
import { JSON_BODY_LIMIT_BYTES } from '../shared/schemas/errors'
import { createAuthenticator } from './auth/passport'
import type { AppContext } from './context'
import { clientCacheHeaders } from './http/client-cache'
import { apiNotFound, errorHandler } from './http/error-handler'
import { requestLogger } from './http/request-log'
import { secureRouter } from './http/secure-router'
import { refuseBadText } from './http/text-guard'
import { adminRoutes } from './routes/admin'
import { authRoutes } from './routes/auth'
import { healthRoutes } from './routes/health'
import { invitationRoutes } from './routes/invitations'
import { meRoutes } from './routes/me'
import { workspaceRoutes } from './routes/workspaces'
import { docsRoutes } from './routes/docs'
import { scenarioRoutes } from './routes/scenarios'
import { suiteRoutes } from './routes/suites'
import { sweepRoutes } from './routes/sweeps'
import { shareLinkRoutes } from './routes/share-links'
import { shareOpenRouter } from './routes/shares'
import { uploadRoutes } from './routes/uploads'
import { workspaceTrashRoutes } from './routes/workspace-trash'

/** helmet's headers; the share fast path (routes/shares/fast-open.ts) sends the same. */
export function securityHeaders(ctx: AppContext) {
  return helmet({
    contentSecurityPolicy: {
      directives: {
        // Served over plain HTTP on loopback: upgrading would break every asset.
        upgradeInsecureRequests: null,
        // Chart exports and the Worker use blob: URLs.
        imgSrc: ["'self'", 'data:', 'blob:'],
        workerSrc: ["'self'", 'blob:'],
      },
    },
    // HSTS means something only over HTTPS; over plain http it is noise at best.
    strictTransportSecurity: ctx.config.publicUrl.startsWith('https:') ? undefined : false,
  })
}

/** Builds the Express app: API under /api, and the built client (if any) with history fallback. */
export function buildApp(ctx: AppContext): Express {
  const app = express()
  app.disable('x-powered-by')
  app.use(securityHeaders(ctx))
  app.use(requestLogger(ctx.logger, ctx.config))

  const api = secureRouter(createAuthenticator(ctx.config.jwtSecret))
  healthRoutes(ctx, api)
  authRoutes(ctx, api)
  meRoutes(api)
  workspaceRoutes(ctx, api)
  invitationRoutes(ctx, api)
  adminRoutes(api)
  workspaceTrashRoutes(api)
  scenarioRoutes(ctx, api)
  sweepRoutes(ctx, api)
  suiteRoutes(ctx, api)
  shareLinkRoutes(ctx, api)
  uploadRoutes(ctx, api)
  docsRoutes(api)

  // API answers carry tokens and private data: no cache keeps them (the share open revalidates instead).
  // Share links are opened by crowds: their router comes before the body parsers and the other routes.
  const noStore: express.RequestHandler = (_req, res, next) => {
    res.setHeader('Cache-Control', 'no-store')
    next()
  }
  app.use('/api', noStore, shareOpenRouter(ctx))
  app.use('/api', express.json({ limit: JSON_BODY_LIMIT_BYTES }), refuseBadText, cookieParser(), api.router, apiNotFound)

  const clientDir = ctx.config.clientDir
  if (clientDir) {
    // Mounted whether or not the build exists yet: `npm start` may create the
    // app before `vite build` has written dist/, and both handlers look at the
    // folder per request.
    // gzip or brotli for what the browser accepts (the API answers are not compressed: after /api above).
    app.use(compression())
    app.use(express.static(clientDir, { index: false, maxAge: '1h', setHeaders: clientCacheHeaders }))
    // History fallback: every other GET is a client route.
    app.get(/^(?!\/api\/).*/, (_req, res, next) => {
      res.setHeader('Cache-Control', 'no-cache')
      res.sendFile(path.join(clientDir, 'index.html'), (err) => {
        if (!err) return
        if (res.headersSent) return next(err)
        res.status(503).type('text/plain').send('The Chimeline client is not built yet: run `npx vite build` (npm start does it) and reload.')
      })
    })
  }

  app.use(errorHandler)
  return app
}
