import { DataTypes, Sequelize } from 'sequelize'
import type { Migration } from '../db/migrator'

export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('password_resets', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: Sequelize.literal('gen_random_uuid()') },
    user_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    used_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
  })
  await qi.addIndex('password_resets', ['user_id'])
}

export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable('password_resets')
}
