import type { SavedSearchCreate } from '../../shared/schemas/saved-search';
import { problems } from '../middleware/problem';
import {
  deleteSavedSearchOf,
  findSavedSearchesOf,
  insertSavedSearch,
} from '../repositories/saved-search-repository';

/** Each person's own saved searches; another person's search is "not found". */
export function listSavedSearches(userId: number) {
  return findSavedSearchesOf(userId);
}

export function createSavedSearch(input: SavedSearchCreate, userId: number) {
  return insertSavedSearch({ ...input, userId });
}

export async function deleteSavedSearch(id: number, userId: number): Promise<void> {
  if (!(await deleteSavedSearchOf(id, userId))) throw problems.notFound('The saved search');
}
