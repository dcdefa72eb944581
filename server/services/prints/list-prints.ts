import { col, fn, Op, type Order, type WhereOptions } from 'sequelize';
import type { PrintQuery, PrintSort } from '../../../shared/schemas/print';
import type { Facet, PrintListResponse } from '../../../shared/types/catalogue';
import { Paper, Print } from '../../models';
import { presentPrintListItem } from '../../presenters/print';
import type { PrintSearchIndex } from './search-index';

type PrintWhere = WhereOptions<Print>;

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

const ORDER: Record<Exclude<PrintSort, 'relevance'>, Order> = {
  accession: [['accessionNumber', 'ASC']],
  '-accession': [['accessionNumber', 'DESC']],
  madeOn: [
    ['madeFrom', 'ASC NULLS LAST'],
    ['accessionNumber', 'ASC'],
  ],
  '-madeOn': [
    ['madeTo', 'DESC NULLS LAST'],
    ['accessionNumber', 'DESC'],
  ],
  title: [
    ['title', 'ASC'],
    ['accessionNumber', 'ASC'],
  ],
  '-title': [
    ['title', 'DESC'],
    ['accessionNumber', 'DESC'],
  ],
};

/** The SQL side of a search: every filter except the words. */
function filtersOf(query: PrintQuery): PrintWhere {
  const and: PrintWhere[] = [];
  const range = (column: keyof Print, min?: number, max?: number) => {
    if (min !== undefined) and.push({ [column]: { [Op.gte]: min } });
    if (max !== undefined) and.push({ [column]: { [Op.lte]: max } });
  };
  if (query.process) and.push({ process: query.process });
  if (query.paperId) and.push({ paperId: query.paperId });
  if (query.toneStatus) and.push({ toneStatus: query.toneStatus });
  if (query.processingRisk !== undefined) and.push({ hasProcessingRisk: query.processingRisk });
  range('fixingMinutes', query.fixingMinutesMin, query.fixingMinutesMax);
  range('washingMinutes', query.washingMinutesMin, query.washingMinutesMax);
  // Approximate dates are ranges: keep prints whose range overlaps the asked one.
  if (query.madeFrom) and.push({ madeTo: { [Op.gte]: query.madeFrom } });
  if (query.madeTo) and.push({ madeFrom: { [Op.lte]: query.madeTo } });
  if (query.deleted) and.push({ deletedAt: { [Op.ne]: null } });
  return { [Op.and]: and };
}

/** The SQL filter, word scores, and sort of a query, shared by the list and the export. */
async function plan(query: PrintQuery, searchIndex: PrintSearchIndex) {
  let where = filtersOf(query);
  const scores = query.q ? await searchIndex.search(query.q) : null;
  if (scores) where = { [Op.and]: [where, { id: { [Op.in]: [...scores.keys()] } }] };
  const sort = query.sort ?? (scores ? 'relevance' : '-accession');
  return { where, scores, sort, paranoid: !query.deleted };
}

/** One page of matches, in the asked order (word relevance needs the index's scores). */
async function matches(
  { where, scores, sort, paranoid }: Awaited<ReturnType<typeof plan>>,
  offset: number,
  limit: number,
): Promise<Print[]> {
  if (sort === 'relevance' && scores)
    return pageByRelevance(where, scores, offset, limit, paranoid);
  return Print.findAll({
    where,
    attributes: LIST_ATTRIBUTES,
    include: PAPER_INCLUDE,
    order: ORDER[sort === 'relevance' ? '-accession' : sort],
    offset,
    limit,
    paranoid,
  });
}

/** Search and list: filters in SQL, words through the index, facets for the same query. */
export async function listPrints(
  query: PrintQuery,
  searchIndex: PrintSearchIndex,
): Promise<PrintListResponse> {
  const planned = await plan(query, searchIndex);
  const [page, { total, facets }] = await Promise.all([
    matches(planned, (query.page - 1) * query.pageSize, query.pageSize),
    totalAndFacets(planned.where, planned.paranoid),
  ]);
  return {
    items: page.map(presentPrintListItem),
    total,
    page: query.page,
    pageSize: query.pageSize,
    facets,
  };
}

/** Every match of the query, unpaged, in list order: for exports (no counts needed). */
export async function allMatchingPrints(query: PrintQuery, searchIndex: PrintSearchIndex) {
  const page = await matches(await plan(query, searchIndex), 0, Number.MAX_SAFE_INTEGER);
  return page.map(presentPrintListItem);
}

async function pageByRelevance(
  where: PrintWhere,
  scores: Map<number, number>,
  offset: number,
  limit: number,
  paranoid: boolean,
): Promise<Print[]> {
  const matching = await Print.findAll({ where, attributes: ['id'], paranoid, raw: true });
  const ids = matching
    .map((row) => row.id)
    .sort((a, b) => (scores.get(b) ?? 0) - (scores.get(a) ?? 0) || b - a)
    .slice(offset, offset + limit);
  const rows = await Print.findAll({
    where: { id: { [Op.in]: ids } },
    attributes: LIST_ATTRIBUTES,
    include: PAPER_INCLUDE,
    paranoid,
  });
  const byId = new Map(rows.map((row) => [row.id, row]));
  return ids.flatMap((id) => byId.get(id) ?? []);
}

type Facets = PrintListResponse['facets'];
interface FacetRow {
  process: Facets['process'][number]['value'];
  paperId: number | null;
  toneStatus: Facets['toneStatus'][number]['value'];
  count: number;
}

/** The total and all three facets from one grouped scan instead of four queries. */
async function totalAndFacets(where: PrintWhere, paranoid: boolean) {
  const rows = (await Print.findAll({
    where,
    attributes: ['process', 'paperId', 'toneStatus', [fn('COUNT', col('id')), 'count']],
    group: ['process', 'paperId', 'toneStatus'],
    paranoid,
    raw: true,
  })) as unknown as FacetRow[];
  const tally = <K extends string | number>(key: (row: FacetRow) => K | null): Facet<K>[] => {
    const counts = new Map<K, number>();
    for (const row of rows) {
      const value = key(row);
      if (value !== null) counts.set(value, (counts.get(value) ?? 0) + Number(row.count));
    }
    return [...counts]
      .map(([value, count]) => ({ value, count }))
      .sort((a, b) => b.count - a.count);
  };
  return {
    total: rows.reduce((sum, row) => sum + Number(row.count), 0),
    facets: {
      process: tally((row) => row.process),
      paperId: tally((row) => row.paperId),
      toneStatus: tally((row) => row.toneStatus),
    },
  };
}
