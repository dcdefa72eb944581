import { rightsStatementUri } from '../shared/domain/registrar/rights-statements';
import type { RightsStatementId } from '../shared/domain/registrar/rights-statements';
import type { SourceKind } from '../shared/domain/registrar/vocabulary';
import type { PrintCreateInput } from '../shared/schemas/print';
import type { Mark } from '../shared/schemas/registrar';
import { VERSO_MARK_AREAS } from './demo-images';
import type { Random } from './random';

/**
 * The registrar's side of the invented collection: who gave or sold the prints (no real
 * people, places or firms), how each came in, earlier owners, a spread of rights
 * statements, and pencil marks on the versos — the ones the generated verso images show
 * (the accession number along the foot, the maker's looped initials at the upper right).
 */
export const DEMO_SOURCES: ReadonlyArray<{
  key: DemoSourceKey;
  name: string;
  kind: SourceKind;
  contact: string;
}> = [
  {
    key: 'darkroom',
    name: 'Mill Lane Community Darkroom',
    kind: 'organisation',
    contact: 'The secretary, 3 Mill Lane, Eastbridge · darkroom@mill-lane.test',
  },
  {
    key: 'donor',
    name: 'Ines Carrow',
    kind: 'person',
    contact: '12 Leat Row, Eastbridge · ines.carrow@example.test',
  },
  {
    key: 'dealer',
    name: 'Brackwater Prints & Books',
    kind: 'organisation',
    contact: 'Quay Street 9, Brackwater · shop@brackwater.test',
  },
  {
    key: 'estate',
    name: 'Estate of Tobias Wrenfield',
    kind: 'organisation',
    contact: 'Hale & Dunmore, executors · probate@hale-dunmore.test',
  },
  {
    key: 'library',
    name: 'Eastbridge Town Library',
    kind: 'organisation',
    contact: 'Local studies desk · local.studies@eastbridge-library.test',
  },
];
export type DemoSourceKey = 'darkroom' | 'donor' | 'dealer' | 'estate' | 'library';

/** Which prints have a photographed verso (as `demoImagePlan` draws them). */
export const hasVersoImage = (index: number) => index % 5 !== 4 && index % 2 === 0;

const RIGHTS_CYCLE: RightsStatementId[] = ['InC', 'InC-EDU', 'InC-NC', 'InC', 'CNE', 'UND'];

const initialsOf = (name: string) =>
  name
    .split(/\s+/)
    .map((part) => `${part[0]}.`)
    .join(' ');

/** How print `index` came in: most from the darkroom, some given, bought, bequeathed, moved. */
function sourceOf(index: number): DemoSourceKey {
  if (index % 11 === 7) return 'dealer';
  if (index % 13 === 5) return 'estate';
  if (index % 9 === 2) return 'donor';
  if (index % 17 === 10) return 'library';
  return 'darkroom';
}

/** The verso marks of a print; with `versoAssetId`, those the verso photograph shows are marked on it. */
export function demoVersoMarks(
  index: number,
  print: Pick<PrintCreateInput, 'accessionNumber' | 'maker'>,
  versoAssetId: number | null = null,
): Mark[] {
  const marks: Mark[] = [];
  const photographed = hasVersoImage(index);
  const on = (area: Mark['area']) =>
    versoAssetId === null ? { assetId: null, area: null } : { assetId: versoAssetId, area };
  // Most versos carry the accession number in pencil; every photographed one does.
  if (photographed || index % 3 !== 0) {
    marks.push({
      position: 'verso',
      kind: 'pencil inscription',
      transcription: print.accessionNumber!,
      reading: 'Accession number, written at accessioning',
      private: false,
      ...on(photographed ? VERSO_MARK_AREAS.number : null),
    });
  }
  if (photographed) {
    marks.push({
      position: 'verso',
      kind: 'pencil inscription',
      transcription: initialsOf(print.maker ?? 'Unknown maker'),
      reading: `Looped initials of ${print.maker ?? 'the maker'}`,
      private: false,
      ...on(VERSO_MARK_AREAS.initials),
    });
  }
  return marks;
}

