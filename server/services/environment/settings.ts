import type { Transaction } from 'sequelize';
import type { EnvironmentSettings } from '../../../shared/domain/environment/settings';
import { loadSettings } from '../settings/settings-store';

/** The environment area of the one settings store (defaults where nobody changed them). */
export async function readEnvironmentSettings(
  transaction?: Transaction,
): Promise<EnvironmentSettings> {
  return (await loadSettings(transaction)).environment;
}
