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

/** A search a user named and kept: the query string of `GET /api/prints`. Private. */
export class SavedSearch extends Model<
  InferAttributes<SavedSearch>,
  InferCreationAttributes<SavedSearch>
> {
  declare id: CreationOptional<number>;
  declare userId: ForeignKey<User['id']>;
  declare name: string;
  declare query: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    SavedSearch.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        query: { type: DataTypes.TEXT, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'saved_searches' },
    );
  }
}
