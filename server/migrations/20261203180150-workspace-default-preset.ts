import { DataTypes } from 'sequelize'
import type { Migration } from '../db/migrator'

/** The machine a workspace's imports start on, as a preset id (shared/sim/presets.ts). */
export const up: Migration = async ({ context: qi }) => {
  await qi.addColumn('workspaces', 'default_preset', { type: DataTypes.STRING(40), allowNull: false, defaultValue: 'default-8' })
}

export const down: Migration = async ({ context: qi }) => {
  await qi.removeColumn('workspaces', 'default_preset')
}
