import { Sequelize } from 'sequelize'
import { initModels } from '../models'

/** One Sequelize connection with every model bound to it. */
export function connect(databaseUrl: string): Sequelize {
  const sequelize = new Sequelize(databaseUrl, {
    dialect: 'postgres',
    logging: false,
    pool: { max: 10, idle: 10_000 },
  })
  initModels(sequelize)
  return sequelize
}