/** The registrar's fields of demo print `index` (made in `madeOn`, accessioned in `year`). */
export function demoRegistrar(
  rng: Random,
  index: number,
  print: PrintCreateInput,
  sourceIds: Record<DemoSourceKey, number>,
): Pick<PrintCreateInput, 'acquisition' | 'provenance' | 'rights' | 'marks' | 'description'> {
  const year = print.accessionNumber!.slice(0, 4);
  const source = sourceOf(index);
  const maker = print.maker ?? 'the maker';
  const made = print.madeOn ?? null;
  const marks = demoVersoMarks(index, print);
  const base = { sourceId: sourceIds[source], acquiredOn: year, price: null };
  const process = `${print.process[0]!.toUpperCase()}${print.process.slice(1)}`;
  switch (source) {
    case 'dealer': {
      const price = rng.int(6, 40) * 10;
      return {
        acquisition: {
          ...base,
          method: 'purchase',
          reference: `Invoice BPB-${year}-${String(index).padStart(3, '0')}`,
          creditLine: `Purchased from Brackwater Prints & Books, ${year}`,
          price,
        },
        provenance: [{ owner: 'Brackwater Prints & Books', from: year, to: year, evidence: null }],
        rights: { statement: rightsStatementUri('InC'), holder: maker, note: null },
        marks: [
          ...marks,
          {
            position: 'folder',
            kind: 'label',
            transcription: `Stock B-${index} · ${price}`,
            reading: 'Dealer’s stock label with the price asked',
            assetId: null,
            area: null,
            private: true,
          },
        ],
        description: `${process} from the Mill Lane darkroom, bought from a dealer in ${year}.`,
      };
    }
    case 'estate':
      return {
        acquisition: {
          ...base,
          method: 'bequest',
          reference: `Will of T. Wrenfield, schedule item ${index}`,
          creditLine: `Bequest of Tobias Wrenfield, ${year}`,
        },
        // The two-link chain: the maker, then the collector who left it to the archive.
        provenance: [
          { owner: maker, from: made, to: made, evidence: 'Initials on the verso' },
          {
            owner: 'Tobias Wrenfield',
            from: made,
            to: year,
            evidence: 'Executors’ schedule of the estate',
          },
        ],
        rights: {
          statement: rightsStatementUri('InC-RUU'),
          holder: null,
          note: 'The maker could not be traced for permission.',
        },
        marks: [
          ...marks,
          {
            position: 'mount',
            kind: 'ink stamp',
            transcription: 'COLL. T. W.',
            reading: 'Collector’s stamp of Tobias Wrenfield',
            assetId: null,
            area: null,
            private: false,
          },
        ],
        description: `${process} from the Mill Lane darkroom, left to the archive by a collector in ${year}.`,
      };
    case 'donor':
      return {
        acquisition: {
          ...base,
          method: 'gift',
          reference: `Deed of gift IC-${year}`,
          creditLine: `Gift of Ines Carrow, ${year}`,
        },
        provenance: [
          {
            owner: 'Ines Carrow',
            from: made,
            to: year,
            evidence: 'Letter from the maker, in file',
          },
        ],
        rights: { statement: rightsStatementUri('InC-EDU'), holder: maker, note: null },
        marks,
        description: print.description,
      };
    case 'library':
      return {
        acquisition: {
          ...base,
          method: 'transfer',
          reference: `ETL transfer list ${year}/2`,
          creditLine: `Transferred from Eastbridge Town Library, ${year}`,
        },
        provenance: [{ owner: 'Eastbridge Town Library', from: made, to: year, evidence: null }],
        rights: { statement: rightsStatementUri('NKC'), holder: null, note: null },
        marks,
        description: `${process} from the Mill Lane darkroom, transferred from the town library in ${year}.`,
      };
    case 'darkroom':
      return {
        acquisition: {
          ...base,
          method: 'gift',
          reference: `MLD deposit ${year}`,
          creditLine: `Gift of the Mill Lane Community Darkroom, ${year}`,
        },
        provenance: [],
        rights: {
          statement: rightsStatementUri(RIGHTS_CYCLE[index % RIGHTS_CYCLE.length]!),
          holder: maker,
          note: null,
        },
        marks:
          index % 4 === 1
            ? [
                ...marks,
                {
                  position: 'mount',
                  kind: 'blind stamp',
                  transcription: 'MILL LANE',
                  reading: 'The darkroom’s blind stamp',
                  assetId: null,
                  area: null,
                  private: false,
                },
              ]
            : marks,
        description: print.description,
      };
  }
}
