import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { User } from './User';

/** A named, ordered list of prints: an exhibition or a loan. */
export class Checklist extends Model<
  InferAttributes<Checklist>,
  InferCreationAttributes<Checklist>
> {
  declare id: CreationOptional<number>;
  declare createdBy: ForeignKey<User['id']>;
  declare name: string;
  declare printIds: number[];
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Checklist.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        printIds: { type: DataTypes.JSON, allowNull: false, defaultValue: [] },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'checklists' },
    );
  }
}
