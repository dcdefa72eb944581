import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** A message the built-in SMTP server received, parsed, for admins to read. */
export class OutboxMessage extends Model<
  InferAttributes<OutboxMessage>,
  InferCreationAttributes<OutboxMessage>
> {
  declare id: CreationOptional<number>;
  /** Comma-separated addresses. */
  declare recipients: string;
  declare sender: string;
  declare subject: string;
  declare textBody: string;
  declare htmlBody: string | null;
  declare sentAt: Date;

  static initModel(sequelize: Sequelize): void {
    OutboxMessage.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        recipients: { type: DataTypes.TEXT, allowNull: false },
        sender: { type: DataTypes.TEXT, allowNull: false },
        subject: { type: DataTypes.TEXT, allowNull: false },
        textBody: { type: DataTypes.TEXT, allowNull: false },
        htmlBody: DataTypes.TEXT,
        sentAt: { type: DataTypes.DATE, allowNull: false },
      },
      { sequelize, tableName: 'outbox_messages', timestamps: false },
    );
  }
}
