import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'

/** One request that made the server e-mail on an account's behalf, and to how many addresses. */
export class MailSend extends Model<InferAttributes<MailSend>, InferCreationAttributes<MailSend>> {
  declare id: CreationOptional<string>
  declare userId: string
  declare kind: 'share' | 'invitation' | 'suite-run'
  declare recipients: number
  declare createdAt: CreationOptional<Date>

  static initModel(sequelize: Sequelize): void {
    MailSend.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        userId: { type: DataTypes.UUID, allowNull: false },
        kind: { type: DataTypes.STRING(20), allowNull: false },
        recipients: { type: DataTypes.INTEGER, allowNull: false },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'mail_sends', underscored: true, updatedAt: false },
    )
  }
}
