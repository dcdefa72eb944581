import { Router } from 'express';
import { SettingsPatchSchema, type SettingsPatch } from '../../shared/schemas/settings';
import type { AppContext } from '../context';
import { currentUser, requireAbility } from '../middleware/authorize';
import { parsed, validate } from '../middleware/validate';
import { presentSettings } from '../presenters/settings';
import { changeSettings } from '../services/settings/change-settings';
import { loadSettings } from '../services/settings/settings-store';

/** `/api/settings`: the one settings store (tone watch, check intervals, chemistry). */
export function settingsRouter(ctx: AppContext): Router {
  const router = Router();
  router.get('/', requireAbility('settings:read'), async (_req, res) => {
    res.json(presentSettings(await loadSettings(), await ctx.toneReevaluation.progress()));
  });
  router.patch(
    '/',
    requireAbility('settings:write'),
    validate(SettingsPatchSchema),
    async (req, res) => {
      const after = await changeSettings(ctx, currentUser(req), parsed<SettingsPatch>(res));
      res.json(presentSettings(after, await ctx.toneReevaluation.progress()));
    },
  );
  return router;
}
