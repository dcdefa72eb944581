import type { Process } from '../vocabulary';

/**
 * Annual light-exposure limits per process, in lux hours a year. The categories and
 * figures are those of CIE 157:2004, "Control of damage to museum objects by optical
 * radiation" (values from memory: high responsivity 15,000 lx·h a year at 50 lx; medium
 * 150,000 lx·h; low 600,000 lx·h). Which category a process falls in is the conservator's
 * call: these are starting points, and the conservator's judgement of the print in hand and
 * the standard itself come first.
 */
export const LIGHT_SETTINGS = {
  saltPrint: {
    label: 'Salt prints, annual limit',
    process: 'salt print',
    defaultValue: 15_000,
    source:
      'CIE 157:2004, high responsivity: 15,000 lx·h a year (50 lx) — value from memory; check it against the standard.',
  },
  albumenPrint: {
    label: 'Albumen prints, annual limit',
    process: 'albumen print',
    defaultValue: 15_000,
    source:
      'CIE 157:2004, high responsivity: 15,000 lx·h a year (50 lx) — value from memory; check it against the standard.',
  },
  cyanotype: {
    label: 'Cyanotypes, annual limit',
    process: 'cyanotype',
    defaultValue: 15_000,
    source:
      'CIE 157:2004, high responsivity (15,000 lx·h a year, from memory); placing cyanotypes there is common practice.',
  },
  platinumPalladium: {
    label: 'Platinum/palladium prints, annual limit',
    process: 'platinum/palladium print',
    defaultValue: 150_000,
    source:
      'CIE 157:2004, medium responsivity (150,000 lx·h a year, from memory); the category is our choice: the metal image is stable, its paper is not.',
  },
  silverGelatin: {
    label: 'Hand-coated silver gelatin, annual limit',
    process: 'hand-coated silver gelatin',
    defaultValue: 150_000,
    source:
      'CIE 157:2004, medium responsivity (150,000 lx·h a year, from memory); the category is our choice.',
  },
} as const satisfies Record<
  string,
  { label: string; process: Process; defaultValue: number; source: string }
>;

export type LightSettingKey = keyof typeof LIGHT_SETTINGS;
export type LightSettings = Record<LightSettingKey, number>;
export const LIGHT_SETTING_KEYS = Object.keys(LIGHT_SETTINGS) as LightSettingKey[];
export const LIGHT_LIMIT_MAX = 10_000_000;

/** Every limit at its default. */
export function defaultLightSettings(): LightSettings {
  return Object.fromEntries(
    LIGHT_SETTING_KEYS.map((key) => [key, LIGHT_SETTINGS[key].defaultValue]),
  ) as LightSettings;
}

/** The annual limit in force for a process. */
export function annualLimitFor(process: Process, settings: LightSettings): number {
  const key = LIGHT_SETTING_KEYS.find((name) => LIGHT_SETTINGS[name].process === process);
  return key ? settings[key] : LIGHT_SETTINGS.saltPrint.defaultValue;
}

/** Where the conservator's judgement and the standard come before these figures. */
export const LIGHT_CAUTION =
  'Light damage adds up and does not reverse. These limits are starting points from CIE 157:2004; the conservator’s judgement of each print and the standard itself come first.';
