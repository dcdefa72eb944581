import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { NegativeKind } from '../../shared/domain/vocabulary';

export class Negative extends Model<InferAttributes<Negative>, InferCreationAttributes<Negative>> {
  declare id: CreationOptional<number>;
  declare code: string;
  declare kind: NegativeKind;
  declare format: string | null;
  declare subject: string | null;
  declare densityRange: number | null;
  declare notes: string | null;

  static initModel(sequelize: Sequelize): void {
    Negative.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        code: { type: DataTypes.STRING(40), allowNull: false, unique: true },
        kind: { type: DataTypes.STRING(40), allowNull: false },
        format: DataTypes.TEXT,
        subject: DataTypes.TEXT,
        densityRange: DataTypes.REAL,
        notes: DataTypes.TEXT,
      },
      { sequelize, tableName: 'negatives' },
    );
  }
}
