/**
 * The server Playwright tests run against (playwright.config.ts `webServer`):
 * the test cluster and database, the demo users, the SMTP sink on a free port,
 * the built client from dist/ (scripts/test.sh runs `vite build` first), and
 * a suite worker in the same process (suite runs e-mail through its sink).
 */
import { loadConfig } from '../server/config'
import { databaseUrl, testCluster } from '../server/db/cluster'
import { createRuntime, listen } from '../server/runtime'
import { seedDemoWithScenarios } from '../server/services/demo-seed'
import { startSuiteWorker } from '../server/worker-suites'
import { prepareCluster } from './db'

const port = process.env.CHIMELINE_E2E_PORT ?? '3100'
await prepareCluster(testCluster)
const config = loadConfig({
  ...process.env,
  NODE_ENV: 'test',
  PORT: port,
  DATABASE_URL: databaseUrl(testCluster),
  SMTP_URL: '',
  SMTP_SINK_PORT: '0',
  // Browser tests sign in many times from one address; lock-out has its own integration test.
  AUTH_RATE_LIMIT_MAX: '10000',
  LOG_LEVEL: process.env.LOG_LEVEL ?? 'warn',
})
const runtime = await createRuntime(config)
await seedDemoWithScenarios(runtime.ctx)
const suites = await startSuiteWorker({ config, sequelize: runtime.ctx.sequelize, mailer: runtime.ctx.mailer, logger: runtime.ctx.logger })
const { server, url } = await listen(runtime)
console.log(`Chimeline test server at ${url}`)

const stop = () => {
  server.close()
  server.closeAllConnections()
  suites
    .stop()
    .then(() => runtime.close())
    .then(() => process.exit(0), () => process.exit(1))
}
process.on('SIGINT', stop)
process.on('SIGTERM', stop)
