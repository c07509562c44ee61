import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize'
import type { Expectation } from '../../shared/schemas/expectation'
import type { Machine } from '../../shared/schemas/machine'
import type { InitialDataEntry, RunSummary, ScenarioView } from '../../shared/schemas/scenario'
import type { Walkthrough } from '../../shared/schemas/walkthrough'
import type { User } from './user'

/**
 * A scenario's newest content (the head of its history) and its version
 * counter. Every save also writes a ScenarioVersion; `version` is the number
 * of the newest one. `deletedAt` marks the trash (30 days to undo).
 */
export class Scenario extends Model<InferAttributes<Scenario>, InferCreationAttributes<Scenario>> {
  declare id: CreationOptional<string>
  declare workspaceId: string
  declare title: string
  declare description: string
  declare tags: string[]
  declare program: string
  declare machine: Machine
  declare initialData: InitialDataEntry[]
  declare view: ScenarioView
  declare expectations: CreationOptional<Expectation[]>
  declare walkthroughs: CreationOptional<Walkthrough[]>
  declare run: RunSummary
  declare authorId: string | null
  declare version: number
  declare uploadId: CreationOptional<string | null>
  declare createdAt: CreationOptional<Date>
  declare updatedAt: CreationOptional<Date>
  declare deletedAt: CreationOptional<Date | null>
  declare author?: NonAttribute<User | null>

  static initModel(sequelize: Sequelize): void {
    Scenario.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        workspaceId: { type: DataTypes.UUID, allowNull: false },
        title: { type: DataTypes.STRING(200), allowNull: false },
        description: { type: DataTypes.TEXT, allowNull: false },
        tags: { type: DataTypes.ARRAY(DataTypes.TEXT), allowNull: false },
        program: { type: DataTypes.TEXT, allowNull: false },
        machine: { type: DataTypes.JSONB, allowNull: false },
        initialData: { type: DataTypes.JSONB, allowNull: false },
        view: { type: DataTypes.JSONB, allowNull: false },
        expectations: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        walkthroughs: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        run: { type: DataTypes.JSONB, allowNull: false },
        authorId: { type: DataTypes.UUID, allowNull: true },
        version: { type: DataTypes.INTEGER, allowNull: false },
        uploadId: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
        deletedAt: { type: DataTypes.DATE, allowNull: true },
      },
      { sequelize, tableName: 'scenarios', underscored: true },
    )
  }
}
