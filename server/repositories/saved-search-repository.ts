import { SavedSearch } from '../models';

/** A person's saved searches by name. */
export function findSavedSearchesOf(userId: number) {
  return SavedSearch.findAll({ where: { userId }, order: [['name', 'ASC']] });
}

export function insertSavedSearch(values: { name: string; query: string; userId: number }) {
  return SavedSearch.create(values);
}

/** Removes one of a person's saved searches; how many rows went (0 or 1). */
export function deleteSavedSearchOf(id: number, userId: number): Promise<number> {
  return SavedSearch.destroy({ where: { id, userId } });
}
