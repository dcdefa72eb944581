import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { SearchEngine, type SearchDocument } from '../../../../server/services/search/engine';
import type { EngineFilters } from '../../../../server/services/search/filters';
import type { EngineSort } from '../../../../server/services/search/sorts';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { readSnapshot, writeSnapshot } from '../../../../server/services/search/snapshot';
import { wordsQuery } from '../../../support/search';

/** No word is a prefix of another or within two edits of one, so matching is exact here. */
const WORDS = ['alder', 'birch', 'cedar', 'damson', 'hornbeam', 'juniper', 'larch', 'walnut'];

const documentArb = fc.record({
  printId: fc.integer({ min: 1, max: 60 }),
  accessionNumber: fc.constantFrom('2020.0001', '2020.0002', '2021.0001', '2022.0007', 'B-9'),
  title: fc.constantFrom('Alpha', 'beta', 'Gamma', 'delta', 'print 2', 'Print 10', 'print 100'),
  process: fc.integer({ min: 0, max: 3 }),
  paperId: fc.integer({ min: 0, max: 3 }),
  toneStatus: fc.integer({ min: 0, max: 5 }),
  fixingMinutes: fc.oneof(fc.constant(Number.NaN), fc.integer({ min: 0, max: 30 })),
  washingMinutes: fc.oneof(fc.constant(Number.NaN), fc.integer({ min: 0, max: 60 })),
  madeFrom: fc.constantFrom(0, 20190101, 20200101, 20210601),
  span: fc.constantFrom(0, 365, 10_000),
  risk: fc.boolean(),
  deleted: fc.boolean(),
  sourceId: fc.integer({ min: 0, max: 3 }),
  rights: fc.integer({ min: 0, max: 12 }),
  words: fc.subarray(WORDS, { maxLength: 3 }),
  placeWords: fc.subarray(WORDS, { maxLength: 2 }),
  privateWords: fc.subarray(WORDS, { maxLength: 2 }),
});
type Generated = typeof documentArb extends fc.Arbitrary<infer T> ? T : never;

function toDocument(g: Generated): SearchDocument {
  const { span, words, placeWords, privateWords, ...values } = g;
  return {
    ...values,
    madeTo: values.madeFrom === 0 ? 0 : values.madeFrom + span,
    text: {
      description: words.join(' '),
      place: placeWords.join(' '),
      privateMarks: privateWords.join(' '),
    },
  };
}

const optional = <T>(arb: fc.Arbitrary<T>) => fc.option(arb, { nil: undefined });
const filtersArb: fc.Arbitrary<EngineFilters> = fc.record({
  process: optional(fc.integer({ min: 0, max: 3 })),
  paperId: optional(fc.integer({ min: 1, max: 3 })),
  toneStatus: optional(fc.integer({ min: 0, max: 5 })),
  fixingMinutesMin: optional(fc.integer({ min: 0, max: 30 })),
  fixingMinutesMax: optional(fc.integer({ min: 0, max: 30 })),
  washingMinutesMin: optional(fc.integer({ min: 0, max: 60 })),
  washingMinutesMax: optional(fc.integer({ min: 0, max: 60 })),
  madeFrom: optional(fc.constantFrom(20190601, 20200101, 20250101)),
  madeTo: optional(fc.constantFrom(20190601, 20200101, 20250101)),
  risk: optional(fc.boolean()),
  sourceId: optional(fc.integer({ min: 1, max: 3 })),
  rights: optional(fc.integer({ min: 1, max: 12 })),
  deleted: fc.boolean(),
});
const sortArb = fc.constantFrom<EngineSort>(
  'relevance',
  'accession',
  '-accession',
  'madeOn',
  '-madeOn',
  'title',
  '-title',
);

/** The filters written the obvious way, one document at a time (SQL's NULL rules). */
function passes(d: SearchDocument, f: EngineFilters): boolean {
  const within = (value: number, min?: number, max?: number) =>
    (min === undefined || value >= min) && (max === undefined || value <= max);
  return (
    d.deleted === f.deleted &&
    (f.process === undefined || d.process === f.process) &&
    (f.paperId === undefined || d.paperId === f.paperId) &&
    (f.toneStatus === undefined || d.toneStatus === f.toneStatus) &&
    (f.risk === undefined || d.risk === f.risk) &&
    (f.sourceId === undefined || d.sourceId === f.sourceId) &&
    (f.rights === undefined || d.rights === f.rights) &&
    within(d.fixingMinutes, f.fixingMinutesMin, f.fixingMinutesMax) &&
    within(d.washingMinutes, f.washingMinutesMin, f.washingMinutesMax) &&
    (f.madeFrom === undefined || (d.madeTo !== 0 && d.madeTo >= f.madeFrom)) &&
    (f.madeTo === undefined || (d.madeFrom !== 0 && d.madeFrom <= f.madeTo))
  );
}

