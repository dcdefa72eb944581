import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { AssetStatus, AssetView, FixityResult } from '../../shared/domain/asset-views';
import type { CaptureMetadata } from '../../shared/types/asset';
import type { Print } from './Print';
import type { User } from './User';

/** An uploaded image of a print. Its original is stored once per SHA-256. */
export class Asset extends Model<InferAttributes<Asset>, InferCreationAttributes<Asset>> {
  declare id: CreationOptional<number>;
  declare printId: ForeignKey<Print['id']>;
  declare view: AssetView;
  declare originalName: string | null;
  declare mediaType: string;
  declare bytes: number;
  declare sha256: string;
  declare storageKey: string;
  declare width: number;
  declare height: number;
  declare bitDepth: number;
  declare channels: number;
  /** Whether the original embeds an ICC profile (then derivatives convert through it). */
  declare hasProfile: boolean;
  declare exif: CaptureMetadata;
  declare status: AssetStatus;
  declare progress: number;
  declare error: CreationOptional<string | null>;
  declare lastFixityAt: CreationOptional<Date | null>;
  declare lastFixityResult: CreationOptional<FixityResult | null>;
  declare uploadedBy: ForeignKey<User['id']> | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Asset.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        view: { type: DataTypes.STRING(20), allowNull: false },
        originalName: DataTypes.TEXT,
        mediaType: { type: DataTypes.STRING(40), allowNull: false },
        bytes: { type: DataTypes.INTEGER, allowNull: false },
        sha256: { type: DataTypes.STRING(64), allowNull: false },
        storageKey: { type: DataTypes.TEXT, allowNull: false },
        width: { type: DataTypes.INTEGER, allowNull: false },
        height: { type: DataTypes.INTEGER, allowNull: false },
        bitDepth: { type: DataTypes.INTEGER, allowNull: false },
        channels: { type: DataTypes.INTEGER, allowNull: false },
        hasProfile: { type: DataTypes.BOOLEAN, allowNull: false },
        exif: { type: DataTypes.JSON, allowNull: false },
        status: { type: DataTypes.STRING(20), allowNull: false },
        progress: { type: DataTypes.INTEGER, allowNull: false },
        error: DataTypes.TEXT,
        lastFixityAt: DataTypes.DATE,
        lastFixityResult: DataTypes.STRING(20),
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'assets' },
    );
  }
}
