import type { Sequelize } from 'sequelize';
import type { Config } from './config';
import type { BackgroundWork } from './services/background';
import type { Logger } from './logging/logger';
import type { Mailer } from './services/mail';
import type { ImageServices } from './services/images';
import type { JobQueue } from './services/jobs';
import type { PrintSearchIndex } from './services/prints/search-index';
import type { ToneReevaluationRuns } from './services/tone/reevaluation-runs';

/** What every router needs: the configuration, the database and the shared services. */
export interface AppContext {
  config: Config;
  sequelize: Sequelize;
  searchIndex: PrintSearchIndex;
  /** The collection-wide tone re-evaluation (a job; its progress is a database row). */
  toneReevaluation: ToneReevaluationRuns;
  /** Queues e-mail (`ctx.mailer.send({ to, subject, text, html })`); see services/mail. */
  mailer: Mailer;
  logger: Logger;
  images: ImageServices;
  /** Work that outlives its request; shutdown stops and awaits it (services/background). */
  background: BackgroundWork;
  /** Work run once across instances (fixity checks, the digest, tone re-evaluation); services/jobs. */
  jobs: JobQueue;
  /** Stops following other instances' changes (PostgreSQL) and closes the database. */
  closeDatabase: () => Promise<void>;
}
