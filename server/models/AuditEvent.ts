import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { User } from './User';

/** Append-only: who changed what, when, with the record before and after. */
export class AuditEvent extends Model<
  InferAttributes<AuditEvent>,
  InferCreationAttributes<AuditEvent>
> {
  declare id: CreationOptional<number>;
  declare at: Date;
  declare userId: number | null;
  declare action: string;
  declare entity: string;
  declare entityId: number;
  declare before: unknown;
  declare after: unknown;
  declare user?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize): void {
    AuditEvent.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        at: { type: DataTypes.DATE, allowNull: false },
        userId: DataTypes.INTEGER,
        action: { type: DataTypes.STRING(40), allowNull: false },
        entity: { type: DataTypes.STRING(40), allowNull: false },
        entityId: { type: DataTypes.INTEGER, allowNull: false },
        before: DataTypes.JSON,
        after: DataTypes.JSON,
      },
      {
        sequelize,
        tableName: 'audit_events',
        timestamps: false,
        hooks: {
          beforeUpdate: () => {
            throw new Error('Audit events are append-only');
          },
          beforeDestroy: () => {
            throw new Error('Audit events are append-only');
          },
        },
      },
    );
  }
}
