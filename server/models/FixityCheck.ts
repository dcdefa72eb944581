import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** One run of re-hashing every stored original against its recorded SHA-256. */
export class FixityCheck extends Model<
  InferAttributes<FixityCheck>,
  InferCreationAttributes<FixityCheck>
> {
  declare id: CreationOptional<number>;
  declare status: 'running' | 'done' | 'failed';
  declare checked: number;
  declare total: number;
  declare mismatches: Array<{ assetId: number; expected: string; actual: string }>;
  declare missing: number[];
  declare startedBy: number | null;
  declare finishedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    FixityCheck.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        status: { type: DataTypes.STRING(20), allowNull: false },
        checked: { type: DataTypes.INTEGER, allowNull: false },
        total: { type: DataTypes.INTEGER, allowNull: false },
        mismatches: { type: DataTypes.JSON, allowNull: false },
        missing: { type: DataTypes.JSON, allowNull: false },
        startedBy: DataTypes.INTEGER,
        finishedAt: DataTypes.DATE,
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'fixity_checks' },
    );
  }
}
