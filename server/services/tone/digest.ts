import { Op } from 'sequelize';
import { addDays } from '../../../shared/domain/tone/dates';
import type { AppContext } from '../../context';
import { Print, User } from '../../models';
import { listEnvironmentAlerts } from '../environment/environment-alerts';
import { listAlerts, openOverdueAlerts } from './alerts';
import { buildDigest } from './digest-message';
import { readMarker, writeMarker } from './settings-store';

const LAST_SENT = 'digest.lastSentAt';

/**
 * Opens alerts for overdue checks, then e-mails every active conservator the alerts opened
 * since the last digest, the checks due within 30 days and the places that left their storage
 * band (issue 17). Returns how many it sent.
 */
export async function sendToneDigest(
  ctx: Pick<AppContext, 'sequelize' | 'mailer' | 'config'>,
  now = new Date(),
): Promise<{ sent: number; alerts: number; due: number; placeAlerts: number }> {
  const today = now.toISOString().slice(0, 10);
  await openOverdueAlerts(ctx.sequelize, today);
  const last = await readMarker(LAST_SENT);
  const alerts = (await listAlerts({ openedAfter: last ? new Date(last) : undefined })).filter(
    (alert) => !alert.acknowledgedAt,
  );
  const placeAlerts = (
    await listEnvironmentAlerts(ctx.sequelize, { openedAfter: last ? new Date(last) : undefined })
  ).filter((alert) => alert.acknowledged_at == null);
  const due = await Print.findAll({
    where: { nextCheckDue: { [Op.lte]: addDays(today, 30) } },
    attributes: ['accessionNumber', 'title', 'nextCheckDue', 'toneStatus'],
    order: [['nextCheckDue', 'ASC']],
  });
  const conservators = await User.findAll({ where: { role: 'conservator', active: true } });
  const message = buildDigest({
    today,
    alerts,
    placeAlerts: placeAlerts.map((a) => ({
      place: { code: a.code, name: a.name },
      reason: a.reason,
    })),
    due: due.map((p) => ({
      accessionNumber: p.accessionNumber,
      title: p.title,
      nextCheckDue: p.nextCheckDue!,
      status: p.toneStatus,
    })),
    appUrl: `http://localhost:${ctx.config.port}`,
  });
  for (const user of conservators) await ctx.mailer.send({ to: user.email, ...message });
  await writeMarker(LAST_SENT, now.toISOString());
  return {
    sent: conservators.length,
    alerts: alerts.length,
    due: due.length,
    placeAlerts: placeAlerts.length,
  };
}

/** Every Monday at 07:00 (server time), the weekly digest, once across instances. */
export function scheduleToneDigest(ctx: AppContext): Promise<void> {
  return ctx.jobs.every('tone-digest', '0 7 * * 1');
}
