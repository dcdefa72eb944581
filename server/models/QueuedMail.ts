import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

export type QueuedMailStatus = 'pending' | 'sent' | 'failed';

/** A message we mean to send: kept until delivered, retried with backoff, else failed. */
export class QueuedMail extends Model<
  InferAttributes<QueuedMail>,
  InferCreationAttributes<QueuedMail>
> {
  declare id: CreationOptional<number>;
  /** Comma-separated addresses. */
  declare recipients: string;
  declare subject: string;
  declare textBody: string;
  declare htmlBody: string;
  declare status: CreationOptional<QueuedMailStatus>;
  declare attempts: CreationOptional<number>;
  declare nextAttemptAt: Date;
  declare lastError: CreationOptional<string | null>;
  declare sentAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    QueuedMail.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        recipients: { type: DataTypes.TEXT, allowNull: false },
        subject: { type: DataTypes.TEXT, allowNull: false },
        textBody: { type: DataTypes.TEXT, allowNull: false },
        htmlBody: { type: DataTypes.TEXT, allowNull: false },
        status: { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'pending' },
        attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        nextAttemptAt: { type: DataTypes.DATE, allowNull: false },
        lastError: DataTypes.TEXT,
        sentAt: DataTypes.DATE,
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'mail_queue' },
    );
  }
}
