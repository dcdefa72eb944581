import { Router } from 'express';
import { IdParamsSchema } from '../../shared/schemas/common';
import { SavedSearchSchema, type SavedSearchCreate } from '../../shared/schemas/saved-search';
import { currentUser, requireAbility } from '../middleware/authorize';
import { problems } from '../middleware/problem';
import { parsed, validate } from '../middleware/validate';
import { SavedSearch } from '../models';
import { presentSavedSearch } from '../presenters/search';

/** `/api/saved-searches`: each user's own; another user's search is "not found". */
export function savedSearchesRouter(): Router {
  const router = Router();

  router.get('/', requireAbility('searches:save'), async (req, res) => {
    const searches = await SavedSearch.findAll({
      where: { userId: currentUser(req).id },
      order: [['name', 'ASC']],
    });
    res.json({ items: searches.map(presentSavedSearch) });
  });

  router.post(
    '/',
    requireAbility('searches:save'),
    validate(SavedSearchSchema),
    async (req, res) => {
      const input = parsed<SavedSearchCreate>(res);
      const search = await SavedSearch.create({ ...input, userId: currentUser(req).id });
      res.status(201).location(`/api/saved-searches/${search.id}`).json(presentSavedSearch(search));
    },
  );

  router.delete(
    '/:id',
    requireAbility('searches:save'),
    validate(IdParamsSchema, 'params'),
    async (req, res) => {
      const { id } = parsed<{ id: number }>(res, 'params');
      const removed = await SavedSearch.destroy({ where: { id, userId: currentUser(req).id } });
      if (!removed) throw problems.notFound('The saved search');
      res.status(204).end();
    },
  );

  return router;
}
