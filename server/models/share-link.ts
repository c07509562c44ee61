import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize'
import type { ScenarioView } from '../../shared/schemas/scenario'
import type { ShareAccessMode } from '../../shared/schemas/share-link'
import type { ScenarioVersion } from './scenario-version'
import type { User } from './user'

/** A read-only link to one scenario version and view; only the token's SHA-256 is kept. */
export class ShareLink extends Model<InferAttributes<ShareLink>, InferCreationAttributes<ShareLink>> {
  declare id: CreationOptional<string>
  declare scenarioId: string
  declare versionId: string
  /** The sweep of this scenario the link shows beside the version, if any. */
  declare sweepId: CreationOptional<string | null>
  declare view: ScenarioView
  declare tokenHash: string
  declare accessMode: ShareAccessMode
  declare expiresAt: Date | null
  declare revokedAt: CreationOptional<Date | null>
  declare createdById: string | null
  declare lastOpenedAt: CreationOptional<Date | null>
  declare openCount: CreationOptional<number>
  declare createdAt: CreationOptional<Date>
  declare version?: NonAttribute<ScenarioVersion>
  declare createdBy?: NonAttribute<User | null>

  static initModel(sequelize: Sequelize): void {
    ShareLink.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        scenarioId: { type: DataTypes.UUID, allowNull: false },
        versionId: { type: DataTypes.UUID, allowNull: false },
        sweepId: { type: DataTypes.UUID, allowNull: true },
        view: { type: DataTypes.JSONB, allowNull: false },
        tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
        accessMode: { type: DataTypes.STRING(16), allowNull: false },
        expiresAt: { type: DataTypes.DATE, allowNull: true },
        revokedAt: { type: DataTypes.DATE, allowNull: true },
        createdById: { type: DataTypes.UUID, allowNull: true },
        lastOpenedAt: { type: DataTypes.DATE, allowNull: true },
        openCount: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'share_links', underscored: true, updatedAt: false },
    )
  }
}
