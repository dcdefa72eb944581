import { RIGHTS_STATEMENTS } from '../../../shared/domain/registrar/rights-statements';

const INDEX = new Map(RIGHTS_STATEMENTS.map((statement, i) => [statement.uri, i + 1]));

/** A rights statement URI as the index's column keeps it: 1 + its place in the vocabulary, 0 for none. */
export function rightsColumn(uri: string | null | undefined): number {
  return uri ? (INDEX.get(uri) ?? 0) : 0;
}

/** The URI of a column value; null for 0. */
export function rightsOfColumn(value: number): string | null {
  return RIGHTS_STATEMENTS[value - 1]?.uri ?? null;
}
