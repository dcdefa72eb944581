import type { Transaction } from 'sequelize';
import { Location } from '../../models';

export const PATH_SEPARATOR = ' › ';

/** Full names of every location, root first; a cycle cannot hang it (depth is capped). */
export function locationPaths(
  locations: ReadonlyArray<Pick<Location, 'id' | 'name' | 'parentId'>>,
): Map<number, string> {
  const byId = new Map(locations.map((location) => [location.id, location]));
  const paths = new Map<number, string>();
  for (const location of locations) {
    const names: string[] = [];
    let current: (typeof locations)[number] | undefined = location;
    for (let depth = 0; current && depth < 32; depth += 1) {
      names.unshift(current.name);
      current = current.parentId == null ? undefined : byId.get(current.parentId);
    }
    paths.set(location.id, names.join(PATH_SEPARATOR));
  }
  return paths;
}

/** The full name of one location; the table is small, so one read of it serves the walk. */
export async function locationPath(id: number, transaction?: Transaction): Promise<string | null> {
  const all = await Location.findAll({ attributes: ['id', 'name', 'parentId'], transaction });
  return locationPaths(all).get(id) ?? null;
}

/** Ids of a location and everything below it, for refusing a move under its own child. */
export async function descendantIds(id: number, transaction?: Transaction): Promise<Set<number>> {
  const all = await Location.findAll({ attributes: ['id', 'parentId'], transaction });
  const found = new Set([id]);
  let grew = true;
  while (grew) {
    grew = false;
    for (const location of all) {
      if (location.parentId != null && found.has(location.parentId) && !found.has(location.id)) {
        found.add(location.id);
        grew = true;
      }
    }
  }
  return found;
}
