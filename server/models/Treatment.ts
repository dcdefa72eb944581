import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { TreatmentImageStage } from '../../shared/domain/condition';
import type { User } from './User';

export interface StoredTreatmentImage {
  assetId: number;
  stage: TreatmentImageStage | null;
}

/** One conservation treatment of a print: what was done, with what, before and after. */
export class Treatment extends Model<
  InferAttributes<Treatment>,
  InferCreationAttributes<Treatment>
> {
  declare id: CreationOptional<number>;
  declare printId: number;
  declare treatedOn: string;
  declare treatedBy: number | null;
  declare action: string;
  declare materials: string | null;
  declare notes: string | null;
  declare images: StoredTreatmentImage[];
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare treater?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize): void {
    Treatment.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        printId: { type: DataTypes.INTEGER, allowNull: false },
        treatedOn: { type: DataTypes.DATEONLY, allowNull: false },
        treatedBy: DataTypes.INTEGER,
        action: { type: DataTypes.TEXT, allowNull: false },
        materials: DataTypes.TEXT,
        notes: DataTypes.TEXT,
        images: { type: DataTypes.JSON, allowNull: false, defaultValue: [] },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'treatments' },
    );
  }
}
