import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { ConditionGrade } from '../../shared/domain/condition';
import type { ImageArea, Observation } from '../../shared/schemas/condition';
import type { User } from './User';

/** An image attached to a condition report, with the area marked on it. */
export interface StoredReportImage {
  assetId: number;
  area: ImageArea | null;
  caption: string | null;
}

/** One examination of a print by eye: grade, what was seen and where, what to do. */
export class ConditionReport extends Model<
  InferAttributes<ConditionReport>,
  InferCreationAttributes<ConditionReport>
> {
  declare id: CreationOptional<number>;
  declare printId: number;
  declare reportedOn: string;
  declare reportedBy: number | null;
  declare grade: ConditionGrade | null;
  declare observations: Observation[];
  declare notes: string | null;
  declare recommendation: string | null;
  declare temperatureC: number | null;
  declare relativeHumidity: number | null;
  declare images: StoredReportImage[];
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare reporter?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize): void {
    ConditionReport.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        printId: { type: DataTypes.INTEGER, allowNull: false },
        reportedOn: { type: DataTypes.DATEONLY, allowNull: false },
        reportedBy: DataTypes.INTEGER,
        grade: DataTypes.STRING(20),
        observations: { type: DataTypes.JSON, allowNull: false, defaultValue: [] },
        notes: DataTypes.TEXT,
        recommendation: DataTypes.TEXT,
        temperatureC: DataTypes.REAL,
        relativeHumidity: DataTypes.REAL,
        images: { type: DataTypes.JSON, allowNull: false, defaultValue: [] },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'condition_reports' },
    );
  }
}
