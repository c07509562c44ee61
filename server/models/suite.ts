import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize'
import type { SuiteRunEntry, SuiteRunStatus } from '../../shared/schemas/suite'
import type { User } from './user'

/** A suite of a workspace: its scenarios and watchers in order, and an optional preset every scenario runs on. */
export class Suite extends Model<InferAttributes<Suite>, InferCreationAttributes<Suite>> {
  declare id: CreationOptional<string>
  declare workspaceId: string
  declare title: string
  declare description: string
  declare scenarioIds: string[]
  declare presetId: string | null
  declare watcherIds: string[]
  declare createdById: string | null
  declare createdAt: CreationOptional<Date>
  declare updatedAt: CreationOptional<Date>

  static initModel(sequelize: Sequelize): void {
    Suite.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        workspaceId: { type: DataTypes.UUID, allowNull: false },
        title: { type: DataTypes.STRING(200), allowNull: false },
        description: { type: DataTypes.TEXT, allowNull: false },
        scenarioIds: { type: DataTypes.JSONB, allowNull: false },
        presetId: { type: DataTypes.STRING(40), allowNull: true },
        watcherIds: { type: DataTypes.JSONB, allowNull: false },
        createdById: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'suites', underscored: true },
    )
  }
}

/** One run of a suite: status, the model version that ran it, and per scenario its verdicts and figures. */
export class SuiteRun extends Model<InferAttributes<SuiteRun>, InferCreationAttributes<SuiteRun>> {
  declare id: CreationOptional<string>
  declare suiteId: string
  declare workspaceId: string
  declare status: SuiteRunStatus
  declare presetId: string | null
  declare modelVersion: number | null
  declare passed: CreationOptional<number>
  declare failed: CreationOptional<number>
  declare entries: CreationOptional<SuiteRunEntry[]>
  declare message: string | null
  declare startedById: string | null
  declare finishedAt: Date | null
  declare startedBy?: NonAttribute<User | null>
  declare createdAt: CreationOptional<Date>
  declare updatedAt: CreationOptional<Date>

  static initModel(sequelize: Sequelize): void {
    SuiteRun.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        suiteId: { type: DataTypes.UUID, allowNull: false },
        workspaceId: { type: DataTypes.UUID, allowNull: false },
        status: { type: DataTypes.STRING(16), allowNull: false },
        presetId: { type: DataTypes.STRING(40), allowNull: true },
        modelVersion: { type: DataTypes.INTEGER, allowNull: true },
        passed: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        failed: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        entries: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        message: { type: DataTypes.TEXT, allowNull: true },
        startedById: { type: DataTypes.UUID, allowNull: true },
        finishedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'suite_runs', underscored: true },
    )
  }
}
