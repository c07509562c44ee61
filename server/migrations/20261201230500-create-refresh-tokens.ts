import { DataTypes, Sequelize } from 'sequelize'
import type { Migration } from '../db/migrator'

export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('refresh_tokens', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: Sequelize.literal('gen_random_uuid()') },
    user_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    family_id: { type: DataTypes.UUID, allowNull: false },
    token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    revoked_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
  })
  await qi.addIndex('refresh_tokens', ['family_id'])
  await qi.addIndex('refresh_tokens', ['user_id'])
}

export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable('refresh_tokens')
}
