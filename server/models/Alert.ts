import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { Print } from './Print';
import type { User } from './User';

/** Something a conservator should look at: a change of tone status or an overdue check. */
export class Alert extends Model<InferAttributes<Alert>, InferCreationAttributes<Alert>> {
  declare id: CreationOptional<number>;
  declare printId: number;
  declare kind: string;
  declare reason: string;
  declare openedAt: Date;
  declare acknowledgedAt: CreationOptional<Date | null>;
  declare acknowledgedBy: CreationOptional<number | null>;
  declare print?: NonAttribute<Print>;
  declare acknowledger?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize): void {
    Alert.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        printId: { type: DataTypes.INTEGER, allowNull: false },
        kind: { type: DataTypes.STRING(30), allowNull: false },
        reason: { type: DataTypes.TEXT, allowNull: false },
        openedAt: { type: DataTypes.DATE, allowNull: false },
        acknowledgedAt: DataTypes.DATE,
        acknowledgedBy: DataTypes.INTEGER,
      },
      { sequelize, tableName: 'alerts', timestamps: false },
    );
  }
}
