import {
  DataTypes,
  Model,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** The last running number handed out per accession year. */
export class AccessionCounter extends Model<
  InferAttributes<AccessionCounter>,
  InferCreationAttributes<AccessionCounter>
> {
  declare year: number;
  declare last: number;

  static initModel(sequelize: Sequelize): void {
    AccessionCounter.init(
      {
        year: { type: DataTypes.INTEGER, primaryKey: true },
        last: { type: DataTypes.INTEGER, allowNull: false },
      },
      { sequelize, tableName: 'accession_counters', timestamps: false },
    );
  }
}
