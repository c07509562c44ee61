import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'

export class Workspace extends Model<InferAttributes<Workspace>, InferCreationAttributes<Workspace>> {
  declare id: CreationOptional<string>
  declare name: string
  /** Preset id that imports start on unless they name one. */
  declare defaultPreset: CreationOptional<string>
  declare createdAt: CreationOptional<Date>
  declare updatedAt: CreationOptional<Date>
  /** Soft delete (paranoid): destroy() sets it, queries skip such rows, restore() undoes it. */
  declare deletedAt: CreationOptional<Date | null>

  static initModel(sequelize: Sequelize): void {
    Workspace.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        name: { type: DataTypes.STRING(80), allowNull: false },
        defaultPreset: { type: DataTypes.STRING(40), allowNull: false, defaultValue: 'default-8' },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
        deletedAt: { type: DataTypes.DATE, allowNull: true },
      },
      { sequelize, tableName: 'workspaces', underscored: true, paranoid: true },
    )
  }
}
