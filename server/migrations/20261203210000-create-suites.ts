import { DataTypes, Sequelize } from 'sequelize'
import type { Migration } from '../db/migrator'

/**
 * Suites and their runs. A suite lists its scenarios and watchers as id
 * arrays in order (a scenario deleted later shows as missing in the next run
 * rather than vanishing from the list unseen); a run keeps, per scenario, the
 * version that ran, the verdicts and the figures, with the model version of
 * the engine that ran it.
 */
export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('suites', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: Sequelize.literal('gen_random_uuid()') },
    workspace_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'workspaces', key: 'id' }, onDelete: 'CASCADE' },
    title: { type: DataTypes.STRING(200), allowNull: false },
    description: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    scenario_ids: { type: DataTypes.JSONB, allowNull: false },
    preset_id: { type: DataTypes.STRING(40), allowNull: true },
    watcher_ids: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
    created_by_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  })
  await qi.addIndex('suites', ['workspace_id', 'title'])
  await qi.createTable('suite_runs', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: Sequelize.literal('gen_random_uuid()') },
    suite_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'suites', key: 'id' }, onDelete: 'CASCADE' },
    workspace_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'workspaces', key: 'id' }, onDelete: 'CASCADE' },
    status: { type: DataTypes.STRING(16), allowNull: false },
    preset_id: { type: DataTypes.STRING(40), allowNull: true },
    model_version: { type: DataTypes.INTEGER, allowNull: true },
    passed: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    failed: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    entries: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
    message: { type: DataTypes.TEXT, allowNull: true },
    started_by_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    finished_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  })
  await qi.addConstraint('suite_runs', { type: 'check', fields: ['status'], where: { status: ['queued', 'running', 'passed', 'failed', 'error'] }, name: 'suite_runs_status_check' })
  await qi.addIndex('suite_runs', ['suite_id', 'created_at'])
  await qi.addIndex('suite_runs', ['workspace_id', 'created_at'])
}

export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable('suite_runs')
  await qi.dropTable('suites')
}
