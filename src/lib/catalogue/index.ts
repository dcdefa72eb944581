/** The client's catalogue module: cache keys, the one invalidation rule, the print fetchers. */
export { catalogueKeys, normaliseListParams, type PrintListParams } from './keys';
export { invalidateCatalogue, useInvalidateCatalogue, type CatalogueChange } from './invalidate';
export { LIST_PAGE_SIZE, printQueries } from './print-queries';
export { movementQueries, useMovePrints } from './movement-queries';
