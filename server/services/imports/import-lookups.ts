import { Location, Negative, Paper } from '../../models';
import type { ImportLookups } from './row-to-print';

/** Reference lists by lower-cased name or code, and the records by id (for the search index). */
export async function loadLookups(): Promise<
  ImportLookups & { paperById: Map<number, Paper>; negativeById: Map<number, Negative> }
> {
  const [papers, negatives, locations] = await Promise.all([
    Paper.findAll(),
    Negative.findAll(),
    Location.findAll({ attributes: ['id', 'code'] }),
  ]);
  return {
    papers: new Map(papers.map((paper) => [paper.name.toLowerCase(), paper.id])),
    negatives: new Map(negatives.map((negative) => [negative.code.toLowerCase(), negative.id])),
    locations: new Map(locations.map((location) => [location.code.toLowerCase(), location.id])),
    paperById: new Map(papers.map((paper) => [paper.id, paper])),
    negativeById: new Map(negatives.map((negative) => [negative.id, negative])),
  };
}
