import { Router, type Response } from 'express';
import type { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import { roleCan } from '../../shared/domain/roles';
import type { AssetSize } from '../../shared/domain/asset-views';
import { IdParamsSchema } from '../../shared/schemas/common';
import {
  AssetSizeParamsSchema,
  SampleRegionSchema,
  type SampleRegionInput,
} from '../../shared/schemas/asset';
import type { AppContext } from '../context';
import { currentUser, requireAbility } from '../middleware/authorize';
import { HttpProblem, problems } from '../middleware/problem';
import { parsed, validate } from '../middleware/validate';
import { deleteAsset } from '../services/assets/delete-asset';
import { findVisibleAsset, type VisibleAsset } from '../services/assets/find-visible-asset';
import { sampleRegion } from '../services/images/sample-region';
import { parseRange } from '../services/storage/byte-range';

const YEAR_SECONDS = 365 * 24 * 3600;

/** A safe download name: the client's name reduced to plain characters, or the hash. */
function downloadName(asset: VisibleAsset): string {
  const base = (asset.originalName ?? '').replace(/[^\w.-]+/g, '_').slice(0, 120);
  return base || `${asset.sha256}.${asset.mediaType.split('/')[1]}`;
}

/** `/api/assets`: the files of an image, its colour samples, and removal. */
export function assetsRouter(ctx: AppContext): Router {
  const router = Router();
  const { storage, derivatives, jobs } = ctx.images;

  router.get(
    '/:id/:size',
    requireAbility('catalogue:read'),
    validate(AssetSizeParamsSchema, 'params'),
    async (req, res) => {
      const { id, size } = parsed<{ id: number; size: AssetSize }>(res, 'params');
      if (size === 'original' && !roleCan(currentUser(req).role, 'originals:read')) {
        throw problems.forbidden('Originals are for curators and above.');
      }
      const asset = await findVisibleAsset(id, currentUser(req).role);
      const etag = `"${asset.sha256}-${size}"`;
      res.set('ETag', etag);
      if (req.get('if-none-match') === etag) return void res.status(304).end();
      if (size === 'original') return sendOriginal(res, asset, req.get('range'));
      if (!derivatives.has(asset.sha256, size)) await jobs.enqueue(asset.sha256);
      res.set('Cache-Control', `private, max-age=${YEAR_SECONDS}, immutable`);
      res.type('image/jpeg').sendFile(derivatives.fileOf(asset.sha256, size));
    },
  );

  async function sendOriginal(res: Response, asset: VisibleAsset, rangeHeader?: string) {
    const stored = await storage.stat(asset.storageKey);
    if (!stored) throw new HttpProblem(410, 'Gone', 'The stored original is missing.');
    res.set({
      'Cache-Control': 'private, no-cache',
      'Accept-Ranges': 'bytes',
      'X-Content-Type-Options': 'nosniff',
    });
    // attachment() guesses a type from the name; the stored type comes from the content.
    res.attachment(downloadName(asset)).type(asset.mediaType);
    const range = parseRange(rangeHeader, stored.bytes);
    if (range === 'unsatisfiable') {
      res.set('Content-Range', `bytes */${stored.bytes}`);
      throw new HttpProblem(416, 'Range not satisfiable', 'The range lies outside the file.');
    }
    let body: Readable;
    if (range) {
      res.status(206).set('Content-Range', `bytes ${range.start}-${range.end}/${stored.bytes}`);
      res.set('Content-Length', String(range.end - range.start + 1));
      body = await storage.getRange(asset.storageKey, range.start, range.end);
    } else {
      res.set('Content-Length', String(stored.bytes));
      body = await storage.get(asset.storageKey);
    }
    await pipeline(body, res).catch((error: NodeJS.ErrnoException) => {
      // A client that stops reading (a viewer closing, a range probe) is not our error.
      if (error.code !== 'ERR_STREAM_PREMATURE_CLOSE') throw error;
    });
  }

  router.post(
    '/:id/samples',
    requireAbility('samples:write'),
    validate(IdParamsSchema, 'params'),
    validate(SampleRegionSchema),
    async (req, res) => {
      const { id } = parsed<{ id: number }>(res, 'params');
      const asset = await findVisibleAsset(id, currentUser(req).role);
      const region = parsed<SampleRegionInput>(res);
      res.json(await sampleRegion(storage, asset, region));
    },
  );

  router.delete(
    '/:id',
    requireAbility('prints:write'),
    validate(IdParamsSchema, 'params'),
    async (req, res) => {
      const { id } = parsed<{ id: number }>(res, 'params');
      await deleteAsset({ ...ctx, user: currentUser(req) }, id);
      res.status(204).end();
    },
  );

  return router;
}
