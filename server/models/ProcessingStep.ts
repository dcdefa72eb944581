import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { Stage } from '../../shared/domain/vocabulary';
import type { Print } from './Print';
import type { SolutionBatch } from './SolutionBatch';

/** One step of a print's making, in order (position 1 is first). */
export class ProcessingStep extends Model<
  InferAttributes<ProcessingStep>,
  InferCreationAttributes<ProcessingStep>
> {
  declare id: CreationOptional<number>;
  declare printId: ForeignKey<Print['id']>;
  declare position: number;
  declare stage: Stage;
  declare chemical: string | null;
  declare concentrationPercent: number | null;
  declare solutionBatchId: ForeignKey<SolutionBatch['id']> | null;
  declare method: string | null;
  declare coats: number | null;
  declare minutes: number | null;
  declare temperatureC: number | null;
  declare lightSource: string | null;
  declare notes: string | null;

  declare solutionBatch?: NonAttribute<SolutionBatch | null>;

  static initModel(sequelize: Sequelize): void {
    ProcessingStep.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        position: { type: DataTypes.INTEGER, allowNull: false },
        stage: { type: DataTypes.STRING(20), allowNull: false },
        chemical: DataTypes.TEXT,
        concentrationPercent: DataTypes.REAL,
        method: DataTypes.TEXT,
        coats: DataTypes.INTEGER,
        minutes: DataTypes.REAL,
        temperatureC: { type: DataTypes.REAL, field: 'temperature_c' },
        lightSource: DataTypes.TEXT,
        notes: DataTypes.TEXT,
      },
      { sequelize, tableName: 'processing_steps', timestamps: false },
    );
  }
}
