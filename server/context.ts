import type { Logger } from 'pino'
import type { Sequelize } from 'sequelize'
import type { ServerConfig } from './config'
import type { Mailer } from './services/mailer'

/** What routes and services need from the running server; built once in runtime.ts. */
export interface AppContext {
  config: ServerConfig
  sequelize: Sequelize
  mailer: Mailer
  logger: Logger
}
