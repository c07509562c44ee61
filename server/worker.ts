/**
 * `npm run worker`: one worker process. Start any number, on this machine or
 * another that reaches the same PostgreSQL (DATABASE_URL); each takes chunks
 * of server sweeps and suite runs from their queues. Red suite runs are
 * e-mailed through SMTP_URL, or the app's sink on SMTP_SINK_PORT. The database must be up and
 * migrated (npm start or scripts/db.ts).
 */
import { loadConfig } from './config'
import { connect } from './db/connection'
import { createLogger } from './http/request-log'
import { createMailer, sinkSmtpUrl } from './services/mailer'
import { startSuiteWorker } from './worker-suites'
import { startSweepWorker } from './worker-sweeps'

const config = loadConfig()
const logger = createLogger(config)
const sequelize = connect(config.databaseUrl)
const worker = await startSweepWorker({ databaseUrl: config.databaseUrl, sequelize, logger })
const mailer = createMailer(config.smtpUrl ?? sinkSmtpUrl(config.smtpSinkPort), config.mailFrom)
const suites = await startSuiteWorker({ config, sequelize, mailer, logger })
logger.info('Chimeline worker taking sweep chunks and suite runs')

let stopping = false
const stop = () => {
  if (stopping) return
  stopping = true
  Promise.all([worker.stop(), suites.stop()])
    .then(() => mailer.close())
    .then(() => sequelize.close())
    .then(() => process.exit(0), () => process.exit(1))
}
process.on('SIGINT', stop)
process.on('SIGTERM', stop)
