/** A chemistry setting: its default and where that default comes from. */
export interface ChemistrySettingInfo {
  label: string;
  unit: string;
  defaultValue: number;
  min: number;
  max: number;
  source: string;
}

export const CHEMISTRY_SETTINGS = {
  fixerCapacitySheetsPerLitre: {
    label: 'Fixer capacity',
    unit: '8×10 in sheets per litre',
    defaultValue: 20,
    min: 1,
    max: 200,
    source:
      'Common practice: when a fixer’s capacity is not known, about 20 sheets of 8×10 in paper per litre of working solution (S. Anchell, The Darkroom Cookbook, 3rd ed., 2008, the chapter on fixers).',
  },
  sensitiserMlPer8x10: {
    label: 'Sensitiser per coat',
    unit: 'ml per 8×10 in sheet',
    defaultValue: 2,
    min: 0.1,
    max: 20,
    source:
      'Common practice: about 2 ml of 12 % silver nitrate brushed onto one sheet (a darkroom’s published salt-printing notes, bexhill-darkroom.com); the 8×10 in sheet size is from memory.',
  },
} as const satisfies Record<string, ChemistrySettingInfo>;

export type ChemistrySettingKey = keyof typeof CHEMISTRY_SETTINGS;
export type ChemistrySettings = Record<ChemistrySettingKey, number>;

export const CHEMISTRY_SETTING_KEYS = Object.keys(CHEMISTRY_SETTINGS) as ChemistrySettingKey[];

/** Every setting at its default. */
export function defaultChemistrySettings(): ChemistrySettings {
  return Object.fromEntries(
    CHEMISTRY_SETTING_KEYS.map((key) => [key, CHEMISTRY_SETTINGS[key].defaultValue]),
  ) as ChemistrySettings;
}
