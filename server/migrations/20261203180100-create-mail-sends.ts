import { DataTypes, Sequelize } from 'sequelize'
import type { Migration } from '../db/migrator'

/** What each account had the server e-mail, for the hourly and daily limits (services/mail-limits.ts). */
export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('mail_sends', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: Sequelize.literal('gen_random_uuid()') },
    user_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    kind: { type: DataTypes.STRING(20), allowNull: false },
    recipients: { type: DataTypes.INTEGER, allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
  })
  await qi.addIndex('mail_sends', ['user_id', 'created_at'])
}

export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable('mail_sends')
}
