import type { Transaction } from 'sequelize';
import { selectRows } from '../db/select-rows';
import { Setting } from '../models';

/** Every stored row of the settings store: key → decoded JSON value. */
export async function readSettingRows(transaction?: Transaction): Promise<Map<string, unknown>> {
  // Read on every tone check and print write, inside the write lock: one plain SELECT.
  const rows = await selectRows<{ key: string; value: unknown }>(
    Setting.sequelize!,
    'SELECT "key", "value" FROM settings',
    [],
    transaction,
  );
  return new Map(rows.map((row) => [row.key, decodeJson(row.value)]));
}

/** One stored value, or undefined when the key has none. */
export async function readSettingRow(key: string, transaction?: Transaction): Promise<unknown> {
  const row = await Setting.findByPk(key, { transaction });
  return row ? decodeJson(row.value) : undefined;
}

/** Stores a value under a key, replacing what was there. */
export async function writeSettingRow(
  key: string,
  value: unknown,
  transaction?: Transaction,
): Promise<void> {
  await Setting.upsert({ key, value }, { transaction });
}

/** Removes a key, so every value under it takes its default again. */
export async function deleteSettingRow(key: string, transaction?: Transaction): Promise<void> {
  await Setting.destroy({ where: { key }, transaction });
}

/** SQLite hands a JSON column back as text when it was written by raw SQL (a migration). */
function decodeJson(value: unknown): unknown {
  if (typeof value !== 'string') return value;
  try {
    return JSON.parse(value);
  } catch {
    return value;
  }
}
