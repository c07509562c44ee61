import { DataTypes, Sequelize } from 'sequelize'
import type { Migration } from '../db/migrator'

/** The original file of an import, kept in the database so it is backed up and removed with its workspace. */
export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('uploads', {
    id: { type: DataTypes.UUID, primaryKey: true, defaultValue: Sequelize.literal('gen_random_uuid()') },
    workspace_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'workspaces', key: 'id' }, onDelete: 'CASCADE' },
    uploaded_by_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    file_name: { type: DataTypes.STRING(255), allowNull: false },
    kind: { type: DataTypes.STRING(16), allowNull: false },
    media_type: { type: DataTypes.STRING(100), allowNull: false },
    size: { type: DataTypes.INTEGER, allowNull: false },
    bytes: { type: DataTypes.BLOB, allowNull: false },
    sha256: { type: DataTypes.STRING(64), allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
  })
  await qi.addConstraint('uploads', { type: 'check', fields: ['kind'], where: { kind: ['asm', 'objdump', 'elf', 'bundle'] }, name: 'uploads_kind_check' })
  await qi.addIndex('uploads', ['workspace_id', 'created_at'])
}

export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable('uploads')
}
