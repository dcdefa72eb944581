import { Router } from 'express';
import { Op, type Transaction } from 'sequelize';
import type { Role } from '../../shared/domain/roles';
import { IdParamsSchema } from '../../shared/schemas/common';
import {
  ChecklistSchema,
  ChecklistUpdateSchema,
  type ChecklistCreate,
  type ChecklistUpdate,
} from '../../shared/schemas/saved-search';
import type { AppContext } from '../context';
import { writeTransaction } from '../db/write-transaction';
import { currentUser, requireAbility } from '../middleware/authorize';
import { problems } from '../middleware/problem';
import { parsed, validate } from '../middleware/validate';
import { Checklist, Print } from '../models';
import { presentChecklist, presentChecklistSummary } from '../presenters/search';
import { mayListDeletedPrints } from '../policies/print';
import { checklistItemsOf, deletedPrintIds, listItemsOf } from '../services/prints/list-prints';
import { writeCsv } from './prints';

type Params = { id: number };

async function findChecklist(id: number, transaction?: Transaction): Promise<Checklist> {
  const checklist = await Checklist.findByPk(id, { transaction });
  if (!checklist) throw problems.notFound('The checklist');
  return checklist;
}

/** 422 naming the ids that are not prints (deleted prints may stay on a list). */
async function assertPrintsExist(ids: number[], transaction: Transaction): Promise<void> {
  const found = await Print.findAll({
    where: { id: { [Op.in]: ids } },
    attributes: ['id'],
    paranoid: false,
    transaction,
  });
  const known = new Set(found.map((print) => print.id));
  const missing = ids.filter((id) => !known.has(id));
  if (missing.length)
    throw problems.invalid([
      { path: 'printIds', message: `No print with id ${missing.join(', ')}` },
    ]);
}

/**
 * The checklists as the asker may read them: deleted prints stay on a list, but only roles
 * that see deleted prints find them there (in its ids, items and CSV).
 */
async function asSeenBy<T extends Checklist | Checklist[]>(role: Role, found: T): Promise<T> {
  if (mayListDeletedPrints(role)) return found;
  const lists: Checklist[] = Array.isArray(found) ? found : [found];
  const deleted = await deletedPrintIds(lists.flatMap((list) => list.printIds));
  for (const list of lists) list.printIds = list.printIds.filter((id: number) => !deleted.has(id));
  return found;
}

const withItems = async (checklist: Checklist) =>
  presentChecklist(checklist, await checklistItemsOf(checklist.printIds));

/** `/api/checklists`: named, ordered lists of prints shared by curators and above. */
export function checklistsRouter(ctx: AppContext): Router {
  const router = Router();
  const may = requireAbility('searches:save');
  const params = validate(IdParamsSchema, 'params');

  router.get('/', may, async (req, res) => {
    const checklists = await asSeenBy(
      currentUser(req).role,
      await Checklist.findAll({ order: [['updatedAt', 'DESC']] }),
    );
    res.json({ items: checklists.map(presentChecklistSummary) });
  });

  router.post('/', may, validate(ChecklistSchema), async (req, res) => {
    const input = parsed<ChecklistCreate>(res);
    const checklist = await writeTransaction(ctx.sequelize, async (transaction) => {
      await assertPrintsExist(input.printIds, transaction);
      return Checklist.create({ ...input, createdBy: currentUser(req).id }, { transaction });
    });
    res
      .status(201)
      .location(`/api/checklists/${checklist.id}`)
      .json(await withItems(await asSeenBy(currentUser(req).role, checklist)));
  });

  // Before `/:id`, which would otherwise read "3.csv" as an id.
  router.get(
    '/:id.csv',
    requireAbility('searches:save', 'exports:read'),
    params,
    async (req, res) => {
      const checklist = await asSeenBy(
        currentUser(req).role,
        await findChecklist(parsed<Params>(res, 'params').id),
      );
      const slug = checklist.name
        .toLowerCase()
        .replace(/[^a-z0-9]+/g, '-')
        .replace(/^-|-$/g, '');
      res.type('text/csv; charset=utf-8').attachment(`checklist-${slug || checklist.id}.csv`);
      await writeCsv(res, async (onPage) => {
        for (let start = 0; start < checklist.printIds.length; start += 500)
          await onPage(await listItemsOf(checklist.printIds.slice(start, start + 500)));
      });
    },
  );

  router.get('/:id', may, params, async (req, res) => {
    const checklist = await findChecklist(parsed<Params>(res, 'params').id);
    res.json(await withItems(await asSeenBy(currentUser(req).role, checklist)));
  });

  router.patch('/:id', may, params, validate(ChecklistUpdateSchema), async (req, res) => {
    const input = parsed<ChecklistUpdate>(res);
    const checklist = await writeTransaction(ctx.sequelize, async (transaction) => {
      const found = await findChecklist(parsed<Params>(res, 'params').id, transaction);
      if (input.printIds) await assertPrintsExist(input.printIds, transaction);
      return found.update(input, { transaction });
    });
    res.json(await withItems(await asSeenBy(currentUser(req).role, checklist)));
  });

  router.delete('/:id', may, params, async (_req, res) => {
    const checklist = await findChecklist(parsed<Params>(res, 'params').id);
    await checklist.destroy();
    res.status(204).end();
  });

  return router;
}
