import { DataTypes } from 'sequelize'
import type { Migration } from '../db/migrator'

/**
 * A share link may point at a sweep of its scenario: the reader sees the
 * sweep's plot and table beside the shared version. Deleting the sweep leaves
 * the link showing the version alone.
 */
export const up: Migration = async ({ context: qi }) => {
  await qi.addColumn('share_links', 'sweep_id', { type: DataTypes.UUID, allowNull: true, references: { model: 'sweeps', key: 'id' }, onDelete: 'SET NULL' })
}

export const down: Migration = async ({ context: qi }) => {
  await qi.removeColumn('share_links', 'sweep_id')
}
