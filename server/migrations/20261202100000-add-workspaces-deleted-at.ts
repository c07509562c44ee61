import { DataTypes } from 'sequelize'
import type { Migration } from '../db/migrator'

/** Soft delete: a deleted workspace keeps its rows for 30 days, so its owner can undo. */
export const up: Migration = async ({ context: qi }) => {
  await qi.addColumn('workspaces', 'deleted_at', { type: DataTypes.DATE, allowNull: true })
}

export const down: Migration = async ({ context: qi }) => {
  await qi.removeColumn('workspaces', 'deleted_at')
}
