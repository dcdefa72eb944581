import type { Transaction } from 'sequelize';
import {
  SETTING_AREAS,
  settingsFromStored,
  type AllSettings,
  type SettingKey,
} from '../../../shared/domain/settings';
import type { SettingsPatch } from '../../../shared/schemas/settings';
import {
  deleteSettingRow,
  readSettingRows,
  writeSettingRow,
} from '../../repositories/settings-repository';

/**
 * The one settings store: one row per area (`tone`, `schedule`, `chemistry`) holding only the
 * values someone changed; every other value takes its default from `shared/domain/settings.ts`.
 */
export async function loadSettings(transaction?: Transaction): Promise<AllSettings> {
  const rows = await readSettingRows(transaction);
  return settingsFromStored(Object.fromEntries(rows));
}

/** Applies a change (null: back to the default); returns the settings before and after. */
export async function updateSettings(
  patch: SettingsPatch,
  transaction: Transaction,
): Promise<{ before: AllSettings; after: AllSettings; changed: SettingKey[] }> {
  const rows = await readSettingRows(transaction);
  const before = settingsFromStored(Object.fromEntries(rows));
  for (const area of SETTING_AREAS) {
    const change = patch[area] as Record<string, number | null | undefined> | undefined;
    if (!change) continue;
    const stored = { ...(asObject(rows.get(area)) ?? {}) };
    for (const [name, value] of Object.entries(change)) {
      if (value === undefined) continue;
      if (value === null) delete stored[name];
      else stored[name] = value;
    }
    if (Object.keys(stored).length === 0) await deleteSettingRow(area, transaction);
    else await writeSettingRow(area, stored, transaction);
    rows.set(area, stored);
  }
  const after = settingsFromStored(Object.fromEntries(rows));
  return { before, after, changed: changedKeys(before, after) };
}

/** The keys whose value in force differs between two readings of the store. */
export function changedKeys(before: AllSettings, after: AllSettings): SettingKey[] {
  const changed: SettingKey[] = [];
  for (const area of SETTING_AREAS) {
    const was = before[area] as unknown as Record<string, number>;
    const now = after[area] as unknown as Record<string, number>;
    for (const name of Object.keys(now)) {
      if (was[name] !== now[name]) changed.push(`${area}.${name}` as SettingKey);
    }
  }
  return changed;
}

function asObject(value: unknown): Record<string, unknown> | undefined {
  return value && typeof value === 'object' && !Array.isArray(value)
    ? (value as Record<string, unknown>)
    : undefined;
}
