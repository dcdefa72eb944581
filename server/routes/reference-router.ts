import { Router } from 'express';
import type { z } from 'zod';
import type { Ability } from '../../shared/domain/roles';
import { IdParamsSchema } from '../../shared/schemas/common';
import type { AppContext } from '../context';
import { currentUser, requireAbility } from '../middleware/authorize';
import { problems } from '../middleware/problem';
import { parsed, validate } from '../middleware/validate';
import type { DbTransaction as Transaction } from '../db/types';
import { writeTransaction } from '../db/write-transaction';
import { noteLinkedPrintsChanged, type LinkedKind } from '../services/prints/linked-prints';
import { recordAudit } from '../services/audit';
import type { ReferenceStore } from '../services/reference/reference-stores';

/** A list the catalogue links to (papers, negatives, places, batches) and how to show it. */
export interface ReferenceResource<M, View> {
  entity: string;
  label: string;
  store: ReferenceStore<M>;
  createSchema: z.ZodType;
  updateSchema: z.ZodType;
  readAbility: Ability;
  present: (records: M[], transaction?: Transaction) => Promise<View[]>;
  /** After a committed change: prints whose search words hold this record are re-read. */
  /** Prints show this record (its words, its rules): they are noted as changed with it. */
  shownOnPrints?: LinkedKind;
  /** Checks that need the database, such as refusing a place inside itself. */
  check?: (
    input: Record<string, unknown>,
    id: number | null,
    transaction: Transaction,
  ) => Promise<void>;
  /** Work that follows a change of a record, in the same transaction (derived fields). */
  afterChangeInTransaction?: (id: number, transaction: Transaction) => Promise<void>;
}

/** GET list, POST, PATCH /:id and DELETE /:id with roles, validation and audit. */
export function referenceRouter<M, View>(
  ctx: AppContext,
  resource: ReferenceResource<M, View>,
): Router {
  const router = Router();
  const { store, entity } = resource;
  const presentOne = async (record: M, transaction?: Transaction) =>
    (await resource.present([record], transaction))[0];

  const noteShown = (id: number, transaction: Transaction) =>
    resource.shownOnPrints
      ? noteLinkedPrintsChanged(ctx.sequelize, resource.shownOnPrints, id, transaction)
      : Promise.resolve();
  const find = async (id: number, transaction: Transaction) => {
    const record = await store.find(id, transaction);
    if (!record) throw problems.notFound(`The ${resource.label}`);
    return record;
  };

  router.get('/', requireAbility(resource.readAbility), async (_req, res) => {
    const records = await store.list();
    res.json({ items: await resource.present(records) });
  });

  router.post(
    '/',
    requireAbility('reference:write'),
    validate(resource.createSchema),
    async (req, res) => {
      const input = parsed<Record<string, unknown>>(res);
      const view = await writeTransaction(ctx.sequelize, async (transaction) => {
        await resource.check?.(input, null, transaction);
        const record = await store.create(input, transaction);
        const after = await presentOne(record, transaction);
        const entityId = store.idOf(record);
        await recordAudit(
          { user: currentUser(req), action: 'create', entity, entityId, after },
          transaction,
        );
        return after;
      });
      res.status(201).json(view);
    },
  );

  router.patch(
    '/:id',
    requireAbility('reference:write'),
    validate(IdParamsSchema, 'params'),
    validate(resource.updateSchema),
    async (req, res) => {
      const { id } = parsed<{ id: number }>(res, 'params');
      const input = parsed<Record<string, unknown>>(res);
      const view = await writeTransaction(ctx.sequelize, async (transaction) => {
        const record = await find(id, transaction);
        const before = await presentOne(record, transaction);
        await resource.check?.(input, id, transaction);
        await store.update(record, input, transaction);
        await resource.afterChangeInTransaction?.(id, transaction);
        await noteShown(id, transaction);
        const after = await presentOne(record, transaction);
        const user = currentUser(req);
        await recordAudit(
          { user, action: 'update', entity, entityId: id, before, after },
          transaction,
        );
        return after;
      });
      res.json(view);
    },
  );

  router.delete(
    '/:id',
    requireAbility('reference:write'),
    validate(IdParamsSchema, 'params'),
    async (req, res) => {
      const { id } = parsed<{ id: number }>(res, 'params');
      await writeTransaction(ctx.sequelize, async (transaction) => {
        const record = await find(id, transaction);
        const before = await presentOne(record, transaction);
        await noteShown(id, transaction);
        await store.destroy(record, transaction);
        await recordAudit(
          { user: currentUser(req), action: 'delete', entity, entityId: id, before },
          transaction,
        );
      });
      res.status(204).end();
    },
  );

  return router;
}
