import type { Sequelize, Transaction } from 'sequelize';
import { findAllPlaces, type PlaceRow } from '../../repositories/environment-repository';

/** The places as a tree: a place's ancestors (nearest first) and everything below it. */
export interface PlaceTree {
  byId: Map<number, PlaceRow>;
  /** The place itself, then its parent, up to the root (a cycle is cut at 32 steps). */
  chain(id: number): PlaceRow[];
  /** The place and every place below it. */
  below(id: number): number[];
}

export async function loadPlaceTree(
  sequelize: Sequelize,
  transaction?: Transaction,
): Promise<PlaceTree> {
  const places = await findAllPlaces(sequelize, transaction);
  const byId = new Map(places.map((p) => [Number(p.id), { ...p, id: Number(p.id) }]));
  const children = new Map<number, number[]>();
  for (const place of byId.values()) {
    if (place.parent_id == null) continue;
    const list = children.get(Number(place.parent_id)) ?? [];
    list.push(place.id);
    children.set(Number(place.parent_id), list);
  }
  return {
    byId,
    chain(id) {
      const out: PlaceRow[] = [];
      let current = byId.get(id);
      for (let depth = 0; current && depth < 32; depth += 1) {
        out.push(current);
        current = current.parent_id == null ? undefined : byId.get(Number(current.parent_id));
      }
      return out;
    },
    below(id) {
      const found = [id];
      const seen = new Set(found);
      for (let i = 0; i < found.length; i += 1) {
        for (const child of children.get(found[i]!) ?? []) {
          if (!seen.has(child)) {
            seen.add(child);
            found.push(child);
          }
        }
      }
      return found;
    },
  };
}
