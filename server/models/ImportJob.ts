import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { ImportFailure, ImportPreviewRow, ImportStatus } from '../../shared/types/imports';

/** A CSV import (or dry run) and its progress, kept so progress survives a page reload. */
export class ImportJob extends Model<
  InferAttributes<ImportJob>,
  InferCreationAttributes<ImportJob>
> {
  declare id: CreationOptional<number>;
  declare status: ImportStatus;
  declare dryRun: boolean;
  declare fileName: string | null;
  declare encoding: string | null;
  declare mapping: Record<string, string>;
  declare headers: string[];
  declare rows: CreationOptional<number>;
  declare processed: CreationOptional<number>;
  declare imported: CreationOptional<number>;
  declare updated: CreationOptional<number>;
  declare unchanged: CreationOptional<number>;
  declare failed: CreationOptional<ImportFailure[]>;
  declare preview: CreationOptional<ImportPreviewRow[]>;
  declare error: string | null;
  declare createdBy: number | null;
  declare finishedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    ImportJob.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        status: { type: DataTypes.STRING(20), allowNull: false },
        dryRun: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        fileName: DataTypes.TEXT,
        encoding: DataTypes.STRING(20),
        mapping: { type: DataTypes.JSON, allowNull: false },
        headers: { type: DataTypes.JSON, allowNull: false, defaultValue: [] },
        rows: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        processed: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        imported: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        updated: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        unchanged: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        failed: { type: DataTypes.JSON, allowNull: false, defaultValue: [] },
        preview: { type: DataTypes.JSON, allowNull: false, defaultValue: [] },
        error: DataTypes.TEXT,
        createdBy: DataTypes.INTEGER,
        finishedAt: DataTypes.DATE,
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'import_jobs' },
    );
  }
}