/** Numbers within titles as numbers, case aside: Intl.Collator's numeric collation (ECMA-402). */
const TITLES = new Intl.Collator('en', { numeric: true, sensitivity: 'base' });

/** The middle day of a yyyymmdd range, through Date (the reference for approximate dates). */
const middleDay = (from: number, to: number) => {
  const time = (n: number) =>
    new Date(Date.UTC(Math.floor(n / 10000), (Math.floor(n / 100) % 100) - 1, n % 100)).getTime();
  return (time(from) + time(to)) / 2;
};

/** The list's orders, as a full sort (ties by accession number). */
function compare(sort: EngineSort, a: SearchDocument, b: SearchDocument): number {
  const text = (x: string, y: string) => (x < y ? -1 : x > y ? 1 : 0);
  const early = (d: SearchDocument) => (d.madeFrom ? middleDay(d.madeFrom, d.madeTo) : Infinity);
  const late = (d: SearchDocument) => (d.madeFrom ? middleDay(d.madeFrom, d.madeTo) : -Infinity);
  switch (sort) {
    case 'relevance':
    case '-accession':
      return text(b.accessionNumber, a.accessionNumber);
    case 'accession':
      return text(a.accessionNumber, b.accessionNumber);
    case 'madeOn':
      return (
        (early(a) === early(b) ? 0 : early(a) < early(b) ? -1 : 1) ||
        text(a.accessionNumber, b.accessionNumber)
      );
    case '-madeOn':
      return (
        (late(a) === late(b) ? 0 : late(a) > late(b) ? -1 : 1) ||
        text(b.accessionNumber, a.accessionNumber)
      );
    case 'title':
      return TITLES.compare(a.title, b.title) || text(a.accessionNumber, b.accessionNumber);
    case '-title':
      return TITLES.compare(b.title, a.title) || text(b.accessionNumber, a.accessionNumber);
  }
}

/** Later documents with the same print id replace earlier ones, as put() does. */
const latest = (documents: SearchDocument[]) => [
  ...new Map(documents.map((d) => [d.printId, d])).values(),
];

