import type { Transaction } from 'sequelize';
import { problems } from '../../middleware/problem';
import { Print } from '../../models';

/** 404 unless the print exists and is not deleted; reads only its id. */
export async function assertPrintExists(printId: number, transaction?: Transaction): Promise<void> {
  const print = await Print.findByPk(printId, { attributes: ['id'], transaction });
  if (!print) throw problems.notFound('The print');
}
