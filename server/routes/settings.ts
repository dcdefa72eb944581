import { Router } from 'express';
import { SETTING_SOURCES } from '../../shared/domain/tone/settings';
import { SettingsPatchSchema, type SettingsPatch } from '../../shared/schemas/tone';
import type { SettingsResponse } from '../../shared/types/tone';
import type { AppContext } from '../context';
import { writeTransaction } from '../db/write-transaction';
import { currentUser, requireAbility } from '../middleware/authorize';
import { parsed, validate } from '../middleware/validate';
import { recordAudit } from '../services/audit';
import { loadToneSettings, saveToneSettings } from '../services/tone/settings-store';

/** `/api/settings`: thresholds and check intervals; a change re-evaluates every print. */
export function settingsRouter(ctx: AppContext): Router {
  const router = Router();
  const respond = async (): Promise<SettingsResponse> => ({
    ...(await loadToneSettings()),
    sources: SETTING_SOURCES,
    reevaluation: ctx.toneReevaluation.progress,
  });
  router.get('/', requireAbility('settings:read'), async (_req, res) => {
    res.json(await respond());
  });
  router.patch(
    '/',
    requireAbility('settings:write'),
    validate(SettingsPatchSchema),
    async (req, res) => {
      const user = currentUser(req);
      await writeTransaction(ctx.sequelize, async (transaction) => {
        const { before, after } = await saveToneSettings(parsed<SettingsPatch>(res), transaction);
        await recordAudit(
          { user, action: 'update', entity: 'settings', entityId: 1, before, after },
          transaction,
        );
      });
      ctx.toneReevaluation.start();
      res.json(await respond());
    },
  );
  return router;
}