describe('SearchEngine filters, sorts and paging against a plain reference', () => {
  it('gives exactly the expected set, in order, for every filter alone and combined', () => {
    fc.assert(
      fc.property(
        fc.array(documentArb, { maxLength: 40 }),
        fc.array(documentArb, { maxLength: 10 }),
        filtersArb,
        sortArb,
        fc.integer({ min: 0, max: 10 }),
        (built, edited, filters, sort, offset) => {
          const engine = new SearchEngine();
          engine.addAll(built.map(toDocument));
          for (const g of edited) engine.put(toDocument(g));
          const expected = latest([...built, ...edited].map(toDocument))
            .filter((d) => passes(d, filters))
            .sort((a, b) => compare(sort, a, b) || b.printId - a.printId);
          const result = engine.search({
            includePlace: false,
            filters,
            sort: sort === 'relevance' ? '-accession' : sort,
            offset,
            limit: 7,
            facets: true,
          });
          expect(result.total).toBe(expected.length);
          // Ties in the sort key may come in either order: compare keys, then the set.
          const page = expected.slice(offset, offset + 7);
          expect(result.printIds.length).toBe(page.length);
          const byId = new Map(expected.map((d) => [d.printId, d]));
          result.printIds.forEach((id, i) =>
            expect(compare(sort, byId.get(id)!, page[i]!)).toBe(0),
          );
          const processes = new Map<number, number>();
          for (const d of expected) processes.set(d.process, (processes.get(d.process) ?? 0) + 1);
          expect(result.facets!.process).toEqual(processes);
          const rights = new Map<number, number>();
          for (const d of expected)
            if (d.rights) rights.set(d.rights, (rights.get(d.rights) ?? 0) + 1);
          expect(result.facets!.rights).toEqual(rights);
        },
      ),
      { numRuns: 120 },
    );
  });

  it('keeps accession order and counts right when prints change between searches', () => {
    fc.assert(
      fc.property(
        fc.array(documentArb, { maxLength: 40 }),
        fc.array(documentArb, { minLength: 1, maxLength: 12 }),
        fc.constantFrom<EngineSort>('accession', '-accession'),
        fc.integer({ min: 0, max: 10 }),
        (built, edited, sort, offset) => {
          const engine = new SearchEngine();
          engine.addAll(built.map(toDocument));
          const filters = { deleted: false } as EngineFilters;
          const seen = built.map(toDocument);
          // A search before every edit, so each later search starts from kept order and counts.
          for (const g of [...edited, null]) {
            const expected = latest(seen)
              .filter((d) => passes(d, filters))
              .sort((a, b) => compare(sort, a, b) || b.printId - a.printId);
            const result = engine.search({
              includePlace: false,
              filters,
              sort,
              offset,
              limit: 7,
              facets: true,
            });
            expect(result.total).toBe(expected.length);
            const page = expected.slice(offset, offset + 7);
            const byId = new Map(expected.map((d) => [d.printId, d]));
            expect(result.printIds.length).toBe(page.length);
            result.printIds.forEach((id, i) =>
              expect(compare(sort, byId.get(id)!, page[i]!)).toBe(0),
            );
            const tones = new Map<number, number>();
            for (const d of expected) tones.set(d.toneStatus, (tones.get(d.toneStatus) ?? 0) + 1);
            expect(result.facets!.toneStatus).toEqual(tones);
            if (g) {
              engine.put(toDocument(g));
              seen.push(toDocument(g));
            }
          }
        },
      ),
      { numRuns: 150 },
    );
  });

  it('finds documents holding every typed word; place and private words only when asked', () => {
    fc.assert(
      fc.property(
        fc.array(documentArb, { maxLength: 40 }),
        fc.subarray(WORDS, { minLength: 1, maxLength: 2 }),
        fc.boolean(),
        fc.boolean(),
        (generated, words, includePlace, includePrivate) => {
          const engine = new SearchEngine();
          const documents = latest(generated.map(toDocument));
          engine.addAll(generated.map(toDocument));
          const has = (d: SearchDocument, word: string) =>
            d.text.description!.split(' ').includes(word) ||
            (includePlace && d.text.place!.split(' ').includes(word)) ||
            (includePrivate && d.text.privateMarks!.split(' ').includes(word));
          const expected = documents
            .filter((d) => !d.deleted && words.every((word) => has(d, word)))
            .map((d) => d.printId)
            .sort((a, b) => a - b);
          const result = engine.search({
            words: words.join(' '),
            includePlace,
            includePrivate,
            filters: { deleted: false },
            sort: 'relevance',
            offset: 0,
            limit: Infinity,
            facets: false,
          });
          expect([...result.printIds].sort((a, b) => a - b)).toEqual(expected);
        },
      ),
      { numRuns: 120 },
    );
  });
});

describe('SearchEngine compaction', () => {
  // Relevance order is not compared: word frequencies count replaced postings until a
  // compaction drops them (close enough for weighting), so ties may reorder.
  it('finds the same prints, compacted at any point, as a plain reference', () => {
    fc.assert(
      fc.property(
        fc.array(documentArb, { maxLength: 20 }),
        fc.array(
          fc.oneof(
            documentArb.map((document) => ({ put: document })),
            fc.integer({ min: 1, max: 60 }).map((printId) => ({ remove: printId })),
            fc.constant({ compact: true }),
          ),
          { maxLength: 40 },
        ),
        fc.subarray(WORDS, { minLength: 1, maxLength: 2 }),
        (built, changes, words) => {
          const engine = new SearchEngine();
          const documents = new Map(latest(built.map(toDocument)).map((d) => [d.printId, d]));
          engine.addAll(built.map(toDocument));
          for (const change of changes) {
            if ('put' in change) {
              const document = toDocument(change.put);
              documents.set(document.printId, document);
              engine.put(document);
            } else if ('remove' in change) {
              documents.delete(change.remove);
              engine.remove(change.remove);
            } else engine.compact();
          }
          const query = {
            words: words.join(' '),
            includePlace: true,
            includePrivate: true,
            filters: { deleted: false },
            sort: 'relevance' as const,
            offset: 0,
            limit: Infinity,
            facets: false,
          };
          const answer = engine.search(query);
          const has = (d: SearchDocument, word: string) =>
            [d.text.description, d.text.place, d.text.privateMarks].some((text) =>
              text!.split(' ').includes(word),
            );
          const expected = [...documents.values()]
            .filter((d) => !d.deleted && words.every((word) => has(d, word)))
            .map((d) => d.printId)
            .sort((a, b) => a - b);
          expect([...answer.printIds].sort((a, b) => a - b)).toEqual(expected);
        },
      ),
      { numRuns: 150 },
    );
  });
});

