import { Sequelize } from 'sequelize'
import { initModels } from '../models'

/** A bare connection, without models: for migrations and maintenance. */
export function openConnection(databaseUrl: string): Sequelize {
  return new Sequelize(databaseUrl, { dialect: 'postgres', logging: false, pool: { max: 10, idle: 10_000 } })
}

/**
 * The app's connection, with every model bound to it. Sequelize models are
 * process-wide: call this once per process (see RuntimeOptions.sequelize).
 */
export function connect(databaseUrl: string): Sequelize {
  const sequelize = openConnection(databaseUrl)
  initModels(sequelize)
  return sequelize
}
