import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'
import type { RunSummary, ScenarioContent } from '../../shared/schemas/scenario'

/** An immutable snapshot of a scenario (the database refuses updates: see the migration). */
export class ScenarioVersion extends Model<InferAttributes<ScenarioVersion>, InferCreationAttributes<ScenarioVersion>> {
  declare id: CreationOptional<string>
  declare scenarioId: string
  declare number: number
  declare authorId: string | null
  declare authorName: string
  declare message: string
  declare content: ScenarioContent
  declare run: RunSummary
  declare createdAt: CreationOptional<Date>
  /** Imported versions only: the author and date their bundle claimed (shown as "originally"). */
  declare originalAuthorName: CreationOptional<string | null>
  declare originalCreatedAt: CreationOptional<Date | null>

  static initModel(sequelize: Sequelize): void {
    ScenarioVersion.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        scenarioId: { type: DataTypes.UUID, allowNull: false },
        number: { type: DataTypes.INTEGER, allowNull: false },
        authorId: { type: DataTypes.UUID, allowNull: true },
        authorName: { type: DataTypes.STRING(200), allowNull: false },
        message: { type: DataTypes.STRING(500), allowNull: false },
        content: { type: DataTypes.JSONB, allowNull: false },
        run: { type: DataTypes.JSONB, allowNull: false },
        createdAt: DataTypes.DATE,
        originalAuthorName: { type: DataTypes.STRING(200), allowNull: true },
        originalCreatedAt: { type: DataTypes.DATE, allowNull: true },
      },
      { sequelize, tableName: 'scenario_versions', underscored: true, updatedAt: false },
    )
  }
}
