import { Location, Negative, Paper, Source } from '../../models';
import type { ImportLookups } from './row-to-print';

/** Reference lists by lower-cased name or code, and the records by id (for the search index). */
export async function loadLookups(): Promise<
  ImportLookups & { paperById: Map<number, Paper>; negativeById: Map<number, Negative> }
> {
  const [papers, negatives, locations, sources] = await Promise.all([
    Paper.findAll(),
    Negative.findAll(),
    Location.findAll({ attributes: ['id', 'code'] }),
    Source.findAll({ attributes: ['id', 'name'], order: [['id', 'ASC']] }),
  ]);
  return {
    papers: new Map(papers.map((paper) => [paper.name.toLowerCase(), paper.id])),
    negatives: new Map(negatives.map((negative) => [negative.code.toLowerCase(), negative.id])),
    locations: new Map(locations.map((location) => [location.code.toLowerCase(), location.id])),
    // Two sources of one name: the first made is meant (names need not be unique).
    sources: new Map(
      [...sources].reverse().map((source) => [source.name.toLowerCase(), source.id]),
    ),
    paperById: new Map(papers.map((paper) => [paper.id, paper])),
    negativeById: new Map(negatives.map((negative) => [negative.id, negative])),
  };
}
