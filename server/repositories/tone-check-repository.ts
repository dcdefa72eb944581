import type { Sequelize, Transaction } from 'sequelize';
import type { ToneCheckCreate } from '../../shared/schemas/tone';
import { dialectOf } from '../db/dialect';
import { selectRows } from '../db/select-rows';
import { ToneCheck } from '../models';

/** What logging a check needs of its print: its dates, and that it is not deleted. */
export interface LivePrintDates {
  id: number;
  madeFrom: string | null;
  madeTo: string | null;
}

/** The print's dates, or null when there is no such print or it is deleted. */
export async function findLivePrintDates(
  sequelize: Sequelize,
  printId: number,
  transaction: Transaction,
): Promise<LivePrintDates | null> {
  const [row] = await selectRows<LivePrintDates>(
    sequelize,
    'SELECT id, made_from AS "madeFrom", made_to AS "madeTo" FROM prints WHERE id = ? AND deleted_at IS NULL',
    [printId],
    transaction,
  );
  return row ?? null;
}

/**
 * Stores a new check with one INSERT and hands it back as the model the presenters read,
 * with the columns written as the model writes them (readings as JSON text, dates in the
 * dialect's form). A model `create` cost about 2 ms of the write lock on each check logged.
 */
export async function insertToneCheck(
  sequelize: Sequelize,
  values: ToneCheckCreate & { printId: number; checkedBy: number | null },
  transaction: Transaction,
): Promise<ToneCheck> {
  const now = new Date();
  const stamp = dialectOf(sequelize).dateValue(now);
  const row = {
    printId: values.printId,
    checkedOn: values.checkedOn,
    checkedBy: values.checkedBy,
    method: values.method,
    instrument: values.instrument ?? null,
    illuminant: values.illuminant,
    observer: values.observer,
    baseline: values.baseline,
    notes: values.notes ?? null,
    readings: values.readings,
  };
  const [inserted] = await selectRows<{ id: number }>(
    sequelize,
    `INSERT INTO tone_checks (print_id, checked_on, checked_by, method, instrument, illuminant, observer, baseline, notes, readings, created_at, updated_at)
     VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?) RETURNING id`,
    [
      row.printId,
      row.checkedOn,
      row.checkedBy,
      row.method,
      row.instrument,
      row.illuminant,
      row.observer,
      row.baseline,
      row.notes,
      JSON.stringify(row.readings),
      stamp,
      stamp,
    ],
    transaction,
  );
  return ToneCheck.build(
    { ...row, id: inserted!.id, createdAt: now, updatedAt: now },
    { isNewRecord: false },
  );
}
