import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { Reading } from '../../shared/domain/tone/comparison';
import type { User } from './User';

/** One tone check of a print: the readings of its patches on one day. */
export class ToneCheck extends Model<
  InferAttributes<ToneCheck>,
  InferCreationAttributes<ToneCheck>
> {
  declare id: CreationOptional<number>;
  declare printId: number;
  declare checkedOn: string;
  declare checkedBy: number | null;
  declare method: string;
  declare instrument: string | null;
  declare illuminant: string;
  declare observer: string;
  declare baseline: boolean;
  declare notes: string | null;
  declare readings: Reading[];
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare checker?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize): void {
    ToneCheck.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        printId: { type: DataTypes.INTEGER, allowNull: false },
        checkedOn: { type: DataTypes.DATEONLY, allowNull: false },
        checkedBy: DataTypes.INTEGER,
        method: { type: DataTypes.STRING(40), allowNull: false },
        instrument: DataTypes.TEXT,
        illuminant: { type: DataTypes.STRING(10), allowNull: false },
        observer: { type: DataTypes.STRING(4), allowNull: false },
        baseline: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        notes: DataTypes.TEXT,
        readings: { type: DataTypes.JSON, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'tone_checks' },
    );
  }
}
