import type { Logger } from 'pino'
import type { Sequelize } from 'sequelize'
import type { ServerConfig } from './config'
import type { Mailer } from './services/mailer'
import type { RunPool } from './services/run-pool'
import type { ShareBodyCache } from './services/share-bodies'

/** What routes and services need from the running server; built once in runtime.ts. */
export interface AppContext {
  config: ServerConfig
  sequelize: Sequelize
  mailer: Mailer
  logger: Logger
  /** Computes saved versions' run summaries on worker threads. */
  runs: RunPool
  /** The immutable bodies of opened share links, by link id. */
  shareBodies: ShareBodyCache
}
