import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize'
import type { WorkspaceRole } from '../../shared/schemas/workspace'
import type { User } from './user'
import type { Workspace } from './workspace'

/** A user's role in one workspace; the pair (workspace, user) is the key. */
export class Membership extends Model<InferAttributes<Membership>, InferCreationAttributes<Membership>> {
  declare workspaceId: string
  declare userId: string
  declare role: WorkspaceRole
  declare createdAt: CreationOptional<Date>
  declare updatedAt: CreationOptional<Date>
  declare user?: NonAttribute<User>
  declare workspace?: NonAttribute<Workspace>

  static initModel(sequelize: Sequelize): void {
    Membership.init(
      {
        workspaceId: { type: DataTypes.UUID, primaryKey: true },
        userId: { type: DataTypes.UUID, primaryKey: true },
        role: { type: DataTypes.STRING(16), allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'memberships', underscored: true },
    )
  }
}
