import type { Transaction } from 'sequelize';
import type { FixityResult } from '../../shared/domain/asset-views';
import { Asset, FixityCheck } from '../models';

/** The run still going, if any. */
export function findRunningFixityCheck() {
  return FixityCheck.findOne({ where: { status: 'running' } });
}

/** The latest runs, newest first. */
export function findRecentFixityChecks(limit: number) {
  return FixityCheck.findAll({ order: [['id', 'DESC']], limit });
}

export function findFixityCheckById(id: number) {
  return FixityCheck.findByPk(id);
}

export function insertFixityCheck(
  total: number,
  startedBy: number | null,
  transaction: Transaction,
) {
  return FixityCheck.create(
    { status: 'running', checked: 0, total, mismatches: [], missing: [], startedBy },
    { transaction },
  );
}

/** Saves a run's progress (its counts and JSON lists of mismatches and missing files). */
export async function saveFixityCheck(check: FixityCheck, transaction: Transaction): Promise<void> {
  await check.save({ transaction });
}

/** How many stored files there are (assets sharing a file count once). */
export function countStoredFiles(): Promise<number> {
  return Asset.count({ distinct: true, col: 'storage_key' });
}

/** Every asset's file and recorded hash, in id order. */
export function findAssetHashes() {
  return Asset.findAll({ attributes: ['id', 'sha256', 'storageKey'], order: [['id', 'ASC']] });
}

/** Records a file's result on every asset sharing it. */
export async function markAssetsChecked(
  storageKey: string,
  result: FixityResult,
  transaction: Transaction,
): Promise<void> {
  await Asset.update(
    { lastFixityAt: new Date(), lastFixityResult: result },
    { where: { storageKey }, transaction },
  );
}
