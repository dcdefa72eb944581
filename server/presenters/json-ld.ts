import type { Print } from '../models';
import { registrarTerms } from './json-ld-registrar';

/**
 * An inline context, so a processor expands our documents without fetching anything.
 * Schema.org terms under `http://schema.org/` (the `@vocab` of schema.org's own JSON-LD
 * context), Dublin Core under `http://purl.org/dc/terms/` (DCMI Metadata Terms), used as
 * `dcterms:` compact IRIs.
 */
export const PRINTWARDEN_CONTEXT = {
  schema: 'http://schema.org/',
  dcterms: 'http://purl.org/dc/terms/',
  dcmitype: 'http://purl.org/dc/dcmitype/',
  rdfs: 'http://www.w3.org/2000/01/rdf-schema#',
  VisualArtwork: 'schema:VisualArtwork',
  Collection: 'schema:Collection',
  QuantitativeValue: 'schema:QuantitativeValue',
  name: 'schema:name',
  identifier: 'schema:identifier',
  creator: 'schema:creator',
  dateCreated: 'schema:dateCreated',
  artform: 'schema:artform',
  artMedium: 'schema:artMedium',
  artworkSurface: 'schema:artworkSurface',
  width: 'schema:width',
  height: 'schema:height',
  value: 'schema:value',
  unitCode: 'schema:unitCode',
  unitText: 'schema:unitText',
  description: 'schema:description',
  keywords: 'schema:keywords',
  url: { '@id': 'schema:url', '@type': '@id' },
  image: { '@id': 'schema:image', '@type': '@id' },
  subjectOf: { '@id': 'schema:subjectOf', '@type': '@id' },
  hasPart: { '@id': 'schema:hasPart', '@container': '@set' },
  numberOfItems: 'schema:numberOfItems',
} as const;

/** UN/CEFACT common code for millimetre, the unit schema.org's `unitCode` expects. */
const MILLIMETRE = 'MMT';

export interface LinkedDataOptions {
  /** `https://host` the documents' identifiers are built on. */
  origin: string;
  /** Path of the recto image (web size), once the print has one. */
  imageUrl?: string | null;
  /** Path of the IIIF manifest, once the print has images. */
  manifestUrl?: string | null;
}

const length = (mm: number | null) =>
  mm === null
    ? undefined
    : { '@type': 'QuantitativeValue', value: mm, unitCode: MILLIMETRE, unitText: 'mm' };

function extent(print: Print): string | undefined {
  const size = (w: number | null, h: number | null) => (w && h ? `${w} × ${h} mm` : null);
  const parts = [
    size(print.imageWidthMm, print.imageHeightMm)?.replace(/^/, 'image '),
    size(print.sheetWidthMm, print.sheetHeightMm)?.replace(/^/, 'sheet '),
  ].filter(Boolean);
  return parts.length ? parts.join('; ') : undefined;
}

/** The node for one print, without `@context` (shared by the single and collection documents). */
export function printNode(print: Print, options: LinkedDataOptions): Record<string, unknown> {
  const record = `${options.origin}/prints/${print.id}`;
  const node: Record<string, unknown> = {
    '@id': record,
    '@type': 'VisualArtwork',
    identifier: print.accessionNumber,
    'dcterms:identifier': print.accessionNumber,
    name: print.title,
    'dcterms:title': print.title,
    artform: 'photograph',
    artMedium: print.process,
    'dcterms:medium': print.process,
    'dcterms:type': { '@id': 'dcmitype:StillImage' },
    url: record,
    'dcterms:isPartOf': { '@id': `${options.origin}/api/prints.jsonld` },
    width: length(print.imageWidthMm),
    height: length(print.imageHeightMm),
    'dcterms:extent': extent(print),
    artworkSurface: print.paper?.name,
    creator: print.maker ?? undefined,
    'dcterms:creator': print.maker ?? undefined,
    // Plain text: many dates are approximate ("c. 1998", "2017–2019").
    dateCreated: print.madeOn ?? undefined,
    'dcterms:created': print.madeOn ?? undefined,
    description: print.description ?? undefined,
    'dcterms:description': print.description ?? undefined,
    keywords: print.tags.length ? print.tags.join(', ') : undefined,
    'dcterms:subject': print.tags.length ? print.tags : undefined,
    image: options.imageUrl ? `${options.origin}${options.imageUrl}` : undefined,
    subjectOf: options.manifestUrl ? `${options.origin}${options.manifestUrl}` : undefined,
    ...registrarTerms(print),
  };
  return Object.fromEntries(Object.entries(node).filter(([, value]) => value !== undefined));
}

/** One print as a JSON-LD document. */
export function printDocument(print: Print, options: LinkedDataOptions): Record<string, unknown> {
  return { '@context': PRINTWARDEN_CONTEXT, ...printNode(print, options) };
}

/** The whole catalogue as one collection document. */
export function catalogueDocument(
  nodes: Array<Record<string, unknown>>,
  origin: string,
): Record<string, unknown> {
  return {
    '@context': PRINTWARDEN_CONTEXT,
    '@id': `${origin}/api/prints.jsonld`,
    '@type': ['Collection', 'dcmitype:Collection'],
    name: 'Printwarden catalogue',
    'dcterms:title': 'Printwarden catalogue',
    'dcterms:hasPart': nodes.map((node) => ({ '@id': node['@id'] })),
    numberOfItems: nodes.length,
    hasPart: nodes,
  };
}
