import type { Sequelize, Transaction } from 'sequelize';
import {
  bandForProcesses,
  type StorageBand,
} from '../../../shared/domain/environment/storage-bands';
import { printsAt } from '../../repositories/environment-repository';
import type { PlaceTree } from './place-tree';

/**
 * The band a place's readings are held to: the strictest for the processes of the prints
 * kept there and below (they share its air when they have no readings of their own).
 */
export async function placeBand(
  sequelize: Sequelize,
  tree: PlaceTree,
  placeId: number,
  transaction?: Transaction,
): Promise<StorageBand> {
  const prints = await printsAt(sequelize, tree.below(placeId), transaction);
  return bandForProcesses(new Set(prints.map((p) => p.process)));
}
