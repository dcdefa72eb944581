import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { StoredRiskReason } from '../../shared/domain/print-derived';
import type { ToneFlag } from '../../shared/domain/tone/status';
import type { PrintStatus, Process, ToneStatus } from '../../shared/domain/vocabulary';
import type { Asset } from './Asset';
import type { Location } from './Location';
import type { Negative } from './Negative';
import type { Paper } from './Paper';
import type { ProcessingStep } from './ProcessingStep';
import type { Source } from './Source';
import type {
  StoredAcquisition,
  StoredMark,
  StoredProvenanceLink,
  StoredRights,
} from '../../shared/types/registrar';
import type { User } from './User';

export class Print extends Model<InferAttributes<Print>, InferCreationAttributes<Print>> {
  declare id: CreationOptional<number>;
  declare accessionNumber: string;
  declare title: string;
  declare maker: string | null;
  declare madeOn: string | null;
  declare madeFrom: string | null;
  declare madeTo: string | null;
  declare process: Process;
  declare paperId: ForeignKey<Paper['id']> | null;
  declare negativeId: ForeignKey<Negative['id']> | null;
  declare locationId: ForeignKey<Location['id']> | null;
  declare imageWidthMm: number | null;
  declare imageHeightMm: number | null;
  declare sheetWidthMm: number | null;
  declare sheetHeightMm: number | null;
  declare edition: string | null;
  declare status: PrintStatus;
  declare description: string | null;
  declare tags: string[];
  /** Denormalised sums of the fixing and washing steps, for fast filtering. */
  declare fixingMinutes: number | null;
  declare washingMinutes: number | null;
  declare toneStatus: CreationOptional<ToneStatus>;
  declare nextCheckDue: CreationOptional<string | null>;
  declare hasProcessingRisk: boolean;
  /** The latest recto, whose thumbnail the list shows. */
  declare rectoAssetId: CreationOptional<number | null>;
  declare riskReasons: StoredRiskReason[];
  /** Tone watch (migration 0006): current baseline date, flags, urgency and rate. */
  declare toneBaselineOn: CreationOptional<string | null>;
  declare toneFlags: CreationOptional<ToneFlag[]>;
  declare toneUrgency: CreationOptional<number>;
  declare toneRatePerYear: CreationOptional<number | null>;
  /** The tone watch's small line (migration 0009); null until the print is evaluated again. */
  declare toneSparkline: CreationOptional<number[] | null>;
  /** The registrar's record (migration 0016). */
  declare sourceId: CreationOptional<ForeignKey<Source['id']> | null>;
  declare acquisition: CreationOptional<StoredAcquisition | null>;
  declare provenance: CreationOptional<StoredProvenanceLink[]>;
  declare rightsStatement: CreationOptional<string | null>;
  declare rights: CreationOptional<StoredRights | null>;
  declare marks: CreationOptional<StoredMark[]>;
  declare createdBy: ForeignKey<User['id']> | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare deletedAt: CreationOptional<Date | null>;

  declare paper?: NonAttribute<Paper | null>;
  declare negative?: NonAttribute<Negative | null>;
  declare location?: NonAttribute<Location | null>;
  declare processing?: NonAttribute<ProcessingStep[]>;
  declare assets?: NonAttribute<Asset[]>;
  declare source?: NonAttribute<Source | null>;

  static initModel(sequelize: Sequelize): void {
    Print.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        accessionNumber: { type: DataTypes.STRING(32), allowNull: false, unique: true },
        title: { type: DataTypes.TEXT, allowNull: false },
        maker: DataTypes.TEXT,
        madeOn: DataTypes.TEXT,
        madeFrom: DataTypes.DATEONLY,
        madeTo: DataTypes.DATEONLY,
        process: { type: DataTypes.STRING(40), allowNull: false },
        imageWidthMm: DataTypes.REAL,
        imageHeightMm: DataTypes.REAL,
        sheetWidthMm: DataTypes.REAL,
        sheetHeightMm: DataTypes.REAL,
        edition: DataTypes.TEXT,
        status: { type: DataTypes.STRING(20), allowNull: false },
        description: DataTypes.TEXT,
        tags: { type: DataTypes.JSON, allowNull: false, defaultValue: [] },
        fixingMinutes: DataTypes.REAL,
        washingMinutes: DataTypes.REAL,
        toneStatus: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'unchecked' },
        nextCheckDue: DataTypes.DATEONLY,
        hasProcessingRisk: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        riskReasons: { type: DataTypes.JSON, allowNull: false, defaultValue: [] },
        rectoAssetId: DataTypes.INTEGER,
        toneBaselineOn: DataTypes.DATEONLY,
        toneFlags: { type: DataTypes.JSON, allowNull: false, defaultValue: [] },
        toneUrgency: { type: DataTypes.REAL, allowNull: false, defaultValue: 0 },
        toneRatePerYear: DataTypes.REAL,
        toneSparkline: DataTypes.JSON,
        acquisition: DataTypes.JSON,
        provenance: { type: DataTypes.JSON, allowNull: false, defaultValue: [] },
        rightsStatement: DataTypes.STRING(80),
        rights: DataTypes.JSON,
        marks: { type: DataTypes.JSON, allowNull: false, defaultValue: [] },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
        deletedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'prints', paranoid: true },
    );
  }
}
