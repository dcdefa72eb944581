import type { Sequelize, Transaction } from 'sequelize';
import { postgresDialect } from './postgres';
import { sqliteDialect } from './sqlite';

/**
 * SQL that not every database understands, behind one small interface. Services and
 * repositories write portable SQL and ask the dialect for the rest; a second database is
 * one new module here (and one line in `DIALECTS`), not edits across services.
 */
export interface SqlDialect {
  name: string;
  /**
   * Whether several server instances may share this database: they then follow each other's
   * changes, take queued jobs from the database, and never treat another's work as abandoned.
   */
  readonly severalInstances: boolean;
  /** Names the index a hot query must use (`INDEXED BY`), or '' where the planner needs no hint. */
  indexHint(index: string): string;
  /** The stored form of true in a comparison (`has_processing_risk = ${dialect.true}`). */
  readonly true: string;
  /** Text values of a group joined by a separator. */
  stringAgg(expression: string, separator: string): string;
  /** A number as people write it ("15", "0.2"), not the database's REAL text ("15.0"). */
  numberText(expression: string): string;
  /** The text of the n-th (0-based) value of a statement run through `runBound`/`insertMany`. */
  placeholder(index: number): string;
  /**
   * A bound value given the column type it is written to, where the database cannot tell
   * (the rows of `UPDATE … FROM (VALUES …)`): a cast where types are strict, as is elsewhere.
   */
  typed(expression: string, type: 'json' | 'date' | 'text' | 'integer' | 'real'): string;
  /** A date as the ORM writes DATE columns, for statements that bypass it. */
  dateValue(date: Date): string;
  /**
   * Run first in every write transaction: makes it the only writer across every process on
   * this database until it ends, as SQLite's IMMEDIATE transactions are. Derived fields
   * (a bath's capacity over every print through it, accession numbers) read other rows
   * before writing, so writers must not interleave even on a database that would let them.
   */
  lockForWrite(sequelize: Sequelize, transaction: Transaction): Promise<void>;
  /**
   * Tells the other instances on this database that something they keep changed: the
   * change feed has a new row (`prints`), or people and sessions changed (`accounts`, with
   * a session id when only that one ended). Inside a transaction it is delivered at
   * commit. Nothing where only one instance can run.
   */
  announce(
    sequelize: Sequelize,
    topic: 'prints' | 'accounts',
    payload: string,
    transaction?: Transaction | null,
  ): Promise<void>;
  /**
   * Runs `work` while no other instance on this database runs work under the same `key`
   * (work already queued one at a time in this process). SQLite: only one instance runs.
   */
  exclusiveAcrossInstances<T>(
    sequelize: Sequelize,
    key: string,
    work: () => Promise<T>,
  ): Promise<T>;
  /** Settings for a newly opened database (journal mode, durability). */
  prepare(sequelize: Sequelize, options: { inMemory: boolean }): Promise<void>;
  /** Settings every new connection needs (the ORM opens several). */
  connectionSettings: readonly string[];
  /** A consistent copy of the live database written to `file` while writers go on. */
  copyInto(sequelize: Sequelize, file: string): Promise<void>;
  /** 'ok', or what the database's own check found wrong. */
  integrityCheck(sequelize: Sequelize): Promise<string>;
}

const DIALECTS: Record<string, SqlDialect> = { sqlite: sqliteDialect, postgres: postgresDialect };

/** The dialect of an open database. */
export function dialectOf(sequelize: Sequelize): SqlDialect {
  const dialect = DIALECTS[sequelize.getDialect()];
  if (!dialect) throw new Error(`No SQL dialect module for ${sequelize.getDialect()}`);
  return dialect;
}
