import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize'
import type { UploadKind } from '../../shared/schemas/upload'
import type { User } from './user'

/** The original file of an import, bytes and checksum; scenarios point back at it (scenarios.upload_id). */
export class Upload extends Model<InferAttributes<Upload>, InferCreationAttributes<Upload>> {
  declare id: CreationOptional<string>
  declare workspaceId: string
  declare uploadedById: string | null
  declare fileName: string
  declare kind: UploadKind
  declare mediaType: string
  declare size: number
  declare bytes: Buffer
  declare sha256: string
  declare createdAt: CreationOptional<Date>
  declare uploadedBy?: NonAttribute<User | null>

  static initModel(sequelize: Sequelize): void {
    Upload.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        workspaceId: { type: DataTypes.UUID, allowNull: false },
        uploadedById: { type: DataTypes.UUID, allowNull: true },
        fileName: { type: DataTypes.STRING(255), allowNull: false },
        kind: { type: DataTypes.STRING(16), allowNull: false },
        mediaType: { type: DataTypes.STRING(100), allowNull: false },
        size: { type: DataTypes.INTEGER, allowNull: false },
        bytes: { type: DataTypes.BLOB, allowNull: false },
        sha256: { type: DataTypes.STRING(64), allowNull: false },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'uploads', underscored: true, updatedAt: false },
    )
  }
}
