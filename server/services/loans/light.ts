import type { Sequelize } from 'sequelize';
import {
  excessOverLimit,
  lightHistory,
  luxHours,
  daysInclusive,
  type DisplayPeriod,
} from '../../../shared/domain/light/dose';
import { annualLimitFor, type LightSettings } from '../../../shared/domain/light/settings';
import type { Process } from '../../../shared/domain/vocabulary';
import type { LoanPrintView, PrintLight } from '../../../shared/types/loan';
import { problems } from '../../middleware/problem';
import {
  findDosePeriods,
  type DosePeriodRow,
  type LoanRow,
} from '../../repositories/loan-repository';
import { selectRows } from '../../db/select-rows';
import { loadSettings } from '../settings/settings-store';

const periodOf = (row: DosePeriodRow): DisplayPeriod => ({
  startsOn: row.starts_on,
  endsOn: row.ends_on,
  lux: row.max_lux,
  hoursPerDay: row.hours_per_day,
});

/** `GET /api/prints/:id/light`: the print's exposure per year and over its life. */
export async function printLight(sequelize: Sequelize, printId: number): Promise<PrintLight> {
  const [print] = await selectRows<{ process: Process }>(
    sequelize,
    'SELECT process FROM prints WHERE id = ? AND deleted_at IS NULL',
    [printId],
  );
  if (!print) throw problems.notFound('The print');
  const settings = await loadSettings();
  const periods = (await findDosePeriods(sequelize, [printId])).map(periodOf);
  return lightHistory(periods, annualLimitFor(print.process, settings.light));
}

/** What a loan would add to each of its prints, and where that passes the annual limit. */
export async function lightPlan(
  sequelize: Sequelize,
  loan: LoanRow,
  prints: ReadonlyArray<{ printId: number; process: Process }>,
  settings?: LightSettings,
): Promise<Map<number, LoanPrintView['light']>> {
  const limits = settings ?? (await loadSettings()).light;
  const others = (
    await findDosePeriods(
      sequelize,
      prints.map((print) => print.printId),
    )
  ).filter((row) => row.loan_id !== loan.id);
  const planned: DisplayPeriod = {
    startsOn: loan.starts_on,
    endsOn: loan.ends_on,
    lux: loan.max_lux,
    hoursPerDay: loan.hours_per_day,
  };
  const plannedLuxHours = luxHours(
    planned.lux,
    planned.hoursPerDay,
    daysInclusive(planned.startsOn, planned.endsOn),
  );
  return new Map(
    prints.map(({ printId, process }) => {
      const annualLimit = annualLimitFor(process, limits);
      const already = others.filter((row) => row.print_id === printId).map(periodOf);
      return [
        printId,
        { annualLimit, plannedLuxHours, excess: excessOverLimit(already, planned, annualLimit) },
      ];
    }),
  );
}

/** Every print's lifetime dose from the loans that count, for grouping tone change by light. */
export async function lifetimeDoses(sequelize: Sequelize): Promise<Map<number, number>> {
  const byPrint = new Map<number, DisplayPeriod[]>();
  for (const row of await findDosePeriods(sequelize)) {
    const list = byPrint.get(row.print_id) ?? [];
    list.push(periodOf(row));
    byPrint.set(row.print_id, list);
  }
  return new Map(
    [...byPrint].map(([printId, periods]) => [printId, lightHistory(periods, 0).lifetimeLuxHours]),
  );
}
