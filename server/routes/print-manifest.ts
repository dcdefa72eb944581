import { Router } from 'express';
import { IdParamsSchema } from '../../shared/schemas/common';
import { requireAbility } from '../middleware/authorize';
import { parsed, validate } from '../middleware/validate';
import { presentManifest } from '../presenters/manifest';
import { printForManifest } from '../services/exports/linked-data';
import { originOf } from './iiif';

/** `/api/prints/:id/manifest.json`: the print's images for any IIIF viewer. */
export function printManifestRouter(): Router {
  return Router({ mergeParams: true }).get(
    '/',
    requireAbility('catalogue:read'),
    validate(IdParamsSchema, 'params'),
    async (req, res) => {
      const { id } = parsed<{ id: number }>(res, 'params');
      const { print, assets } = await printForManifest(id);
      res
        .set('Cache-Control', 'private, no-cache')
        .type('application/ld+json;profile="http://iiif.io/api/presentation/3/context.json"')
        .send(JSON.stringify(presentManifest(originOf(req), print, assets)));
    },
  );
}
