import type { Transaction } from 'sequelize';
import {
  CHEMISTRY_SETTING_KEYS,
  CHEMISTRY_SETTINGS,
  defaultChemistrySettings,
  type ChemistrySettingKey,
  type ChemistrySettings,
} from '../../../shared/domain/chemistry/settings';
import type { ChemistrySettingsUpdate } from '../../../shared/schemas/chemistry';
import type { ChemistrySettingsView } from '../../../shared/types/chemistry';
import { ChemistrySetting } from '../../models';

/** The chemistry settings in force: stored values over the defaults. */
export async function readChemistrySettings(transaction?: Transaction): Promise<ChemistrySettings> {
  const settings = defaultChemistrySettings();
  for (const row of await ChemistrySetting.findAll({ transaction })) {
    if (row.key in settings) settings[row.key as ChemistrySettingKey] = row.value;
  }
  return settings;
}

/** Stores the given settings; null removes the stored value so the default applies. */
export async function writeChemistrySettings(
  input: ChemistrySettingsUpdate,
  transaction: Transaction,
): Promise<void> {
  for (const key of CHEMISTRY_SETTING_KEYS) {
    const value = input[key];
    if (value === undefined) continue;
    if (value === null) await ChemistrySetting.destroy({ where: { key }, transaction });
    else await ChemistrySetting.upsert({ key, value }, { transaction });
  }
}

export function presentChemistrySettings(settings: ChemistrySettings): ChemistrySettingsView {
  return {
    items: CHEMISTRY_SETTING_KEYS.map((key) => ({
      key,
      label: CHEMISTRY_SETTINGS[key].label,
      unit: CHEMISTRY_SETTINGS[key].unit,
      value: settings[key],
      defaultValue: CHEMISTRY_SETTINGS[key].defaultValue,
      min: CHEMISTRY_SETTINGS[key].min,
      max: CHEMISTRY_SETTINGS[key].max,
      source: CHEMISTRY_SETTINGS[key].source,
    })),
  };
}
