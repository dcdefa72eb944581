import type { Transaction } from 'sequelize';
import type { ToneSettings } from '../../../shared/domain/tone/settings';
import type { SettingsPatch } from '../../../shared/schemas/settings';
import { readSettingRow, writeSettingRow } from '../../repositories/settings-repository';
import { loadSettings, updateSettings } from '../settings/settings-store';

/** The tone thresholds and check intervals in force (from the one settings store). */
export async function loadToneSettings(transaction?: Transaction): Promise<ToneSettings> {
  const { tone, schedule } = await loadSettings(transaction);
  return { tone, schedule };
}

/** Merges a change into the stored settings; returns before and after. */
export async function saveToneSettings(
  patch: Pick<SettingsPatch, 'tone' | 'schedule'>,
  transaction: Transaction,
): Promise<{ before: ToneSettings; after: ToneSettings }> {
  const { before, after } = await updateSettings(patch, transaction);
  return {
    before: { tone: before.tone, schedule: before.schedule },
    after: { tone: after.tone, schedule: after.schedule },
  };
}

/** A small key/value for the scheduler (e.g. when the digest last went out). */
export async function readMarker(key: string): Promise<string | null> {
  const value = await readSettingRow(key);
  return typeof value === 'string' ? value : null;
}

export async function writeMarker(key: string, value: string): Promise<void> {
  await writeSettingRow(key, value);
}
