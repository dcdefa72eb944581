import type { Sequelize } from 'sequelize';
import type { Config } from './config';
import type { PrintSearchIndex } from './services/prints/search-index';
import type { ReevaluationTracker } from './services/tone/reevaluate-all';

/** What every router needs: the configuration, the database and the shared services. */
export interface AppContext {
  config: Config;
  sequelize: Sequelize;
  searchIndex: PrintSearchIndex;
  toneReevaluation: ReevaluationTracker;
}
