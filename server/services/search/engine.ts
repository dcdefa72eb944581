import { searchWords } from '../../../shared/domain/search-words';
import { AccessionOrder } from './accession-order';
import { Columns, type ColumnValues } from './columns';
import { expandWord } from './expand';
import { Postings, PostingsBuilder } from './postings';
import { topK } from './top-k';
import { Vocabulary } from './vocabulary';
import { inverseFrequency, type TextField } from './weights';
import { WordWeigher, type PostingKind } from './word-weigher';
import { facetsOf, type EngineFacets } from './facets';
import { matcherOf, type EngineFilters } from './filters';
import { comparatorOf, type EngineSort } from './sorts';

/** A print as the index sees it: words by field, and the values filters and sorts read. */
export interface SearchDocument extends ColumnValues {
  text: Partial<Record<TextField, string>>;
}

export interface EngineQuery {
  words?: string;
  /** Curators and above also match words of the print's place. */
  includePlace: boolean;
  /** Archivists and admins also match words of marks kept private. */
  includePrivate?: boolean;
  filters: EngineFilters;
  sort: EngineSort;
  offset: number;
  /** `Infinity` for every match (exports). */
  limit: number;
  facets: boolean;
}

export interface EngineResult {
  printIds: number[];
  total: number;
  facets: EngineFacets | null;
  /** Indexed words the query matched, for highlighting. */
  matchedWords: string[];
}

/** Which restricted word lists a reader reaches. */
interface Reach {
  includePlace: boolean;
  includePrivate: boolean;
}

/** At most this many typed words count; more only slow the query down. */
const MAX_QUERY_WORDS = 12;
/** Fold added postings into the compact base after this many. */
const COMPACT_AFTER = 200_000;
/**
 * An accession-ordered page walks the whole order when more than 1/this of the slots
 * match; fewer matches are cheaper to sort.
 */
const WALK_ORDER_FROM = 16;

/**
 * The in-memory search index of the catalogue: words in postings, filter values in typed
 * columns, so a query touches only the postings of its words and never asks SQL for ids.
 */
export class SearchEngine {
  vocabulary = new Vocabulary();
  open = new Postings();
  place = new Postings();
  restricted = new Postings();
  columns = new Columns();
  slotOf = new Map<number, number>();
  /** Slots retired since the postings were last compacted (their postings linger). */
  private retiredSinceCompact = 0;
  private scores = new Float32Array(0);
  private masks = new Uint32Array(0);

  get documentCount(): number {
    return this.slotOf.size;
  }

  /** Builds from many documents at once (a fresh engine only). */
  addAll(documents: Iterable<SearchDocument>): void {
    const bulk = this.bulk();
    for (const document of documents) bulk.add(document);
    bulk.finish();
  }

  /** Adds documents in batches (a fresh engine only); nothing is searchable until finish(). */
  bulk(): { add: (document: SearchDocument) => void; finish: () => void } {
    const open = new PostingsBuilder(1 << 20);
    const place = new PostingsBuilder(1 << 14);
    const restricted = new PostingsBuilder(1 << 10);
    return {
      add: (document) => this.addTo(document, open, place, restricted),
      finish: () => {
        this.vocabulary.merge();
        open.finishInto(this.open, this.vocabulary.size);
        place.finishInto(this.place, this.vocabulary.size);
        restricted.finishInto(this.restricted, this.vocabulary.size);
      },
    };
  }

  /** Adds or replaces one print's document. */
  put(document: SearchDocument): void {
    this.remove(document.printId);
    const slot = this.columns.append(document);
    this.version += 1;
    this.slotOf.set(document.printId, slot);
    const lists = [this.open, this.place, this.restricted] as const;
    this.weigher().weigh(document.text, (kind, word, weight) =>
      lists[kind].add(word, slot, weight),
    );
    if (this.open.deltaCount > COMPACT_AFTER) this.compact();
  }

  /** Takes a print out of the index for good. */
  remove(printId: number): void {
    const slot = this.slotOf.get(printId);
    if (slot === undefined) return;
    this.retiredSinceCompact += 1;
    this.version += 1;
    this.columns.retire(slot);
    this.slotOf.delete(printId);
  }

