import type { Sequelize } from 'sequelize';
import type { Config } from './config';
import type { ImageServices } from './services/images';
import type { PrintSearchIndex } from './services/prints/search-index';

/** What every router needs: the configuration, the database and the shared services. */
export interface AppContext {
  config: Config;
  sequelize: Sequelize;
  searchIndex: PrintSearchIndex;
  images: ImageServices;
}
