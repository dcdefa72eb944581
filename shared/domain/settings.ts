import {
  CHEMISTRY_SETTINGS,
  defaultChemistrySettings,
  type ChemistrySettings,
} from './chemistry/settings';
import {
  DEFAULT_TONE_SETTINGS,
  SETTING_SOURCES as TONE_SETTING_SOURCES,
  type CheckSchedule,
  type ToneThresholds,
} from './tone/settings';
import { LIGHT_SETTINGS, defaultLightSettings, type LightSettings } from './light/settings';
import {
  DEFAULT_ENVIRONMENT_SETTINGS,
  ENVIRONMENT_SETTING_SOURCES,
  type EnvironmentSettings,
} from './environment/settings';

/**
 * The one settings store's keys: every area's settings with its default and where that
 * default comes from. Areas keep their own definitions (tone/settings.ts,
 * chemistry/settings.ts); this module puts them under one typed shape. A new area adds one
 * entry to `AllSettings`, `defaultSettings()` and `settingSources()`.
 */
export interface AllSettings {
  tone: ToneThresholds;
  schedule: CheckSchedule;
  chemistry: ChemistrySettings;
  environment: EnvironmentSettings;
  light: LightSettings;
}

export type SettingArea = keyof AllSettings;
export const SETTING_AREAS = [
  'tone',
  'schedule',
  'chemistry',
  'environment',
  'light',
] as const satisfies SettingArea[];

/** A dotted key such as `chemistry.fixerCapacitySheetsPerLitre`. */
export type SettingKey = {
  [A in SettingArea]: `${A}.${Extract<keyof AllSettings[A], string>}`;
}[SettingArea];

/** What the settings screens show beside a value: its name, default and that default's source. */
export interface SettingSource {
  label: string;
  source: string;
  defaultValue: number;
  unit?: string;
  min?: number;
  max?: number;
}

/** Every setting at its default. */
export function defaultSettings(): AllSettings {
  return {
    tone: { ...DEFAULT_TONE_SETTINGS.tone },
    schedule: { ...DEFAULT_TONE_SETTINGS.schedule },
    chemistry: defaultChemistrySettings(),
    environment: { ...DEFAULT_ENVIRONMENT_SETTINGS },
    light: defaultLightSettings(),
  };
}

/** Where each default comes from, keyed `area.key`. */
export function settingSources(): Record<SettingKey, SettingSource> {
  const defaults = defaultSettings();
  const sources: Partial<Record<SettingKey, SettingSource>> = {};
  for (const [key, info] of Object.entries(TONE_SETTING_SOURCES)) {
    const [area, name] = key.split('.') as ['tone' | 'schedule', string];
    const values = defaults[area] as unknown as Record<string, number>;
    sources[key as SettingKey] = { ...info, defaultValue: values[name]! };
  }
  for (const [name, info] of Object.entries(CHEMISTRY_SETTINGS)) {
    const { label, source, unit, defaultValue, min, max } = info;
    sources[`chemistry.${name}` as SettingKey] = { label, source, unit, defaultValue, min, max };
  }
  for (const [name, info] of Object.entries(ENVIRONMENT_SETTING_SOURCES)) {
    const defaultValue = DEFAULT_ENVIRONMENT_SETTINGS[name as keyof EnvironmentSettings];
    sources[`environment.${name}` as SettingKey] = { ...info, defaultValue };
  }
  for (const [name, { label, source, defaultValue }] of Object.entries(LIGHT_SETTINGS)) {
    sources[`light.${name}` as SettingKey] = { label, source, defaultValue, unit: 'lx·h a year' };
  }
  return sources as Record<SettingKey, SettingSource>;
}

/** Stored values (possibly partial or stale) laid over the defaults; unknown keys dropped. */
export function settingsFromStored(stored: Partial<Record<string, unknown>>): AllSettings {
  const settings = defaultSettings();
  for (const area of SETTING_AREAS) {
    const values = stored[area];
    if (!values || typeof values !== 'object') continue;
    const target = settings[area] as unknown as Record<string, number>;
    for (const [name, value] of Object.entries(values)) {
      if (name in target && typeof value === 'number' && Number.isFinite(value)) {
        target[name] = value;
      }
    }
  }
  return settings;
}