  /** Folds added postings into the base and drops those of retired slots. */
  compact(): void {
    const lists = [this.open, this.place, this.restricted];
    // A fresh build is compact already: rebuilding 100,000 prints' postings would be wasted.
    if (!this.retiredSinceCompact && lists.every((postings) => !postings.deltaCount)) return;
    this.retiredSinceCompact = 0;
    const live = (slot: number) => this.columns.numeric.live[slot] === 1;
    this.open.compact(this.vocabulary.size, live);
    this.place.compact(this.vocabulary.size, live);
    this.restricted.compact(this.vocabulary.size, live);
  }

  /** The postings a reader may match: place words for curators up, private marks for archivists up. */
  private listsFor(reach: Reach): Postings[] {
    return [
      this.open,
      ...(reach.includePlace ? [this.place] : []),
      ...(reach.includePrivate ? [this.restricted] : []),
    ];
  }

  search(query: EngineQuery): EngineResult {
    const { columns } = this;
    const matches = matcherOf(columns.numeric, query.filters);
    const words = [...new Set(searchWords(query.words ?? ''))].slice(0, MAX_QUERY_WORDS);
    let candidates: Int32Array;
    let count = 0;
    let matchedWords: string[] = [];
    if (words.length) {
      const reach = { includePlace: query.includePlace, includePrivate: !!query.includePrivate };
      const scored = this.scoreWords(words, reach);
      candidates = scored.slots;
      for (let i = 0; i < scored.count; i += 1)
        if (matches(candidates[i]!)) candidates[count++] = candidates[i]!;
      matchedWords = this.wordsOfHits(scored.expanded, candidates, count, reach);
    } else {
      candidates = new Int32Array(columns.size);
      for (let slot = 0; slot < columns.size; slot += 1)
        if (matches(slot)) candidates[count++] = slot;
    }
    const sort = query.sort === 'relevance' && !words.length ? '-accession' : query.sort;
    const slots =
      (sort === 'accession' || sort === '-accession') && count > columns.size / WALK_ORDER_FROM
        ? this.accessionOrder().page(
            candidates,
            count,
            sort === '-accession',
            query.offset,
            Math.min(query.limit, count),
          )
        : topK(
            candidates,
            count,
            query.offset + Math.min(query.limit, count),
            comparatorOf(sort, columns, this.scores),
          ).slice(query.offset);
    const page = slots.map((slot) => columns.numeric.printId[slot]!);
    const facets = !query.facets
      ? null
      : words.length
        ? facetsOf(columns.numeric, candidates, count)
        : this.facetsWithoutWords(query.filters, candidates, count);
    return { printIds: page, total: count, facets, matchedWords };
  }

  /**
   * Slots holding every typed word (through any of its expansions), with their scores in
   * `this.scores`. The rarest word goes first, so later words only test slots already in.
   */
  private scoreWords(typed: string[], reach: Reach) {
    this.ensureScratch();
    const { scores, masks, vocabulary } = this;
    const expanded = typed
      .map((word) => expandWord(vocabulary, word))
      .map((expansions) => ({
        expansions,
        size: expansions.reduce((sum, e) => sum + this.frequency(e.word, reach), 0),
      }))
      .sort((a, b) => a.size - b.size);
    const documents = Math.max(1, this.documentCount);
    const touched = new Int32Array(expanded[0]?.size ?? 0);
    let touchedCount = 0;
    expanded.forEach(({ expansions }, index) => {
      const bit = 1 << index;
      const need = bit - 1;
      const visit = (slot: number, weight: number, scale: number) => {
        const mask = masks[slot]!;
        if ((mask & need) !== need) return;
        if (index === 0 && mask === 0) touched[touchedCount++] = slot;
        masks[slot] = mask | bit;
        scores[slot]! += weight * scale;
      };
      for (const { word, factor } of expansions) {
        const lists = this.listsFor(reach);
        const scale = factor * inverseFrequency(documents, this.frequency(word, reach));
        for (const postings of lists) forEachPosting(postings, word, scale, visit);
      }
    });
    const all = expanded.length >= 32 ? 0xffffffff : (1 << expanded.length) - 1;
    const live = this.columns.numeric.live;
    const slots = new Int32Array(touchedCount);
    let count = 0;
    for (let i = 0; i < touchedCount; i += 1) {
      const slot = touched[i]!;
      if (masks[slot] === all >>> 0 && live[slot] === 1) slots[count++] = slot;
      masks[slot] = 0;
    }
    // Scores of slots that did not match every word are never read; reset them lazily.
    this.pendingReset = touched.subarray(0, touchedCount);
    const words = expanded.flatMap(({ expansions }) => expansions.map((e) => e.word));
    return { slots, count, expanded: words };
  }

