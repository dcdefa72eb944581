import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** One chemistry setting changed from its default; absent keys keep the default. */
export class ChemistrySetting extends Model<
  InferAttributes<ChemistrySetting>,
  InferCreationAttributes<ChemistrySetting>
> {
  declare key: string;
  declare value: number;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    ChemistrySetting.init(
      {
        key: { type: DataTypes.STRING(60), primaryKey: true },
        value: { type: DataTypes.REAL, allowNull: false },
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'chemistry_settings', underscored: true, createdAt: false },
    );
  }
}
