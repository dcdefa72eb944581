import { mkdirSync } from 'node:fs';
import type { Config } from './config';
import type { AppContext } from './context';
import { migrateUp } from './db/migrate';
import { openDatabase } from './db/sequelize';
import { initModels } from './models';
import { PrintSearchIndex } from './services/prints/search-index';
import { ReevaluationTracker } from './services/tone/reevaluate-all';

/** Opens and migrates the database and builds the shared services. */
export async function bootstrap(config: Config): Promise<AppContext> {
  mkdirSync(config.uploadsDir, { recursive: true });
  const sequelize = await openDatabase(config.databaseUrl);
  initModels(sequelize);
  await migrateUp(sequelize);
  return {
    config,
    sequelize,
    searchIndex: new PrintSearchIndex(),
    toneReevaluation: new ReevaluationTracker(sequelize),
  };
}
