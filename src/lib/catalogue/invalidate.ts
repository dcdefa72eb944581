import { useQueryClient, type QueryClient } from '@tanstack/react-query';
import { catalogueKeys } from './keys';

/** What a write did to prints, for the one rule that refreshes what shows them. */
export interface CatalogueChange {
  /** Prints that are gone (deleted): their record is dropped, not asked for again. */
  removed?: readonly number[];
}

/**
 * The one invalidation rule: any write that touches a print (create, edit, delete, restore,
 * processing steps, images, tone checks however logged, condition reports, imports, the
 * papers, batches and settings prints derive from) marks every view under `catalogue` stale,
 * so the open ones ask again at once and the rest on their next showing. A print's derived
 * state reaches other prints (fixer capacity, tone cohorts), so the rule does not guess which.
 */
export async function invalidateCatalogue(
  queryClient: QueryClient,
  change: CatalogueChange = {},
): Promise<void> {
  for (const id of change.removed ?? [])
    queryClient.removeQueries({ queryKey: catalogueKeys.print(id) });
  await queryClient.invalidateQueries({ queryKey: catalogueKeys.all });
}

/** `invalidateCatalogue` bound to the app's query client, for a mutation's `onSuccess`. */
export function useInvalidateCatalogue(): (change?: CatalogueChange) => Promise<void> {
  const queryClient = useQueryClient();
  return (change) => invalidateCatalogue(queryClient, change);
}
