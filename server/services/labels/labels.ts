import type { Sequelize } from 'sequelize';
import { labelSheet } from '../../../shared/domain/label-sheets';
import type { PlaceLabelsQuery, PrintLabelsQuery } from '../../../shared/schemas/labels';
import { problems } from '../../middleware/problem';
import { findPrintsForLabels } from '../../repositories/label-repository';
import { locationStore } from '../../repositories/reference-repository';
import { descendantIds, locationPaths } from '../locations/location-paths';
import { renderLabels, type LabelContent } from './render-labels';

/** Client pages the QR codes open (as `src/config/paths.ts` spells them). */
export const placePageUrl = (origin: string, id: number) => `${origin}/places/${id}`;
export const printPageUrl = (origin: string, id: number) => `${origin}/prints/${id}`;

/** Labels for a place and every place inside it (boxes of a shelf), `copies` of each. */
export async function placeLabels(
  locationId: number,
  query: PlaceLabelsQuery,
  origin: string,
): Promise<{ pdf: Buffer; code: string }> {
  const all = await locationStore.list();
  const place = all.find((location) => location.id === locationId);
  if (!place) throw problems.notFound('The place');
  const inside = await descendantIds(locationId);
  const paths = locationPaths(all);
  const labels: LabelContent[] = all
    .filter((location) => inside.has(location.id))
    .sort((a, b) => (a.id === locationId ? -1 : b.id === locationId ? 1 : 0))
    .flatMap((location) =>
      Array.from({ length: query.copies }, () => ({
        code: location.code,
        title: location.name,
        note: paths.get(location.id) ?? null,
        url: placePageUrl(origin, location.id),
      })),
    );
  const pdf = await renderLabels(labelSheet(query.layout), labels, {
    skip: query.skip,
    title: `Labels — ${place.code}`,
  });
  return { pdf, code: place.code };
}

/** Folder labels for prints, in the order asked; 422 naming any id that is no live print. */
export async function printLabels(
  ctx: { sequelize: Sequelize },
  query: PrintLabelsQuery,
  origin: string,
): Promise<Buffer> {
  const found = new Map(
    (await findPrintsForLabels(ctx.sequelize, [...new Set(query.ids)])).map((p) => [p.id, p]),
  );
  const unknown = query.ids.filter((id) => !found.has(id));
  if (unknown.length) {
    throw problems.invalid([
      { path: 'ids', message: `No print with id ${unknown.slice(0, 5).join(', ')}` },
    ]);
  }
  const labels = query.ids.map((id) => {
    const print = found.get(id)!;
    return {
      code: print.accessionNumber,
      title: print.title,
      note: print.maker,
      url: printPageUrl(origin, id),
    };
  });
  return renderLabels(labelSheet(query.layout), labels, {
    skip: query.skip,
    title: 'Folder labels',
  });
}
