import { Router } from 'express';
import { IdParamsSchema } from '../../shared/schemas/common';
import {
  ChecklistSchema,
  ChecklistUpdateSchema,
  type ChecklistCreate,
  type ChecklistUpdate,
} from '../../shared/schemas/saved-search';
import type { AppContext } from '../context';
import { currentUser, requireAbility } from '../middleware/authorize';
import { parsed, validate } from '../middleware/validate';
import { presentChecklist, presentChecklistSummary } from '../presenters/search';
import {
  asSeenBy,
  createChecklist,
  deleteChecklist,
  findChecklist,
  listChecklists,
  updateChecklist,
} from '../services/checklists/checklists';
import { checklistItemsOf, listItemsOf } from '../services/prints/list-prints';
import { writeCsv } from './prints';

type Params = { id: number };

const withItems = async (checklist: Awaited<ReturnType<typeof findChecklist>>) =>
  presentChecklist(checklist, await checklistItemsOf(checklist.printIds));

/** `/api/checklists`: named, ordered lists of prints shared by curators and above. */
export function checklistsRouter(ctx: AppContext): Router {
  const router = Router();
  const may = requireAbility('searches:save');
  const params = validate(IdParamsSchema, 'params');

  router.get('/', may, async (req, res) => {
    const checklists = await listChecklists(currentUser(req).role);
    res.json({ items: checklists.map(presentChecklistSummary) });
  });

  router.post('/', may, validate(ChecklistSchema), async (req, res) => {
    const input = parsed<ChecklistCreate>(res);
    const checklist = await createChecklist(ctx, input, currentUser(req).id);
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
      await writeCsv(res, ctx.sequelize, async (onPage) => {
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
    const checklist = await updateChecklist(ctx, parsed<Params>(res, 'params').id, input);
    res.json(await withItems(await asSeenBy(currentUser(req).role, checklist)));
  });

  router.delete('/:id', may, params, async (_req, res) => {
    await deleteChecklist(parsed<Params>(res, 'params').id);
    res.status(204).end();
  });

  return router;
}
