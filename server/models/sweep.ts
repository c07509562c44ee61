import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'
import type { SweepDefinition, SweepRunStatus } from '../../shared/schemas/sweep'

/** A sweep of a workspace: its definition, where it runs and how far it got; points are in sweep_points. */
export class Sweep extends Model<InferAttributes<Sweep>, InferCreationAttributes<Sweep>> {
  declare id: CreationOptional<string>
  declare workspaceId: string
  declare scenarioId: string | null
  declare versionId: string | null
  declare title: string
  declare definition: SweepDefinition
  declare runner: 'browser' | 'server'
  declare status: SweepRunStatus
  declare planned: number
  declare message: string | null
  declare createdById: string | null
  declare createdAt: CreationOptional<Date>
  declare updatedAt: CreationOptional<Date>

  static initModel(sequelize: Sequelize): void {
    Sweep.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        workspaceId: { type: DataTypes.UUID, allowNull: false },
        scenarioId: { type: DataTypes.UUID, allowNull: true },
        versionId: { type: DataTypes.UUID, allowNull: true },
        title: { type: DataTypes.STRING(200), allowNull: false },
        definition: { type: DataTypes.JSONB, allowNull: false },
        runner: { type: DataTypes.STRING(16), allowNull: false },
        status: { type: DataTypes.STRING(16), allowNull: false },
        planned: { type: DataTypes.INTEGER, allowNull: false },
        message: { type: DataTypes.TEXT, allowNull: true },
        createdById: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'sweeps', underscored: true },
    )
  }
}
