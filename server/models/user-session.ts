import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'

/**
 * A signed-in session: the `sid` of its access tokens and the family of its
 * refresh tokens. Ended by sign-out, a password reset, or a replayed refresh
 * token; an ended session's access tokens are refused at once.
 */
export class UserSession extends Model<InferAttributes<UserSession>, InferCreationAttributes<UserSession>> {
  declare id: CreationOptional<string>
  declare userId: string
  declare endedAt: CreationOptional<Date | null>
  declare createdAt: CreationOptional<Date>

  static initModel(sequelize: Sequelize): void {
    UserSession.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        userId: { type: DataTypes.UUID, allowNull: false },
        endedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'sessions', underscored: true, updatedAt: false },
    )
  }
}
