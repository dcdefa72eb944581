import { Router, type Request } from 'express';
import { IdParamsSchema } from '../../shared/schemas/common';
import { SourceSchema, SourceUpdateSchema } from '../../shared/schemas/registrar';
import type { AppContext } from '../context';
import { currentUser, requireAbility } from '../middleware/authorize';
import { parsed, validate } from '../middleware/validate';
import { presentSource } from '../presenters/registrar';
import {
  createSource,
  sourceList,
  sourceRecord,
  updateSource,
  type SourceFields,
  type SourceRecord,
} from '../services/registrar/sources';

type Params = { id: number };

/** `/api/sources`: donors, sellers and lenders (contract; contacts archivist+ only). */
export function sourcesRouter(ctx: AppContext): Router {
  const router = Router();
  const present = (req: Request, { source, prints }: SourceRecord) =>
    presentSource(source, prints, currentUser(req).role);

  router.get('/', requireAbility('sources:read'), async (req, res) => {
    const records = await sourceList(ctx.sequelize);
    res.json({ items: records.map((record) => present(req, record)) });
  });

  router.post('/', requireAbility('sources:write'), validate(SourceSchema), async (req, res) => {
    const record = await createSource(ctx.sequelize, currentUser(req), parsed<SourceFields>(res));
    res.status(201).location(`/api/sources/${record.source.id}`).json(present(req, record));
  });

  router.get(
    '/:id',
    requireAbility('sources:read'),
    validate(IdParamsSchema, 'params'),
    async (req, res) => {
      const { id } = parsed<Params>(res, 'params');
      res.json(present(req, await sourceRecord(ctx.sequelize, id)));
    },
  );

  router.patch(
    '/:id',
    requireAbility('sources:write'),
    validate(IdParamsSchema, 'params'),
    validate(SourceUpdateSchema),
    async (req, res) => {
      const { id } = parsed<Params>(res, 'params');
      const input = parsed<Partial<SourceFields>>(res);
      res.json(present(req, await updateSource(ctx.sequelize, currentUser(req), id, input)));
    },
  );

  return router;
}
