import type { Transaction } from 'sequelize';
import type { ChemistrySettings } from '../../../shared/domain/chemistry/settings';
import { loadSettings } from '../settings/settings-store';

/** The chemistry settings in force (the one settings store's `chemistry` area). */
export async function readChemistrySettings(transaction?: Transaction): Promise<ChemistrySettings> {
  return (await loadSettings(transaction)).chemistry;
}