/** A document with nothing to filter on: the word tests set its id and text. */
const BLANK_DOCUMENT = {
  accessionNumber: '2024.0001',
  title: 'x',
  process: 0,
  paperId: 0,
  toneStatus: 0,
  fixingMinutes: Number.NaN,
  washingMinutes: Number.NaN,
  madeFrom: 0,
  madeTo: 0,
  risk: false,
  deleted: false,
  sourceId: 0,
  rights: 0,
};

describe('SearchEngine words', () => {
  const engine = new SearchEngine();
  const base = BLANK_DOCUMENT;
  engine.addAll([
    {
      ...base,
      printId: 1,
      text: { title: 'Mill pond at dusk', processing: 'fixing sodium thiosulfate 15 12' },
    },
    {
      ...base,
      printId: 2,
      text: {
        title: 'Weir below the footbridge',
        processing: 'sensitizing silver nitrate swabbed',
      },
    },
    { ...base, printId: 3, text: { title: 'Millstone', description: 'A wheel by the race' } },
  ]);
  const find = (words: string) => engine.search(wordsQuery(words));

  it('matches prefixes, with the whole word ranked first', () => {
    expect(find('mill').printIds).toEqual([1, 3]);
    expect(find('foot').printIds).toEqual([2]);
  });

  it('forgives a typo in a word the index does not hold', () => {
    expect(find('thiosulfte').printIds).toEqual([1]);
    expect(find('swabed').printIds).toEqual([2]);
  });

  it('never matches numbers fuzzily', () => {
    expect(find('thiosulfate 16').printIds).toEqual([]);
    expect(find('thiosulfate 15').printIds).toEqual([1]);
  });

  it('reports the indexed words it matched, for highlighting', () => {
    expect(find('thiosulphate').matchedWords).toEqual(['thiosulfate']);
  });

  it('survives a snapshot: same answers after writing and reading it back', () => {
    const file = join(mkdtempSync(join(tmpdir(), 'pw-snap-')), 'index.bin');
    engine.put({ ...base, printId: 4, text: { title: 'Orchard gate' } });
    engine.remove(3);
    writeSnapshot(engine, 'fp', file);
    const loaded = readSnapshot(file)!;
    expect(loaded.fingerprint).toBe('fp');
    for (const words of ['mill', 'orchard', 'thiosulfte', 'millstone'])
      expect(loaded.engine.search({ ...wordsQuery(words) }).printIds).toEqual(
        engine.search(wordsQuery(words)).printIds,
      );
    expect(loaded.engine.search(wordsQuery('orchard')).printIds).toEqual([4]);
    expect(loaded.engine.search(wordsQuery('millstone')).printIds).toEqual([]);
  });
});

describe('SearchEngine accession-number prefixes', () => {
  const engine = new SearchEngine();
  const print = (printId: number, accessionNumber: string): SearchDocument => ({
    ...BLANK_DOCUMENT,
    printId,
    accessionNumber,
    text: { accessionNumber, title: 'Weir' },
  });
  // Hundreds of one year's numbers: more than any cap on how far a prefix may expand.
  engine.addAll([
    ...Array.from({ length: 300 }, (_, i) =>
      print(i + 1, `2024.${String(i + 1).padStart(4, '0')}`),
    ),
    print(301, '2023.0001'),
    print(302, '1998.0001'),
  ]);
  const total = (words: string) => engine.search(wordsQuery(words)).total;

  it('finds every print whose number starts with what was typed', () => {
    expect(total('2024.0')).toBe(300);
    expect(total('2024.01')).toBe(100);
    expect(total('weir 2024.0')).toBe(300);
  });

  it('finds them from the first three characters', () => {
    expect(total('202')).toBe(301);
    expect(total('199')).toBe(1);
  });

  it('still never matches a number fuzzily, nor expands one or two digits', () => {
    expect(total('2025')).toBe(0);
    expect(total('2')).toBe(0);
    expect(total('20')).toBe(0);
  });
});
