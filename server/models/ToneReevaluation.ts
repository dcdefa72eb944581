import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** The collection-wide tone re-evaluation: one row, the latest run (services/tone). */
export class ToneReevaluation extends Model<
  InferAttributes<ToneReevaluation>,
  InferCreationAttributes<ToneReevaluation>
> {
  declare id: number;
  declare status: 'running' | 'done' | 'failed' | 'stopped';
  declare done: number;
  declare total: number;
  declare afterId: number;
  declare again: boolean;
  declare runs: number;
  declare startedAt: Date;
  declare finishedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    ToneReevaluation.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true },
        status: { type: DataTypes.STRING(20), allowNull: false },
        done: { type: DataTypes.INTEGER, allowNull: false },
        total: { type: DataTypes.INTEGER, allowNull: false },
        afterId: { type: DataTypes.INTEGER, allowNull: false },
        again: { type: DataTypes.BOOLEAN, allowNull: false },
        runs: { type: DataTypes.INTEGER, allowNull: false },
        startedAt: { type: DataTypes.DATE, allowNull: false },
        finishedAt: DataTypes.DATE,
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'tone_reevaluations' },
    );
  }
}
