/**
 * Column lists for plain-SQL reads, each field with how its stored value is decoded — the
 * same way Sequelize's SQLite parsers and the models read them: JSON text parsed, 0/1 as
 * booleans, DATE text (`YYYY-MM-DD HH:MM:SS.SSS +00:00`) as a `Date`, everything else as
 * stored. A new column is one line in a field list; its SQL name is the field in snake_case
 * (as `underscored: true` names it) unless given.
 */
export type Decoder<T> = (value: unknown) => T;

export interface Field<T> {
  decode: Decoder<T>;
  column?: string;
}

export type Fields = Record<string, Field<unknown>>;
export type Decoded<F extends Fields> = { [K in keyof F]: F[K] extends Field<infer T> ? T : never };

/** As stored: text, numbers and DATEONLY text. */
export const stored = <T>(column?: string): Field<T> => ({ decode: (value) => value as T, column });

export const bool = (column?: string): Field<boolean> => ({
  decode: (value) => value === true || value === 1 || value === '1' || value === 'true',
  column,
});

/**
 * A JSON column's value: SQLite hands back text, PostgreSQL's driver the parsed value;
 * SQL NULL stays null.
 */
export const readJson = <T>(value: unknown): T =>
  (typeof value === 'string' ? JSON.parse(value) : (value ?? null)) as T;

/**
 * A JSON column as the text it was written from (SQLite keeps the text; PostgreSQL's
 * driver parses it, and our writers write `JSON.stringify`'s compact form), for code that
 * compares stored JSON with freshly written JSON. SQL NULL stays null.
 */
export const readJsonText = (value: unknown): string | null =>
  value == null ? null : typeof value === 'string' ? value : JSON.stringify(value);

/** A JSON column; SQL NULL stays null. */
export const json = <T>(column?: string): Field<T> => ({ decode: readJson<T>, column });

/** A DATE column; text without an offset is UTC (Sequelize's default `timezone`). */
function decodeDate(value: unknown): Date | null {
  if (value == null) return null;
  if (value instanceof Date) return value;
  const text = String(value);
  return new Date(text.includes('+') ? text : `${text}+00:00`);
}

/** A DATE column's value that is always set: text on SQLite, a `Date` from PostgreSQL. */
export const readDate = (value: unknown): Date => decodeDate(value) as Date;

/** A DATE column that is always set (created, updated). */
export const date = (column?: string): Field<Date> => ({
  decode: readDate,
  column,
});

/** A DATE column that may be empty. */
export const maybeDate = (column?: string): Field<Date | null> => ({ decode: decodeDate, column });

const snake = (name: string) => name.replace(/[A-Z]/g, (letter) => `_${letter.toLowerCase()}`);

/** `alias.column AS "prefixfield", …` for a SELECT list. */
export function selectList(alias: string, fields: Fields, prefix = ''): string {
  return Object.entries(fields)
    .map(([name, field]) => `${alias}.${field.column ?? snake(name)} AS "${prefix}${name}"`)
    .join(', ');
}

/** The fields of one row read through `selectList` with the same prefix. */
export function decodeRow<F extends Fields>(
  row: Record<string, unknown>,
  fields: F,
  prefix = '',
): Decoded<F> {
  const out: Record<string, unknown> = {};
  for (const [name, field] of Object.entries(fields)) out[name] = field.decode(row[prefix + name]);
  return out as Decoded<F>;
}
