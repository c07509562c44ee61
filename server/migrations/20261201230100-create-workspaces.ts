import { DataTypes, Sequelize } from 'sequelize'
import type { Migration } from '../db/migrator'

export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('workspaces', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: Sequelize.literal('gen_random_uuid()') },
    name: { type: DataTypes.STRING(80), allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  })
}

export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable('workspaces')
}
