import PgBoss from 'pg-boss';
import type { TestProject } from 'vitest/node';
import { migrateUp } from '../../server/db/migrate';
import { openDatabase } from '../../server/db/sequelize';
import { initModels } from '../../server/models';
import { databaseUrlOn, runOnServer } from './postgres-server';

declare module 'vitest' {
  export interface ProvidedContext {
    /** A migrated PostgreSQL database each test app's database is copied from. */
    postgresTemplate: string;
  }
}

/**
 * The `api-postgres` project: the schema (the migrations and pg-boss's tables) is built once
 * per run into a template database, and each test app's database is a copy of it
 * (`CREATE DATABASE … TEMPLATE`), instead of running every migration for every file.
 */
export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  const server = process.env.TEST_POSTGRES_URL!;
  const name = `printwarden_template_${process.pid}`;
  await runOnServer(server, `DROP DATABASE IF EXISTS ${name}`);
  await runOnServer(server, `CREATE DATABASE ${name}`);
  const url = databaseUrlOn(server, name);
  const sequelize = await openDatabase(url);
  initModels(sequelize);
  await migrateUp(sequelize);
  await sequelize.close();
  // pg-boss's own schema from its own plan; starting and stopping it here left an interval
  // that kept the run from ending.
  await runOnServer(url, PgBoss.getConstructionPlans('pgboss'));
  project.provide('postgresTemplate', name);
  return () => runOnServer(server, `DROP DATABASE IF EXISTS ${name} WITH (FORCE)`);
}
