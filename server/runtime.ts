import http, { type RequestListener, type Server } from 'node:http'
import { createSweepQueue } from './services/sweeps-queue'
import { createSuiteQueue } from './services/suites-queue'
import type { AddressInfo } from 'node:net'
import type { Sequelize } from 'sequelize'
import { buildApp, securityHeaders } from './app'
import { createSignInGuard } from './auth/signin-guard'
import { withShareFastOpen } from './routes/shares/fast-open'
import type { ServerConfig } from './config'
import type { AppContext } from './context'
import { connect } from './db/connection'
import { createLogger } from './http/request-log'
import { createMailer, sinkSmtpUrl } from './services/mailer'
import { createRunPool } from './services/run-pool'
import { createOpenCounter } from './services/share-links-counts'
import { listenForShareLinkChanges } from './services/share-links-notify'
import { ShareOpens } from './services/share-links-open'
import { startSmtpSink, type SmtpSink } from './services/smtp-sink'
import { createWorkPool } from './services/work-pool'

export interface Runtime {
  ctx: AppContext
  app: ReturnType<typeof buildApp>
  /** What the HTTP server runs: warm share opens (routes/shares/fast-open.ts), else the app. */
  handler: RequestListener
  /** Set when SMTP_URL is unset: the in-process sink that feeds the Outbox. */
  sink: SmtpSink | null
  close(): Promise<void>
}

export interface RuntimeOptions {
  /**
   * An open connection to share instead of opening one. Sequelize models are
   * bound to one connection per process, so a second runtime in the same
   * process (tests) must share it; it is then not closed by close().
   */
  sequelize?: Sequelize
}

/** Connects to PostgreSQL, starts the SMTP sink when needed, builds the app. */
export async function createRuntime(config: ServerConfig, options: RuntimeOptions = {}): Promise<Runtime> {
  const logger = createLogger(config)
  const sequelize = options.sequelize ?? connect(config.databaseUrl)
  const sink = config.smtpUrl ? null : await startSmtpSink(config.smtpSinkPort, logger)
  const mailer = createMailer(config.smtpUrl ?? sinkSmtpUrl((sink as SmtpSink).port), config.mailFrom)
  const runs = createRunPool(config.saveRuns)
  const work = createWorkPool(config.work)
  const shares = new ShareOpens(sequelize, createOpenCounter(sequelize, logger, config.shareCountFlushMs))
  const shareListener = await listenForShareLinkChanges(config.databaseUrl, shares, logger)
  const sweeps = createSweepQueue(config.databaseUrl)
  const suites = createSuiteQueue(config.databaseUrl)
  const ctx: AppContext = { config, sequelize, mailer, logger, runs, work, signInGuard: createSignInGuard(config.signInLimit), shares, sweeps, suites }
  const app = buildApp(ctx)
  return {
    ctx,
    app,
    handler: withShareFastOpen(ctx, app, securityHeaders(ctx)),
    sink,
    async close() {
      // Before the connection closes: the opens counted since the last flush.
      await shareListener.close()
      await shares.counts.close()
      mailer.close()
      await runs.close()
      await work.close()
      await sweeps.close()
      await suites.close()
      await sink?.close()
      if (!options.sequelize) await sequelize.close()
    },
  }
}

/** Listens on config.host:config.port; resolves with the server and its URL. */
export async function listen(runtime: Runtime): Promise<{ server: Server; url: string }> {
  const { host, port } = runtime.ctx.config
  const server = await new Promise<Server>((resolve, reject) => {
    const s = http.createServer(runtime.handler)
    s.once('error', reject)
    s.listen(port, host, () => resolve(s))
  })
  const address = server.address() as AddressInfo
  return { server, url: `http://${host}:${address.port}` }
}

