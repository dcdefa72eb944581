import type { Transaction } from 'sequelize';
import { DEFAULT_TONE_SETTINGS, type ToneSettings } from '../../../shared/domain/tone/settings';
import type { SettingsPatch } from '../../../shared/schemas/tone';
import { Setting } from '../../models';

const KEY = 'tone-watch';

/** The stored tone settings, each missing value taking its default. */
export async function loadToneSettings(transaction?: Transaction): Promise<ToneSettings> {
  const row = await Setting.findByPk(KEY, { transaction });
  const stored = (row?.value ?? {}) as Partial<ToneSettings>;
  return {
    tone: { ...DEFAULT_TONE_SETTINGS.tone, ...stored.tone },
    schedule: { ...DEFAULT_TONE_SETTINGS.schedule, ...stored.schedule },
  };
}

/** Merges a change into the stored settings; returns before and after. */
export async function saveToneSettings(
  patch: SettingsPatch,
  transaction: Transaction,
): Promise<{ before: ToneSettings; after: ToneSettings }> {
  const before = await loadToneSettings(transaction);
  const after: ToneSettings = {
    tone: { ...before.tone, ...patch.tone },
    schedule: { ...before.schedule, ...patch.schedule },
  };
  await Setting.upsert({ key: KEY, value: after }, { transaction });
  return { before, after };
}

/** A small key/value for the scheduler (e.g. when the digest last went out). */
export async function readMarker(key: string): Promise<string | null> {
  const row = await Setting.findByPk(key);
  return typeof row?.value === 'string' ? row.value : null;
}

export async function writeMarker(key: string, value: string): Promise<void> {
  await Setting.upsert({ key, value });
}
