import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** A place in the store: room > cabinet > drawer or box, nested through parentId. */
export class Location extends Model<InferAttributes<Location>, InferCreationAttributes<Location>> {
  declare id: CreationOptional<number>;
  declare code: string;
  declare name: string;
  declare parentId: number | null;
  declare notes: string | null;

  static initModel(sequelize: Sequelize): void {
    Location.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        code: { type: DataTypes.STRING(40), allowNull: false, unique: true },
        name: { type: DataTypes.TEXT, allowNull: false },
        parentId: { type: DataTypes.INTEGER, allowNull: true },
        notes: DataTypes.TEXT,
      },
      { sequelize, tableName: 'locations' },
    );
  }
}
