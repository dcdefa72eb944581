import { Op, QueryTypes, type Sequelize } from 'sequelize';
import type { AlertView } from '../../../shared/types/tone';
import { writeTransaction } from '../../db/write-transaction';
import { problems } from '../../middleware/problem';
import { Alert, Print, User } from '../../models';

const LIST_LIMIT = 500;

function presentAlert(alert: Alert): AlertView {
  return {
    id: alert.id,
    print: {
      id: alert.print!.id,
      accessionNumber: alert.print!.accessionNumber,
      title: alert.print!.title,
    },
    kind: alert.kind,
    reason: alert.reason,
    openedAt: alert.openedAt.toISOString(),
    acknowledgedAt: alert.acknowledgedAt ? alert.acknowledgedAt.toISOString() : null,
    acknowledgedBy: alert.acknowledger
      ? { id: alert.acknowledger.id, email: alert.acknowledger.email }
      : null,
  };
}

const include = [
  { model: Print, as: 'print', attributes: ['id', 'accessionNumber', 'title'] },
  { model: User, as: 'acknowledger', attributes: ['id', 'email'] },
];

/** Alerts of live prints: unacknowledged first, newest first within each. */
export async function listAlerts(options: { openedAfter?: Date } = {}): Promise<AlertView[]> {
  const alerts = await Alert.findAll({
    where: options.openedAfter ? { openedAt: { [Op.gt]: options.openedAfter } } : {},
    include,
    order: [
      [Alert.sequelize!.literal('acknowledged_at IS NOT NULL'), 'ASC'],
      ['openedAt', 'DESC'],
      ['id', 'DESC'],
    ],
    limit: LIST_LIMIT,
  });
  return alerts.map(presentAlert);
}

/** Marks an alert seen by the user; acknowledging twice keeps the first. */
export function acknowledgeAlert(sequelize: Sequelize, id: number, user: User): Promise<AlertView> {
  return writeTransaction(sequelize, async (transaction) => {
    const alert = await Alert.findByPk(id, { include, transaction });
    if (!alert || !alert.print) throw problems.notFound('The alert');
    if (!alert.acknowledgedAt) {
      await alert.update({ acknowledgedAt: new Date(), acknowledgedBy: user.id }, { transaction });
      alert.acknowledger = user;
    }
    return presentAlert(alert);
  });
}

/** Opens a `check-overdue` alert for each live print past its due date without an open one. */
export function openOverdueAlerts(sequelize: Sequelize, today: string): Promise<number> {
  return writeTransaction(sequelize, async (transaction) => {
    const due = await sequelize.query<{ id: number; next_check_due: string }>(
      `SELECT p.id, p.next_check_due FROM prints p
        WHERE p.deleted_at IS NULL AND p.next_check_due < ?
          AND NOT EXISTS (SELECT 1 FROM alerts a WHERE a.print_id = p.id
                          AND a.kind = 'check-overdue' AND a.acknowledged_at IS NULL)`,
      { replacements: [today], type: QueryTypes.SELECT, transaction },
    );
    const openedAt = new Date();
    await Alert.bulkCreate(
      due.map((row) => ({
        printId: row.id,
        kind: 'check-overdue',
        reason: `Tone check due ${row.next_check_due} is overdue`,
        openedAt,
      })),
      { transaction },
    );
    return due.length;
  });
}
