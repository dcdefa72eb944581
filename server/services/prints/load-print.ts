import type { Transaction } from 'sequelize';
import { problems } from '../../middleware/problem';
import {
  Asset,
  Location,
  Negative,
  Paper,
  Print,
  ProcessingStep,
  SolutionBatch,
  Source,
} from '../../models';
import { locationPath } from '../locations/location-paths';

/** A print with everything its record shows, or 404. */
export async function loadPrint(
  id: number,
  options: { transaction?: Transaction; includeDeleted?: boolean } = {},
): Promise<{ print: Print; locationPath: string | null }> {
  const print = await Print.findByPk(id, {
    include: [
      { model: Paper, as: 'paper' },
      { model: Negative, as: 'negative' },
      { model: Location, as: 'location' },
      { model: Source, as: 'source' },
      {
        model: ProcessingStep,
        as: 'processing',
        include: [{ model: SolutionBatch, as: 'solutionBatch' }],
      },
      { model: Asset, as: 'assets' },
    ],
    order: [[{ model: ProcessingStep, as: 'processing' }, 'position', 'ASC']],
    paranoid: !options.includeDeleted,
    transaction: options.transaction,
  });
  if (!print) throw problems.notFound('The print');
  const path = print.locationId ? await locationPath(print.locationId, options.transaction) : null;
  return { print, locationPath: path };
}
