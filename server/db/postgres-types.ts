import pg from 'pg';

/**
 * PostgreSQL answers `COUNT(*)` and `SUM` as int8 and `AVG` as numeric, which pg hands back
 * as text so that no digit is lost. Every such value here (counts, sums of bytes, averages
 * of readings) is far below 2^53, and SQLite gives numbers for the same statements, so
 * both are read as JavaScript numbers. Sequelize falls back to these parsers for the types
 * it does not parse itself.
 */
export function readNumbersAsNumbers(): void {
  pg.types.setTypeParser(pg.types.builtins.INT8, (text: string) => Number(text));
  pg.types.setTypeParser(pg.types.builtins.NUMERIC, (text: string) => Number(text));
}
