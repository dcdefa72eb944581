import { mkdirSync } from 'node:fs';
import type { Config } from './config';
import type { AppContext } from './context';
import { migrateUp } from './db/migrate';
import { openDatabase } from './db/sequelize';
import { initModels } from './models';
import { createImageServices } from './services/images';
import { failInterruptedImports } from './services/imports/start-import';
import { PrintSearchIndex } from './services/prints/search-index';

/** Opens and migrates the database and builds the shared services. */
export async function bootstrap(config: Config): Promise<AppContext> {
  mkdirSync(config.uploadsDir, { recursive: true });
  const sequelize = await openDatabase(config.databaseUrl);
  initModels(sequelize);
  await migrateUp(sequelize);
  const images = createImageServices(sequelize, config);
  const ctx: AppContext = { config, sequelize, searchIndex: new PrintSearchIndex(), images };
  await failInterruptedImports(ctx);
  return ctx;
}
