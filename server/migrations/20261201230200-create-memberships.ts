import { DataTypes } from 'sequelize'
import type { Migration } from '../db/migrator'

export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('memberships', {
    workspace_id: {
      type: DataTypes.UUID,
      primaryKey: true,
      references: { model: 'workspaces', key: 'id' },
      onDelete: 'CASCADE',
    },
    user_id: {
      type: DataTypes.UUID,
      primaryKey: true,
      references: { model: 'users', key: 'id' },
      onDelete: 'CASCADE',
    },
    role: { type: DataTypes.STRING(16), allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  })
  await qi.addConstraint('memberships', { type: 'check', fields: ['role'], where: { role: ['owner', 'editor', 'viewer'] }, name: 'memberships_role_check' })
  // "My workspaces" looks memberships up by user.
  await qi.addIndex('memberships', ['user_id'])
}

export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable('memberships')
}
