import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { BatchKind } from '../../shared/domain/vocabulary';

/** One mixed solution (salting bath, sensitiser, fixer …), so steps can name what they used. */
export class SolutionBatch extends Model<
  InferAttributes<SolutionBatch>,
  InferCreationAttributes<SolutionBatch>
> {
  declare id: CreationOptional<number>;
  declare code: string;
  declare kind: BatchKind;
  declare chemical: string;
  declare concentrationPercent: number | null;
  declare volumeMl: number | null;
  declare madeOn: string | null;
  declare madeBy: string | null;
  declare notes: string | null;
  declare exhaustedOn: string | null;

  static initModel(sequelize: Sequelize): void {
    SolutionBatch.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        code: { type: DataTypes.STRING(40), allowNull: false, unique: true },
        kind: { type: DataTypes.STRING(40), allowNull: false },
        chemical: { type: DataTypes.TEXT, allowNull: false },
        concentrationPercent: DataTypes.REAL,
        volumeMl: DataTypes.REAL,
        madeOn: DataTypes.DATEONLY,
        madeBy: DataTypes.TEXT,
        notes: DataTypes.TEXT,
        exhaustedOn: DataTypes.DATEONLY,
      },
      { sequelize, tableName: 'solution_batches' },
    );
  }
}
