/**
 * `npm run worker`: one sweep worker process. Start any number, on this
 * machine or another that reaches the same PostgreSQL (DATABASE_URL); each
 * takes chunks of server sweeps from the queue. The database must be up and
 * migrated (npm start or scripts/db.ts).
 */
import { loadConfig } from './config'
import { connect } from './db/connection'
import { createLogger } from './http/request-log'
import { startSweepWorker } from './worker-sweeps'

const config = loadConfig()
const logger = createLogger(config)
const sequelize = connect(config.databaseUrl)
const worker = await startSweepWorker({ databaseUrl: config.databaseUrl, sequelize, logger })
logger.info('Chimeline sweep worker taking chunks')

let stopping = false
const stop = () => {
  if (stopping) return
  stopping = true
  worker
    .stop()
    .then(() => sequelize.close())
    .then(() => process.exit(0), () => process.exit(1))
}
process.on('SIGINT', stop)
process.on('SIGTERM', stop)
