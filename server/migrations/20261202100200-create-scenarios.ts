import { DataTypes, Sequelize } from 'sequelize'
import type { Migration } from '../db/migrator'

/** A scenario's newest content; its history is in scenario_versions. */
export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('scenarios', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: Sequelize.literal('gen_random_uuid()') },
    workspace_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'workspaces', key: 'id' }, onDelete: 'CASCADE' },
    title: { type: DataTypes.STRING(200), allowNull: false },
    description: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    tags: { type: DataTypes.ARRAY(DataTypes.TEXT), allowNull: false, defaultValue: [] },
    program: { type: DataTypes.TEXT, allowNull: false },
    machine: { type: DataTypes.JSONB, allowNull: false },
    initial_data: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
    view: { type: DataTypes.JSONB, allowNull: false },
    run: { type: DataTypes.JSONB, allowNull: false },
    author_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    upload_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'uploads', key: 'id' }, onDelete: 'SET NULL' },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
    deleted_at: { type: DataTypes.DATE, allowNull: true },
  })
  // The Scenarios table lists one workspace's live (or trashed) scenarios by update time.
  await qi.addIndex('scenarios', ['workspace_id', 'deleted_at', 'updated_at'])
  await qi.addIndex('scenarios', ['workspace_id', 'title'])
  await qi.addIndex('scenarios', ['author_id'])
  await qi.addIndex('scenarios', ['upload_id'])
  // Tag filters use `tags @> ARRAY[...]`, which a GIN index serves.
  await qi.addIndex('scenarios', ['tags'], { using: 'GIN' })
}

export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable('scenarios')
}
