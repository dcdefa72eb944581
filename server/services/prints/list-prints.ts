import { Op } from 'sequelize';
import { FIXING_BAND_EDGES, WASHING_BAND_EDGES } from '../../../shared/domain/search-bands';
import { PROCESSES, TONE_STATUSES } from '../../../shared/domain/vocabulary';
import type { PrintQuery } from '../../../shared/schemas/print';
import type {
  ChecklistItem,
  MinuteBand,
  PrintListItem,
  PrintListResponse,
} from '../../../shared/types/catalogue';
import { Paper, Print } from '../../models';
import { presentPrintListItem } from '../../presenters/print';
import type { EngineFacets } from '../search/facets';
import type { EngineQuery } from '../search/engine';
import { dateNumber } from '../search/filters';
import { rightsColumn, rightsOfColumn } from '../search/rights-column';
import type { PrintSearchIndex } from './search-index';

/** Only what a list row shows, so large JSON columns are neither read nor parsed. */
const LIST_ATTRIBUTES: Array<keyof Print> = [
  'id',
  'accessionNumber',
  'title',
  'maker',
  'madeOn',
  'process',
  'paperId',
  'fixingMinutes',
  'washingMinutes',
  'toneStatus',
  'hasProcessingRisk',
  'status',
  'rectoAssetId',
];
const PAPER_INCLUDE = [{ model: Paper, as: 'paper', attributes: ['id', 'name'] }];

/**
 * Who asks matters: only curators and above match words of a print's place, only
 * archivists and admins words of marks kept private.
 */
export interface Asker {
  includePlace: boolean;
  includePrivate: boolean;
}

/** The contract's search query in the index's terms. */
function engineQuery(query: PrintQuery, asker: Asker, offset: number, limit: number): EngineQuery {
  const index = <T>(list: readonly T[], value: T | undefined) =>
    value === undefined ? undefined : list.indexOf(value);
  return {
    words: query.q,
    includePlace: asker.includePlace,
    includePrivate: asker.includePrivate,
    filters: {
      process: index(PROCESSES, query.process),
      paperId: query.paperId,
      toneStatus: index(TONE_STATUSES, query.toneStatus),
      fixingMinutesMin: query.fixingMinutesMin,
      fixingMinutesMax: query.fixingMinutesMax,
      washingMinutesMin: query.washingMinutesMin,
      washingMinutesMax: query.washingMinutesMax,
      madeFrom: query.madeFrom ? dateNumber(query.madeFrom) : undefined,
      madeTo: query.madeTo ? dateNumber(query.madeTo) : undefined,
      risk: query.processingRisk,
      sourceId: query.sourceId,
      rights: query.rightsStatement ? rightsColumn(query.rightsStatement) : undefined,
      deleted: query.deleted ?? false,
    },
    sort: query.sort ?? 'relevance',
    offset,
    limit,
    facets: limit !== Infinity,
  };
}

const SIZE_ATTRIBUTES: Array<keyof Print> = [
  'imageWidthMm',
  'imageHeightMm',
  'sheetWidthMm',
  'sheetHeightMm',
];

/** List rows of the given prints with their sizes, in the given order (for checklists). */
export async function checklistItemsOf(ids: readonly number[]): Promise<ChecklistItem[]> {
  const rows = await rowsOf(ids, [...LIST_ATTRIBUTES, ...SIZE_ATTRIBUTES]);
  return rows.map((row) => ({
    ...presentPrintListItem(row),
    imageWidthMm: row.imageWidthMm,
    imageHeightMm: row.imageHeightMm,
    sheetWidthMm: row.sheetWidthMm,
    sheetHeightMm: row.sheetHeightMm,
  }));
}

/** Which of the given prints are deleted. */
export async function deletedPrintIds(ids: readonly number[]): Promise<Set<number>> {
  if (!ids.length) return new Set();
  const rows = await Print.findAll({
    where: { id: { [Op.in]: [...new Set(ids)] }, deletedAt: { [Op.ne]: null } },
    attributes: ['id'],
    paranoid: false,
  });
  return new Set(rows.map((row) => row.id));
}

/** List rows of the given prints, in the given order (deleted prints included). */
export async function listItemsOf(ids: readonly number[]): Promise<PrintListItem[]> {
  return (await rowsOf(ids, LIST_ATTRIBUTES)).map(presentPrintListItem);
}

async function rowsOf(ids: readonly number[], attributes: Array<keyof Print>): Promise<Print[]> {
  if (!ids.length) return [];
  const rows = await Print.findAll({
    where: { id: { [Op.in]: [...ids] } },
    attributes,
    include: PAPER_INCLUDE,
    paranoid: false,
  });
  const byId = new Map(rows.map((row) => [row.id, row]));
  return ids.flatMap((id) => byId.get(id) ?? []);
}

/** Search and list: words, filters, order and facets from the index; the page's rows from SQL. */
export async function listPrints(
  query: PrintQuery,
  searchIndex: PrintSearchIndex,
  asker: Asker,
): Promise<PrintListResponse> {
  const offset = (query.page - 1) * query.pageSize;
  const result = await searchIndex.query(engineQuery(query, asker, offset, query.pageSize));
  return {
    items: await listItemsOf(result.printIds),
    total: result.total,
    page: query.page,
    pageSize: query.pageSize,
    facets: presentFacets(result.facets!),
    matchedWords: result.matchedWords,
  };
}

/** Every match in list order, handed over in pages so an export never holds them all. */
export async function forEachMatchingPage(
  query: PrintQuery,
  searchIndex: PrintSearchIndex,
  asker: Asker,
  onPage: (items: PrintListItem[]) => Promise<void>,
  pageSize = 500,
): Promise<void> {
  const { printIds } = await searchIndex.query(engineQuery(query, asker, 0, Infinity));
  for (let start = 0; start < printIds.length; start += pageSize)
    await onPage(await listItemsOf(printIds.slice(start, start + pageSize)));
}

function presentFacets(facets: EngineFacets): PrintListResponse['facets'] {
  const sorted = <K>(entries: Array<[K, number]>) =>
    entries.map(([value, count]) => ({ value, count })).sort((a, b) => b.count - a.count);
  const bands = (counts: number[], edges: readonly number[]): MinuteBand[] =>
    edges.map((from, i) => ({ from, to: edges[i + 1] ?? null, count: counts[i]! }));
  return {
    process: sorted([...facets.process].map(([i, count]) => [PROCESSES[i]!, count])),
    paperId: sorted([...facets.paperId]),
    toneStatus: sorted([...facets.toneStatus].map(([i, count]) => [TONE_STATUSES[i]!, count])),
    fixingBands: bands(facets.fixingBands, FIXING_BAND_EDGES),
    washingBands: bands(facets.washingBands, WASHING_BAND_EDGES),
    rightsStatement: sorted(
      [...facets.rights].map(([value, count]) => [rightsOfColumn(value)!, count]),
    ),
  };
}
