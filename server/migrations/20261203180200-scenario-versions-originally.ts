import { DataTypes } from 'sequelize'
import type { Migration } from '../db/migrator'

/**
 * An imported version is authored by its importer at the time of import; the
 * author name and date its bundle claimed are kept beside, as "originally"
 * metadata that the history shows as such (never as the version's own).
 */
export const up: Migration = async ({ context: qi }) => {
  await qi.addColumn('scenario_versions', 'original_author_name', { type: DataTypes.STRING(200), allowNull: true })
  await qi.addColumn('scenario_versions', 'original_created_at', { type: DataTypes.DATE, allowNull: true })
}

export const down: Migration = async ({ context: qi }) => {
  await qi.removeColumn('scenario_versions', 'original_created_at')
  await qi.removeColumn('scenario_versions', 'original_author_name')
}
