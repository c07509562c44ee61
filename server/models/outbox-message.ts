import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize'
import type { OutboxMessage as OutboxMessageDto } from '../../shared/schemas/outbox'

/** A message the in-process SMTP sink received (development and tests). */
export class OutboxMessage extends Model<InferAttributes<OutboxMessage>, InferCreationAttributes<OutboxMessage>> {
  declare id: CreationOptional<string>
  declare from: string
  declare to: string[]
  declare subject: string
  declare text: string
  declare html: string
  declare receivedAt: CreationOptional<Date>

  toDto(): OutboxMessageDto {
    return {
      id: this.id,
      from: this.from,
      to: this.to,
      subject: this.subject,
      text: this.text,
      html: this.html,
      receivedAt: this.receivedAt.toISOString(),
    }
  }

  static initModel(sequelize: Sequelize): void {
    OutboxMessage.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        from: { type: DataTypes.TEXT, allowNull: false },
        to: { type: DataTypes.ARRAY(DataTypes.TEXT), allowNull: false },
        subject: { type: DataTypes.TEXT, allowNull: false },
        text: { type: DataTypes.TEXT, allowNull: false },
        html: { type: DataTypes.TEXT, allowNull: false },
        receivedAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      },
      { sequelize, tableName: 'outbox_messages', underscored: true, timestamps: false },
    )
  }
}
