import type { QueryInterface, Sequelize } from 'sequelize';
import { SequelizeStorage, Umzug } from 'umzug';
import * as catalogue from './migrations/0001-catalogue';
import * as listIndexes from './migrations/0002-list-indexes';
import * as peopleMail from './migrations/0003-people-mail';
import * as assets from './migrations/0004-assets';
import * as savedSearchesChecklists from './migrations/0005-saved-searches-checklists';
import * as toneWatch from './migrations/0006-tone-watch';
import * as chemistry from './migrations/0007-chemistry';
import * as conditionAndImports from './migrations/0008-condition-and-imports';
import * as toneWatchSpeed from './migrations/0009-tone-watch-speed';
import * as deliveredMailLinks from './migrations/0010-delivered-mail-links';
import * as alertDates from './migrations/0011-alert-dates';
import * as startPage from './migrations/0013-start-page';
import * as printChanges from './migrations/0014-print-changes';
import * as oneSettingsStore from './migrations/0015-one-settings-store';
import * as registrar from './migrations/0016-registrar';
import * as movements from './migrations/0017-movements';
import * as environment from './migrations/0018-environment';
import * as loans from './migrations/0019-loans';
import * as postgresDoubles from './migrations/0020-postgres-doubles';
import * as jsonListDefaults from './migrations/0021-json-list-defaults';
import * as toneReevaluations from './migrations/0022-tone-reevaluations';
import * as toneChangesSeen from './migrations/0023-tone-changes-seen';

type Migration = {
  up: (params: { context: QueryInterface }) => Promise<void>;
  down: (params: { context: QueryInterface }) => Promise<void>;
};

/** Every migration in order; add new ones at the end, never edit a landed one. */
const MIGRATIONS: Array<[string, Migration]> = [
  ['0001-catalogue', catalogue],
  ['0002-list-indexes', listIndexes],
  ['0003-people-mail', peopleMail],
  ['0004-assets', assets],
  ['0005-saved-searches-checklists', savedSearchesChecklists],
  ['0006-tone-watch', toneWatch],
  ['0007-chemistry', chemistry],
  ['0008-condition-and-imports', conditionAndImports],
  ['0009-tone-watch-speed', toneWatchSpeed],
  ['0010-delivered-mail-links', deliveredMailLinks],
  ['0011-alert-dates', alertDates],
  ['0013-start-page', startPage],
  ['0014-print-changes', printChanges],
  ['0015-one-settings-store', oneSettingsStore],
  ['0016-registrar', registrar],
  ['0017-movements', movements],
  ['0018-environment', environment],
  ['0019-loans', loans],
  ['0020-postgres-doubles', postgresDoubles],
  ['0021-json-list-defaults', jsonListDefaults],
  ['0022-tone-reevaluations', toneReevaluations],
  ['0023-tone-changes-seen', toneChangesSeen],
];

function migrator(sequelize: Sequelize) {
  return new Umzug({
    migrations: MIGRATIONS.map(([name, migration]) => ({
      name,
      up: migration.up,
      down: migration.down,
    })),
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: undefined,
  });
}

/** Brings the schema up to date; safe to run on every start. */
export async function migrateUp(sequelize: Sequelize): Promise<string[]> {
  const applied = await migrator(sequelize).up();
  return applied.map((migration) => migration.name);
}
