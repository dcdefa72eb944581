import type { Sequelize, Transaction } from 'sequelize';
import { problems } from '../../middleware/problem';
import { findPlaceNames, findPrintRecord } from '../../repositories/print-record-repository';
import { PATH_SEPARATOR } from '../locations/location-paths';

/**
 * A print's whole record as its answers show it, read in plain SQL, with the full name of
 * its place; 404 when there is none. `loadPrint` gives the same record as a model instance,
 * for the commands that change it in place.
 */
export async function readPrint(
  sequelize: Sequelize,
  id: number,
  options: { transaction?: Transaction; includeDeleted?: boolean } = {},
) {
  const print = await findPrintRecord(sequelize, id, options);
  if (!print) throw problems.notFound('The print');
  const names = print.locationId
    ? await findPlaceNames(sequelize, print.locationId, options.transaction)
    : [];
  return { print, locationPath: names.length ? names.join(PATH_SEPARATOR) : null };
}
