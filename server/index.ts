/** Starts the server (the database must be up and migrated: see scripts/db.ts). */
import { loadConfig } from './config'
import { createRuntime, listen } from './runtime'

const runtime = await createRuntime(loadConfig())
const { server, url } = await listen(runtime)
runtime.ctx.logger.info({ url, smtpSink: runtime.sink?.port ?? null }, 'Chimeline API listening')

let stopping = false
const stop = () => {
  if (stopping) return
  stopping = true
  server.close()
  server.closeAllConnections()
  runtime.close().then(() => process.exit(0), () => process.exit(1))
}
process.on('SIGINT', stop)
process.on('SIGTERM', stop)
