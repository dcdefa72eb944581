import { mkdirSync } from 'node:fs';
import type { DestinationStream } from 'pino';
import { join } from 'node:path';
import type { Config } from './config';
import type { AppContext } from './context';
import { ChangeFollower } from './db/change-follower';
import { dialectOf } from './db/dialect';
import { migrateUp } from './db/migrate';
import { openDatabase } from './db/sequelize';
import { createLogger } from './logging/logger';
import { initModels } from './models';
import { BackgroundWork } from './services/background';
import { createMailer } from './services/mail';
import { createImageServices } from './services/images';
import { handleJobs, openJobQueue } from './services/jobs';
import { openStorage } from './services/storage/open-storage';
import { failInterruptedImports } from './services/imports/start-import';
import { PrintSearchIndex } from './services/prints/search-index';
import { ToneReevaluationRuns } from './services/tone/reevaluation-runs';

/** Opens and migrates the database and builds the shared services. */
export async function bootstrap(
  config: Config,
  /** `worker: false` (the command-line scripts) takes no queued jobs. */
  options: { logDestination?: DestinationStream; worker?: boolean } = {},
): Promise<AppContext> {
  mkdirSync(config.uploadsDir, { recursive: true });
  mkdirSync(config.dataDir, { recursive: true });
  const logger = createLogger(config.logLevel, options.logDestination);
  const sequelize = await openDatabase(config.databaseUrl);
  initModels(sequelize);
  await migrateUp(sequelize);
  const mailer = await createMailer(config, sequelize, logger);
  const background = new BackgroundWork();
  const searchIndex = new PrintSearchIndex(sequelize, join(config.dataDir, 'search-index.bin'));
  // Several instances share a PostgreSQL database: each follows the others' changes.
  const follower = dialectOf(sequelize).severalInstances
    ? new ChangeFollower(sequelize, config.databaseUrl, logger)
    : null;
  await follower?.start();
  const jobs = await openJobQueue(sequelize, config, background, logger);
  const images = createImageServices(
    sequelize,
    config,
    background,
    await openStorage(config),
    jobs,
  );
  // Each re-evaluated range notes its changed prints: the index follows the change feed.
  const toneReevaluation = new ToneReevaluationRuns(sequelize, jobs, background, logger);
  const ctx: AppContext = {
    config,
    sequelize,
    searchIndex,
    mailer,
    logger,
    images,
    toneReevaluation,
    background,
    jobs,
    closeDatabase: async () => {
      await jobs.stop();
      await follower?.stop();
      await sequelize.close();
    },
  };
  await failInterruptedImports(ctx);
  if (options.worker !== false) await handleJobs(ctx);
  return ctx;
}
