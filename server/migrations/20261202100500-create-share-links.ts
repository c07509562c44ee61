import { DataTypes, Sequelize } from 'sequelize'
import type { Migration } from '../db/migrator'

/** A read-only link to one version and one view; only the token's SHA-256 is stored. */
export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('share_links', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: Sequelize.literal('gen_random_uuid()') },
    scenario_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'scenarios', key: 'id' }, onDelete: 'CASCADE' },
    version_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'scenario_versions', key: 'id' }, onDelete: 'CASCADE' },
    view: { type: DataTypes.JSONB, allowNull: false },
    token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    access_mode: { type: DataTypes.STRING(16), allowNull: false },
    expires_at: { type: DataTypes.DATE, allowNull: true },
    revoked_at: { type: DataTypes.DATE, allowNull: true },
    created_by_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    last_opened_at: { type: DataTypes.DATE, allowNull: true },
    open_count: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    created_at: { type: DataTypes.DATE, allowNull: false },
  })
  await qi.addConstraint('share_links', { type: 'check', fields: ['access_mode'], where: { access_mode: ['anyone', 'workspace'] }, name: 'share_links_access_mode_check' })
  // A scenario's links are listed in the share dialog.
  await qi.addIndex('share_links', ['scenario_id', 'created_at'])
  await qi.addIndex('share_links', ['version_id'])
}

export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable('share_links')
}
