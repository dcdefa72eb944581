import { Op, type Order, type WhereOptions } from 'sequelize';
import type { PrintQuery, PrintSort } from '../../../shared/schemas/print';
import type { Facet, PrintListResponse } from '../../../shared/types/catalogue';
import { Paper, Print } from '../../models';
import { presentPrintListItem } from '../../presenters/print';
import type { PrintSearchIndex } from './search-index';

type PrintWhere = WhereOptions<Print>;

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
export function filtersOf(query: PrintQuery): PrintWhere {
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

/** Search and list: filters in SQL, words through the index, facets for the same query. */
export async function listPrints(
  query: PrintQuery,
  searchIndex: PrintSearchIndex,
): Promise<PrintListResponse> {
  let where = filtersOf(query);
  const scores = query.q ? await searchIndex.search(query.q) : null;
  if (scores) where = { [Op.and]: [where, { id: { [Op.in]: [...scores.keys()] } }] };
  const paranoid = !query.deleted;
  const sort = query.sort ?? (scores ? 'relevance' : '-accession');
  const offset = (query.page - 1) * query.pageSize;

  const [page, total, facets] = await Promise.all([
    sort === 'relevance' && scores
      ? pageByRelevance(where, scores, offset, query.pageSize, paranoid)
      : Print.findAll({
          where,
          include: [{ model: Paper, as: 'paper', attributes: ['id', 'name'] }],
          order: ORDER[sort === 'relevance' ? '-accession' : sort],
          offset,
          limit: query.pageSize,
          paranoid,
        }),
    Print.count({ where, paranoid }),
    facetsOf(where, paranoid),
  ]);
  return {
    items: page.map(presentPrintListItem),
    total,
    page: query.page,
    pageSize: query.pageSize,
    facets,
  };
}

/** Every match of the query, unpaged, in list order: for exports. */
export async function allMatchingPrints(query: PrintQuery, searchIndex: PrintSearchIndex) {
  const result = await listPrints(
    { ...query, page: 1, pageSize: Number.MAX_SAFE_INTEGER },
    searchIndex,
  );
  return result.items;
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
    include: [{ model: Paper, as: 'paper', attributes: ['id', 'name'] }],
    paranoid,
  });
  const byId = new Map(rows.map((row) => [row.id, row]));
  return ids.flatMap((id) => byId.get(id) ?? []);
}

async function facetsOf(
  where: PrintWhere,
  paranoid: boolean,
): Promise<PrintListResponse['facets']> {
  const count = async <K extends string | number>(column: 'process' | 'paperId' | 'toneStatus') => {
    const rows = (await Print.count({
      where: { [Op.and]: [where, { [column]: { [Op.ne]: null } }] },
      group: [column],
      paranoid,
    })) as unknown as Array<Record<string, K | number>>;
    return rows
      .map((row) => ({ value: row[column] as K, count: Number(row.count) }))
      .sort((a, b) => b.count - a.count) as Facet<K>[];
  };
  const [process, paperId, toneStatus] = await Promise.all([
    count<PrintListResponse['facets']['process'][number]['value']>('process'),
    count<number>('paperId'),
    count<PrintListResponse['facets']['toneStatus'][number]['value']>('toneStatus'),
  ]);
  return { process, paperId, toneStatus };
}
