import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** The last column mapping used for a spreadsheet with these headers, offered next time. */
export class ImportMapping extends Model<
  InferAttributes<ImportMapping>,
  InferCreationAttributes<ImportMapping>
> {
  declare id: CreationOptional<number>;
  declare headersKey: string;
  declare mapping: Record<string, string>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    ImportMapping.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        headersKey: { type: DataTypes.TEXT, allowNull: false, unique: true },
        mapping: { type: DataTypes.JSON, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'import_mappings' },
    );
  }
}
