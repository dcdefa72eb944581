import type { AllSettings } from '../../../shared/domain/settings';
import type { SettingsPatch } from '../../../shared/schemas/settings';
import type { AppContext } from '../../context';
import { writeTransaction } from '../../db/write-transaction';
import type { User } from '../../models';
import { recordAudit } from '../audit';
import { refreshFixerRisk } from '../chemistry/fixer-risk';
import { updateSettings } from './settings-store';

/**
 * Changes settings in one write transaction with one audit event, then re-derives what
 * depends on the values that moved: the fixer capacity decides which prints break the
 * capacity rule (re-derived in the same transaction, so the answer already shows it), and
 * tone thresholds or check intervals re-evaluate every print's tone state in the background.
 */
export async function changeSettings(
  ctx: AppContext,
  user: User,
  patch: SettingsPatch,
): Promise<AllSettings> {
  const { after, changed } = await writeTransaction(ctx.sequelize, async (transaction) => {
    const result = await updateSettings(patch, transaction);
    if (result.changed.includes('chemistry.fixerCapacitySheetsPerLitre')) {
      await refreshFixerRisk('all', transaction);
    }
    if (result.changed.length > 0) {
      await recordAudit(
        {
          user,
          action: 'update',
          entity: 'settings',
          entityId: 1,
          before: result.before,
          after: result.after,
        },
        transaction,
      );
    }
    return result;
  });
  if (changed.some((key) => key.startsWith('tone.') || key.startsWith('schedule.'))) {
    await ctx.toneReevaluation.request();
  }
  return after;
}
