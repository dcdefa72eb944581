import { Router } from 'express';
import { IdParamsSchema } from '../../shared/schemas/common';
import { SavedSearchSchema, type SavedSearchCreate } from '../../shared/schemas/saved-search';
import { currentUser, requireAbility } from '../middleware/authorize';
import { parsed, validate } from '../middleware/validate';
import { presentSavedSearch } from '../presenters/search';
import {
  createSavedSearch,
  deleteSavedSearch,
  listSavedSearches,
} from '../services/saved-searches';

/** `/api/saved-searches`: each user's own; another user's search is "not found". */
export function savedSearchesRouter(): Router {
  const router = Router();

  router.get('/', requireAbility('searches:save'), async (req, res) => {
    const searches = await listSavedSearches(currentUser(req).id);
    res.json({ items: searches.map(presentSavedSearch) });
  });

  router.post(
    '/',
    requireAbility('searches:save'),
    validate(SavedSearchSchema),
    async (req, res) => {
      const search = await createSavedSearch(parsed<SavedSearchCreate>(res), currentUser(req).id);
      res.status(201).location(`/api/saved-searches/${search.id}`).json(presentSavedSearch(search));
    },
  );

  router.delete(
    '/:id',
    requireAbility('searches:save'),
    validate(IdParamsSchema, 'params'),
    async (req, res) => {
      await deleteSavedSearch(parsed<{ id: number }>(res, 'params').id, currentUser(req).id);
      res.status(204).end();
    },
  );

  return router;
}
