import { Router, type Response } from 'express';
import { IdParamsSchema } from '../../shared/schemas/common';
import {
  PlaceLabelsQuerySchema,
  PrintLabelsQuerySchema,
  type PlaceLabelsQuery,
  type PrintLabelsQuery,
} from '../../shared/schemas/labels';
import type { AppContext } from '../context';
import { requireAbility } from '../middleware/authorize';
import { parsed, validate } from '../middleware/validate';
import { placeLabels, printLabels } from '../services/labels/labels';
import { linkOrigin } from '../services/people/link-origin';

const sendPdf = (res: Response, pdf: Buffer, name: string) =>
  res
    .type('application/pdf')
    .set('Content-Disposition', `inline; filename="${name.replace(/[^A-Za-z0-9.-]/g, '_')}.pdf"`)
    .send(pdf);

/** `GET /api/locations/:id/labels.pdf`: box, drawer and shelf labels (archivists, admins). */
export function placeLabelsRouter(ctx: AppContext): Router {
  return Router().get(
    '/:id/labels.pdf',
    requireAbility('labels:print'),
    validate(IdParamsSchema, 'params'),
    validate(PlaceLabelsQuerySchema, 'query'),
    async (req, res) => {
      const { id } = parsed<{ id: number }>(res, 'params');
      const query = parsed<PlaceLabelsQuery>(res, 'query');
      // QR codes open PUBLIC_URL's pages, or (outside production) the request's origin.
      const { pdf, code } = await placeLabels(id, query, linkOrigin(ctx, req));
      sendPdf(res, pdf, `labels-${code}`);
    },
  );
}

/** `GET /api/prints/labels.pdf?ids=…`: folder labels (archivists, admins). */
export function printLabelsRouter(ctx: AppContext): Router {
  return Router().get(
    '/labels.pdf',
    requireAbility('labels:print'),
    validate(PrintLabelsQuerySchema, 'query'),
    async (req, res) => {
      const query = parsed<PrintLabelsQuery>(res, 'query');
      sendPdf(res, await printLabels(ctx, query, linkOrigin(ctx, req)), 'folder-labels');
    },
  );
}
