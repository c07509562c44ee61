import { DataTypes } from 'sequelize'
import type { Migration } from '../db/migrator'

/** A scenario's newest walkthroughs (shared/schemas/walkthrough.ts); versions keep theirs in their content. */
export const up: Migration = async ({ context: qi }) => {
  await qi.addColumn('scenarios', 'walkthroughs', { type: DataTypes.JSONB, allowNull: false, defaultValue: [] })
}

export const down: Migration = async ({ context: qi }) => {
  await qi.removeColumn('scenarios', 'walkthroughs')
}
