import { DataTypes, Sequelize } from 'sequelize'
import type { Migration } from '../db/migrator'

/** One snapshot per save: number, author, message, the full content and the run summary. */
export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('scenario_versions', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: Sequelize.literal('gen_random_uuid()') },
    scenario_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'scenarios', key: 'id' }, onDelete: 'CASCADE' },
    number: { type: DataTypes.INTEGER, allowNull: false },
    author_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    // Kept as written, so the history still names the author after the account is gone.
    author_name: { type: DataTypes.STRING(200), allowNull: false },
    message: { type: DataTypes.STRING(500), allowNull: false, defaultValue: '' },
    content: { type: DataTypes.JSONB, allowNull: false },
    run: { type: DataTypes.JSONB, allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
  })
  // Also the lookup of a version by number, and what makes two concurrent saves of one number impossible.
  await qi.addConstraint('scenario_versions', { type: 'unique', fields: ['scenario_id', 'number'], name: 'scenario_versions_scenario_number_key' })
  await qi.addIndex('scenario_versions', ['author_id'])
}

export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable('scenario_versions')
}
