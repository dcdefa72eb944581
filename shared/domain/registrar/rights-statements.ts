/**
 * The twelve rights statements of RightsStatements.org, vocabulary version 1.0: each
 * statement's URI (`http://rightsstatements.org/vocab/<id>/1.0/`) and its English label as
 * the consortium publishes it. A print's rights name one of these by URI; imports may name
 * one by URI or by label.
 */
export const RIGHTS_VOCABULARY_VERSION = '1.0';

export const RIGHTS_STATEMENT_IDS = [
  'InC',
  'InC-OW-EU',
  'InC-EDU',
  'InC-NC',
  'InC-RUU',
  'NoC-CR',
  'NoC-NC',
  'NoC-OKLR',
  'NoC-US',
  'CNE',
  'UND',
  'NKC',
] as const;
export type RightsStatementId = (typeof RIGHTS_STATEMENT_IDS)[number];

export interface RightsStatement {
  id: RightsStatementId;
  uri: string;
  label: string;
}

const LABELS: Record<RightsStatementId, string> = {
  InC: 'In Copyright',
  'InC-OW-EU': 'In Copyright - EU Orphan Work',
  'InC-EDU': 'In Copyright - Educational Use Permitted',
  'InC-NC': 'In Copyright - Non-Commercial Use Permitted',
  'InC-RUU': 'In Copyright - Rights-holder(s) Unlocatable or Unidentifiable',
  'NoC-CR': 'No Copyright - Contractual Restrictions',
  'NoC-NC': 'No Copyright - Non-Commercial Use Only',
  'NoC-OKLR': 'No Copyright - Other Known Legal Restrictions',
  'NoC-US': 'No Copyright - United States',
  CNE: 'Copyright Not Evaluated',
  UND: 'Copyright Undetermined',
  NKC: 'No Known Copyright',
};

export const rightsStatementUri = (id: RightsStatementId): string =>
  `http://rightsstatements.org/vocab/${id}/${RIGHTS_VOCABULARY_VERSION}/`;

/** Every statement, in the vocabulary's order (in copyright, no copyright, other). */
export const RIGHTS_STATEMENTS: readonly RightsStatement[] = RIGHTS_STATEMENT_IDS.map((id) => ({
  id,
  uri: rightsStatementUri(id),
  label: LABELS[id],
}));

export const RIGHTS_STATEMENT_URIS = RIGHTS_STATEMENTS.map((statement) => statement.uri);

const byUri = new Map(RIGHTS_STATEMENTS.map((statement) => [statement.uri, statement]));
/** Labels compared without case, with any run of spaces or dashes as one. */
const labelKey = (text: string) =>
  text
    .trim()
    .toLowerCase()
    .replace(/[\s\u2010-\u2015-]+/g, ' ');
const byLabel = new Map(
  RIGHTS_STATEMENTS.map((statement) => [labelKey(statement.label), statement]),
);

/** The statement with this exact URI (an `https:` form is read as the same URI). */
export function rightsStatementByUri(uri: string): RightsStatement | null {
  const normal = uri.trim().replace(/^https:/, 'http:');
  return byUri.get(normal.endsWith('/') ? normal : `${normal}/`) ?? null;
}

/** The statement named by its URI or its English label; null when it names none. */
export function findRightsStatement(text: string): RightsStatement | null {
  return rightsStatementByUri(text) ?? byLabel.get(labelKey(text)) ?? null;
}
