import { createHash } from 'node:crypto';
import type { Sequelize } from 'sequelize';
import type { ToneWatchQuery } from '../../../shared/schemas/tone';
import { writeGeneration } from '../../db/write-transaction';
import { Print } from '../../models';
import { toneWatchList } from './tone-watch';

export interface ToneWatchPage {
  /** The answer's JSON, encoded once. */
  body: Buffer;
  etag: string;
}

interface Kept extends ToneWatchPage {
  generation: number;
}

/** Pages kept per database; a handful of filter combinations is the usual working set. */
const MAX_KEPT = 50;
const kept = new WeakMap<Sequelize, Map<string, Kept>>();

/**
 * The tone watch's answer, encoded. The page changes only when data is written (every write
 * goes through `writeTransaction`, which moves the write generation) or the day turns (a
 * check falls overdue), so between those the same bytes are served: the profile showed
 * each request spending most of its time turning 100 items into JSON, then into bytes, then
 * hashing them for the ETag.
 */
export async function toneWatchPage(query: ToneWatchQuery): Promise<ToneWatchPage> {
  const sequelize = Print.sequelize!;
  // Taken before reading: a write that commits meanwhile leaves this entry already stale.
  const generation = writeGeneration(sequelize);
  const key = `${new Date().toISOString().slice(0, 10)}|${JSON.stringify(query)}`;
  let pages = kept.get(sequelize);
  if (!pages) kept.set(sequelize, (pages = new Map()));
  const known = pages.get(key);
  if (known && known.generation === generation) return known;
  const body = Buffer.from(JSON.stringify(await toneWatchList(query)));
  const etag = `W/"${body.length.toString(16)}-${createHash('sha1').update(body).digest('base64url')}"`;
  if (pages.size >= MAX_KEPT) pages.clear();
  const page = { body, etag, generation };
  pages.set(key, page);
  return page;
}
