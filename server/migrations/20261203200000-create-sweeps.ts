import { DataTypes, Sequelize } from 'sequelize'
import type { Migration } from '../db/migrator'

/**
 * Sweeps and their points. A point is stored once per (sweep, index): server
 * workers insert with ON CONFLICT DO NOTHING, so a chunk retried after a
 * worker died writes each point once.
 */
export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('sweeps', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: Sequelize.literal('gen_random_uuid()') },
    workspace_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'workspaces', key: 'id' }, onDelete: 'CASCADE' },
    scenario_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'scenarios', key: 'id' }, onDelete: 'SET NULL' },
    version_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'scenario_versions', key: 'id' }, onDelete: 'SET NULL' },
    title: { type: DataTypes.STRING(200), allowNull: false },
    definition: { type: DataTypes.JSONB, allowNull: false },
    runner: { type: DataTypes.STRING(16), allowNull: false },
    status: { type: DataTypes.STRING(16), allowNull: false },
    planned: { type: DataTypes.INTEGER, allowNull: false },
    message: { type: DataTypes.TEXT, allowNull: true },
    created_by_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  })
  await qi.addConstraint('sweeps', { type: 'check', fields: ['runner'], where: { runner: ['browser', 'server'] }, name: 'sweeps_runner_check' })
  await qi.addConstraint('sweeps', { type: 'check', fields: ['status'], where: { status: ['queued', 'running', 'done', 'cancelled', 'stopped'] }, name: 'sweeps_status_check' })
  await qi.addIndex('sweeps', ['workspace_id', 'created_at'])
  await qi.createTable('sweep_points', {
    sweep_id: { type: DataTypes.UUID, allowNull: false, primaryKey: true, references: { model: 'sweeps', key: 'id' }, onDelete: 'CASCADE' },
    point_index: { type: DataTypes.INTEGER, allowNull: false, primaryKey: true },
    result: { type: DataTypes.JSONB, allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: Sequelize.literal('now()') },
  })
}

export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable('sweep_points')
  await qi.dropTable('sweeps')
}