  /**
   * The indexed words (at most 100) found in the hits the asker gets, and only those: a
   * word of a deleted print, a filtered-out print or one that lacks another typed word
   * must not reach the highlighter (nor hint that such a print exists).
   */
  private wordsOfHits(words: number[], hits: Int32Array, count: number, reach: Reach): string[] {
    const { masks } = this;
    for (let i = 0; i < count; i += 1) masks[hits[i]!] = 1;
    const found: string[] = [];
    const lists = this.listsFor(reach);
    for (const word of new Set(words)) {
      if (found.length === 100) break;
      let hit = false;
      const visit = (slot: number) => {
        hit ||= masks[slot] === 1;
      };
      for (const postings of lists) forEachPosting(postings, word, 0, visit);
      if (hit) found.push(this.vocabulary.words[word]!);
    }
    for (let i = 0; i < count; i += 1) masks[hits[i]!] = 0;
    return found;
  }

  private pendingReset: Int32Array | null = null;
  private wordWeigher: WordWeigher | null = null;
  private ordered: AccessionOrder | null = null;
  /** Moves with every document put or removed: what was counted before is stale. */
  private version = 0;
  private keptFacets: { version: number; filters: string; facets: EngineFacets } | null = null;

  /** The accession order of this engine's columns (a snapshot brings columns of its own). */
  private accessionOrder(): AccessionOrder {
    if (this.ordered?.columns !== this.columns) this.ordered = new AccessionOrder(this.columns);
    return this.ordered;
  }

  /**
   * Facets of a query without words depend on its filters alone: the plain list asks the
   * same question page after page, so the last answer is kept until a document changes.
   */
  private facetsWithoutWords(
    filters: EngineFilters,
    candidates: Int32Array,
    count: number,
  ): EngineFacets {
    const key = JSON.stringify(filters);
    const kept = this.keptFacets;
    if (kept?.version === this.version && kept.filters === key) return kept.facets;
    const facets = facetsOf(this.columns.numeric, candidates, count);
    this.keptFacets = { version: this.version, filters: key, facets };
    return facets;
  }

  /** The weigher of this engine's vocabulary (a snapshot brings a vocabulary of its own). */
  private weigher(): WordWeigher {
    if (this.wordWeigher?.vocabulary !== this.vocabulary)
      this.wordWeigher = new WordWeigher(this.vocabulary);
    return this.wordWeigher;
  }

  private frequency(word: number, reach: Reach): number {
    return this.listsFor(reach).reduce((sum, postings) => sum + postings.frequency(word), 0);
  }

  private ensureScratch(): void {
    if (this.pendingReset) for (const slot of this.pendingReset) this.scores[slot] = 0;
    this.pendingReset = null;
    if (this.scores.length < this.columns.size) {
      const size = Math.max(1024, this.columns.capacity);
      this.scores = new Float32Array(size);
      this.masks = new Uint32Array(size);
    }
  }

  private addTo(
    document: SearchDocument,
    open: PostingsBuilder,
    place: PostingsBuilder,
    restricted: PostingsBuilder,
  ): void {
    this.remove(document.printId);
    const slot = this.columns.append(document);
    this.version += 1;
    this.slotOf.set(document.printId, slot);
    const builders = [open, place, restricted] as const;
    this.weigher().weigh(document.text, (kind: PostingKind, word, weight) =>
      builders[kind].add(word, slot, weight),
    );
  }
}

function forEachPosting(
  postings: Postings,
  word: number,
  scale: number,
  visit: (slot: number, weight: number, scale: number) => void,
): void {
  const { offsets, slots, weights } = postings;
  if (word + 1 < offsets.length)
    for (let i = offsets[word]!, end = offsets[word + 1]!; i < end; i += 1)
      visit(slots[i]!, weights[i]!, scale);
  const list = postings.delta.get(word);
  if (list)
    for (let i = 0; i < list.slots.length; i += 1) visit(list.slots[i]!, list.weights[i]!, scale);
}
