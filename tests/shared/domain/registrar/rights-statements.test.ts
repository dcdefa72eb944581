import { describe, expect, it } from 'vitest';
import {
  findRightsStatement,
  RIGHTS_STATEMENTS,
  rightsStatementByUri,
} from '../../../../shared/domain/registrar/rights-statements';

/**
 * The vocabulary as RightsStatements.org publishes it, version 1.0: each statement's `@id`
 * and English `prefLabel`, copied from the consortium's data model, the files
 * `<ID>_en.json` of github.com/rightsstatements/data-model (the statements of
 * rights-statements.ttl, `owl:versionInfo "1.0"`). Checked one by one on 2026-12-03.
 */
const PUBLISHED_1_0: Array<[string, string]> = [
  ['http://rightsstatements.org/vocab/InC/1.0/', 'In Copyright'],
  ['http://rightsstatements.org/vocab/InC-OW-EU/1.0/', 'In Copyright - EU Orphan Work'],
  ['http://rightsstatements.org/vocab/InC-EDU/1.0/', 'In Copyright - Educational Use Permitted'],
  ['http://rightsstatements.org/vocab/InC-NC/1.0/', 'In Copyright - Non-Commercial Use Permitted'],
  [
    'http://rightsstatements.org/vocab/InC-RUU/1.0/',
    'In Copyright - Rights-holder(s) Unlocatable or Unidentifiable',
  ],
  ['http://rightsstatements.org/vocab/NoC-CR/1.0/', 'No Copyright - Contractual Restrictions'],
  ['http://rightsstatements.org/vocab/NoC-NC/1.0/', 'No Copyright - Non-Commercial Use Only'],
  [
    'http://rightsstatements.org/vocab/NoC-OKLR/1.0/',
    'No Copyright - Other Known Legal Restrictions',
  ],
  ['http://rightsstatements.org/vocab/NoC-US/1.0/', 'No Copyright - United States'],
  ['http://rightsstatements.org/vocab/CNE/1.0/', 'Copyright Not Evaluated'],
  ['http://rightsstatements.org/vocab/UND/1.0/', 'Copyright Undetermined'],
  ['http://rightsstatements.org/vocab/NKC/1.0/', 'No Known Copyright'],
];

describe('rights statements', () => {
  it('are exactly the twelve statements of vocabulary 1.0, URIs and labels as published', () => {
    expect(RIGHTS_STATEMENTS.map((s) => [s.uri, s.label]).sort()).toEqual(
      [...PUBLISHED_1_0].sort(),
    );
  });

  it('are found by URI or by label, and nothing else is', () => {
    for (const [uri, label] of PUBLISHED_1_0) {
      expect(rightsStatementByUri(uri)?.label).toBe(label);
      expect(findRightsStatement(label)?.uri).toBe(uri);
      expect(findRightsStatement(label.toUpperCase())?.uri).toBe(uri);
    }
    expect(findRightsStatement('In Copyright – EU Orphan Work')?.uri).toBe(PUBLISHED_1_0[1]![0]);
    expect(rightsStatementByUri('https://rightsstatements.org/vocab/NKC/1.0/')?.label).toBe(
      'No Known Copyright',
    );
    for (const text of ['Copyright', 'InC', 'http://rightsstatements.org/vocab/InC/2.0/', ''])
      expect(findRightsStatement(text), text).toBeNull();
  });
});
