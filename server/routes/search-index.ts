import { Router } from 'express';
import type { AppContext } from '../context';
import { requireAbility } from '../middleware/authorize';

/** `/api/search-index`: the index's state, and a rebuild in the background (admin). */
export function searchIndexRouter(ctx: AppContext): Router {
  const router = Router();
  router.get('/', requireAbility('settings:read'), (_req, res) => {
    res.json(ctx.searchIndex.status());
  });
  router.post('/rebuild', requireAbility('settings:write'), (_req, res) => {
    // The current index keeps answering; progress shows on GET.
    void ctx.searchIndex.rebuild().catch(() => undefined);
    res.status(202).json(ctx.searchIndex.status());
  });
  return router;
}
