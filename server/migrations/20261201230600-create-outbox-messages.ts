import { DataTypes, Sequelize } from 'sequelize'
import type { Migration } from '../db/migrator'

export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('outbox_messages', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: Sequelize.literal('gen_random_uuid()') },
    from: { type: DataTypes.TEXT, allowNull: false },
    to: { type: DataTypes.ARRAY(DataTypes.TEXT), allowNull: false },
    subject: { type: DataTypes.TEXT, allowNull: false },
    text: { type: DataTypes.TEXT, allowNull: false },
    html: { type: DataTypes.TEXT, allowNull: false },
    received_at: { type: DataTypes.DATE, allowNull: false, defaultValue: Sequelize.literal('now()') },
  })
  // The Outbox lists newest first.
  await qi.addIndex('outbox_messages', ['received_at'])
}

export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable('outbox_messages')
}
