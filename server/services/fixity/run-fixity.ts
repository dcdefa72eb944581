import { createHash } from 'node:crypto';
import { pipeline } from 'node:stream/promises';
import type { Sequelize } from 'sequelize';
import type { FixityResult } from '../../../shared/domain/asset-views';
import { writeTransaction } from '../../db/write-transaction';
import type { Asset, FixityCheck } from '../../models';
import {
  countStoredFiles,
  findAssetHashes,
  findFixityCheckById,
  findRecentFixityChecks,
  findRunningFixityCheck,
  insertFixityCheck,
  markAssetsChecked,
  saveFixityCheck,
} from '../../repositories/fixity-repository';
import { problems } from '../../middleware/problem';
import type { BackgroundWork } from '../background';
import type { ObjectStorage } from '../storage/storage';

interface FixityContext {
  sequelize: Sequelize;
  storage: ObjectStorage;
  /** The server's background work: a run stops between files once shutdown begins. */
  background?: BackgroundWork;
}

/** SHA-256 of a stored object, streamed. */
async function hashStored(storage: ObjectStorage, key: string): Promise<string> {
  const hash = createHash('sha256');
  await pipeline(await storage.get(key), hash);
  return hash.digest('hex');
}

/** Records a new run with its total; the work is `runFixityCheck`. */
export async function startFixityCheck(
  ctx: FixityContext,
  startedBy: number | null,
): Promise<FixityCheck> {
  const total = await countStoredFiles();
  return writeTransaction(ctx.sequelize, (transaction) =>
    insertFixityCheck(total, startedBy, transaction),
  );
}

/**
 * Re-hashes every stored original once (assets sharing a file share the result) and
 * compares with the SHA-256 recorded at upload. Progress is saved after each file, so a
 * page polling the run sees it move; each asset keeps its last result. A run cut short by
 * shutdown ends as failed, so it never stays "running" and blocks the next one.
 */
export async function runFixityCheck(ctx: FixityContext, check: FixityCheck): Promise<FixityCheck> {
  const assets = await findAssetHashes();
  const byKey = new Map<string, Asset[]>();
  for (const asset of assets)
    byKey.set(asset.storageKey, [...(byKey.get(asset.storageKey) ?? []), asset]);
  check.total = byKey.size;
  let stopped = false;
  try {
    for (const [key, sharing] of byKey) {
      if (ctx.background?.stopping) {
        stopped = true;
        break;
      }
      const expected = sharing[0]!.sha256;
      let result: FixityResult = 'ok';
      if (!(await ctx.storage.stat(key))) {
        result = 'missing';
        check.missing = [...check.missing, ...sharing.map((asset) => asset.id)];
      } else {
        const actual = await hashStored(ctx.storage, key);
        if (actual !== expected) {
          result = 'mismatch';
          check.mismatches = [
            ...check.mismatches,
            ...sharing.map((asset) => ({ assetId: asset.id, expected, actual })),
          ];
        }
      }
      check.checked += 1;
      await writeTransaction(ctx.sequelize, async (transaction) => {
        await markAssetsChecked(key, result, transaction);
        await saveFixityCheck(check, transaction);
      });
    }
    check.status = stopped ? 'failed' : 'done';
  } catch (error) {
    check.status = 'failed';
    console.error('[fixity]', error);
  }
  check.finishedAt = new Date();
  await writeTransaction(ctx.sequelize, (transaction) => saveFixityCheck(check, transaction));
  return check;
}

/** The run still going, if any: a second start joins it instead of running twice. */
export function runningFixityCheck() {
  return findRunningFixityCheck();
}

/** The last ten runs, newest first. */
export function recentFixityChecks() {
  return findRecentFixityChecks(10);
}

export async function findFixityCheck(id: number): Promise<FixityCheck> {
  const check = await findFixityCheckById(id);
  if (!check) throw problems.notFound('The fixity check');
  return check;
}
