import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** One stored setting (a JSON value under a key); absent keys take their defaults. */
export class Setting extends Model<InferAttributes<Setting>, InferCreationAttributes<Setting>> {
  declare key: string;
  declare value: unknown;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Setting.init(
      {
        key: { type: DataTypes.STRING(60), primaryKey: true },
        value: { type: DataTypes.JSON, allowNull: false },
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'settings', createdAt: false },
    );
  }
}
