import { Router, type Request } from 'express';
import { z } from 'zod';
import { DERIVATIVE_LONG_SIDE } from '../../shared/domain/asset-views';
import { iiifSizeCap } from '../../shared/domain/iiif-cap';
import { roleCan } from '../../shared/domain/roles';
import { IdParamsSchema } from '../../shared/schemas/common';
import type { AppContext } from '../context';
import { currentUser, requireAbility } from '../middleware/authorize';
import { problems } from '../middleware/problem';
import { parsed, validate } from '../middleware/validate';
import { findVisibleAsset, type VisibleAsset } from '../services/assets/find-visible-asset';
import { imageInfo, tileFile } from '../services/images/iiif-service';

const YEAR_SECONDS = 365 * 24 * 3600;
const TileParamsSchema = IdParamsSchema.extend({
  region: z.string().max(40),
  size: z.string().max(20),
  rotation: z.string().max(8),
  file: z.string().max(20),
});

/** The absolute origin of this server as the client reached it. */
export function originOf(req: Request): string {
  return `${req.protocol}://${req.get('host')}`;
}

/** The long-side cap for the caller: web size unless the role may see originals. */
function longSideFor(req: Request): number | null {
  return roleCan(currentUser(req).role, 'originals:read') ? null : DERIVATIVE_LONG_SIDE.web;
}

/** `/api/iiif/:id`: a level-0 IIIF Image API 3.0 service per image. */
export function iiifRouter(ctx: AppContext): Router {
  const router = Router();
  const { derivatives, jobs } = ctx.images;

  async function readyAsset(id: number, req: Request): Promise<VisibleAsset> {
    const asset = await findVisibleAsset(id, currentUser(req).role);
    if (!derivatives.has(asset.sha256, 'tiles')) await jobs.enqueue(asset.sha256);
    return asset;
  }

  router.get(
    '/:id',
    requireAbility('catalogue:read'),
    validate(IdParamsSchema, 'params'),
    (req, res) =>
      res.redirect(303, `${req.baseUrl}/${parsed<{ id: number }>(res, 'params').id}/info.json`),
  );

  router.get(
    '/:id/info.json',
    requireAbility('catalogue:read'),
    validate(IdParamsSchema, 'params'),
    async (req, res) => {
      const { id } = parsed<{ id: number }>(res, 'params');
      const asset = await readyAsset(id, req);
      const info = await imageInfo(
        derivatives,
        asset.sha256,
        `${originOf(req)}/api/iiif/${id}`,
        longSideFor(req),
      );
      res
        .set('Cache-Control', 'private, no-cache')
        .type('application/ld+json;profile="http://iiif.io/api/image/3/context.json"')
        .send(JSON.stringify(info));
    },
  );

  router.get(
    '/:id/:region/:size/:rotation/:file',
    requireAbility('catalogue:read'),
    validate(TileParamsSchema, 'params'),
    async (req, res) => {
      const parts = parsed<z.infer<typeof TileParamsSchema>>(res, 'params');
      const asset = await readyAsset(parts.id, req);
      const tile = await tileFile(derivatives, asset.sha256, asset, parts);
      if (!tile) throw problems.notFound('That tile');
      const cap = iiifSizeCap(asset.width, asset.height, longSideFor(req));
      // The whole image at this tile's scale must fit the caller's cap.
      const fullWidthAtScale = (asset.width * tile.width) / tile.regionWidth;
      if (fullWidthAtScale > cap.maxWidth + 1) {
        throw problems.forbidden('Detail beyond the web size is for curators and above.');
      }
      res.set('Cache-Control', `private, max-age=${YEAR_SECONDS}, immutable`);
      res.set('ETag', `"${asset.sha256}-${parts.region}-${tile.width}"`);
      res.type('image/jpeg').sendFile(tile.path);
    },
  );

  return router;
}
