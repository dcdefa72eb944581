import { rightsStatementByUri } from '../../shared/domain/registrar/rights-statements';
import type {
  StoredAcquisition,
  StoredMark,
  StoredProvenanceLink,
  StoredRights,
} from '../../shared/types/registrar';

export interface LinkedRegistrar {
  acquisition: StoredAcquisition | null;
  provenance: StoredProvenanceLink[] | null;
  rightsStatement: string | null;
  rights: StoredRights | null;
  marks: StoredMark[] | null;
  source?: { name: string } | null;
}

const METHOD_WORDS: Record<StoredAcquisition['method'], string> = {
  gift: 'Gift of',
  purchase: 'Purchased from',
  transfer: 'Transferred from',
  bequest: 'Bequest of',
  'made for the collection': 'Made for the collection by',
  'found in the collection': 'Found in the collection; recorded as from',
};

const dates = (from: string | null, to: string | null) =>
  from && to ? ` (${from} to ${to})` : from ? ` (from ${from})` : to ? ` (until ${to})` : '';

/** The history of ownership in words: earlier owners oldest first, then how it came in. */
function provenanceText(print: LinkedRegistrar): string | undefined {
  const owners = (print.provenance ?? []).map(
    (link) =>
      `${link.owner}${dates(link.from, link.to)}${link.evidence ? ` [${link.evidence}]` : ''}`,
  );
  const acquisition = print.acquisition;
  const cameIn = acquisition
    ? `${METHOD_WORDS[acquisition.method]} ${print.source?.name ?? 'an unrecorded source'}, ${acquisition.acquiredOn}${acquisition.reference ? ` (${acquisition.reference})` : ''}`
    : null;
  const parts = [...owners, ...(cameIn ? [cameIn] : [])];
  return parts.length ? `${parts.join('; ')}.` : undefined;
}

/**
 * The registrar's terms of a print's JSON-LD node (issue 19): `dcterms:provenance` (a
 * ProvenanceStatement in words), `dcterms:rights` (the RightsStatements.org URI),
 * `schema:copyrightHolder`, `schema:creditText`, and each mark not kept private as a
 * `schema:hasPart` text. Never a price or a source's contact: the documents are public.
 */
export function registrarTerms(print: LinkedRegistrar): Record<string, unknown> {
  const provenance = provenanceText(print);
  const statement = print.rightsStatement ? rightsStatementByUri(print.rightsStatement) : null;
  const marks = (print.marks ?? []).filter((mark) => !mark.private);
  return {
    'dcterms:provenance': provenance
      ? { '@type': 'dcterms:ProvenanceStatement', 'rdfs:label': provenance }
      : undefined,
    'dcterms:rights': statement ? { '@id': statement.uri } : undefined,
    'schema:copyrightHolder': print.rights?.holder ?? undefined,
    'schema:creditText': print.acquisition?.creditLine ?? undefined,
    'schema:hasPart': marks.length
      ? marks.map((mark) => ({
          '@type': 'schema:CreativeWork',
          'schema:name': `${mark.kind}, ${mark.position}`,
          'schema:text': mark.transcription,
          ...(mark.reading ? { 'schema:description': mark.reading } : {}),
        }))
      : undefined,
  };
}
