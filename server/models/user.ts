import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'
import type { SiteRole, User as UserDto } from '../../shared/schemas/user'

export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
  declare id: CreationOptional<string>
  /** Stored in lower case (the schemas normalise it), unique. */
  declare email: string
  declare name: string
  declare passwordHash: string
  declare role: CreationOptional<SiteRole>
  declare createdAt: CreationOptional<Date>
  declare updatedAt: CreationOptional<Date>

  toDto(): UserDto {
    return { id: this.id, email: this.email, name: this.name, role: this.role }
  }

  static initModel(sequelize: Sequelize): void {
    User.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
        name: { type: DataTypes.STRING(100), allowNull: false },
        passwordHash: { type: DataTypes.STRING, allowNull: false },
        role: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'member' },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'users', underscored: true },
    )
  }
}
