import type { Sequelize } from 'sequelize';
import { writeTransaction } from '../../db/write-transaction';
import { problems } from '../../middleware/problem';
import type { User } from '../../models';
import {
  acknowledgeEnvironmentAlertRow,
  findEnvironmentAlert,
  findEnvironmentAlerts,
  type EnvironmentAlertRow,
} from '../../repositories/environment-alert-repository';

const LIST_LIMIT = 500;

/** Places' alerts, unacknowledged first; optionally only those opened after a time. */
export function listEnvironmentAlerts(
  sequelize: Sequelize,
  options: { openedAfter?: Date } = {},
): Promise<EnvironmentAlertRow[]> {
  return findEnvironmentAlerts(sequelize, { openedAfter: options.openedAfter, limit: LIST_LIMIT });
}

/** Marks a place's alert seen; acknowledging twice keeps the first. */
export function acknowledgeEnvironmentAlert(
  sequelize: Sequelize,
  id: number,
  user: User,
): Promise<EnvironmentAlertRow> {
  return writeTransaction(sequelize, async (transaction) => {
    const alert = await findEnvironmentAlert(sequelize, id, transaction);
    if (!alert) throw problems.notFound('The alert');
    await acknowledgeEnvironmentAlertRow(sequelize, id, user.id, transaction);
    return (await findEnvironmentAlert(sequelize, id, transaction))!;
  });
}
