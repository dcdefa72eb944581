import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

export class Paper extends Model<InferAttributes<Paper>, InferCreationAttributes<Paper>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare manufacturer: string | null;
  declare fibre: string | null;
  declare weightGsm: number | null;
  declare surface: string | null;
  declare sizing: string | null;
  declare notes: string | null;

  static initModel(sequelize: Sequelize): void {
    Paper.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        name: { type: DataTypes.STRING(120), allowNull: false, unique: true },
        manufacturer: DataTypes.TEXT,
        fibre: DataTypes.TEXT,
        weightGsm: DataTypes.REAL,
        surface: DataTypes.TEXT,
        sizing: DataTypes.TEXT,
        notes: DataTypes.TEXT,
      },
      { sequelize, tableName: 'papers' },
    );
  }
}
