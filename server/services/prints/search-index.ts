import MiniSearch from 'minisearch';
import { Negative, Paper, Print } from '../../models';

interface PrintDocument {
  id: number;
  accessionNumber: string;
  title: string;
  maker: string;
  description: string;
  tags: string;
  process: string;
  paper: string;
  negative: string;
}

const FIELDS: Array<keyof PrintDocument> = [
  'accessionNumber',
  'title',
  'maker',
  'description',
  'tags',
  'process',
  'paper',
  'negative',
];

/**
 * Word search over the catalogue, held in memory and rebuilt from the database on first
 * use, so every server instance can build its own.
 */
export class PrintSearchIndex {
  private index = PrintSearchIndex.empty();
  private built: Promise<void> | undefined;
  private isBuilt = false;

  private static empty(): MiniSearch<PrintDocument> {
    return new MiniSearch<PrintDocument>({
      fields: FIELDS,
      searchOptions: {
        prefix: true,
        // Numbers (accession numbers, codes) match exactly or by prefix, never fuzzily.
        fuzzy: (term) => (/\d/.test(term) || term.length <= 3 ? false : 0.2),
        boost: { accessionNumber: 4, title: 3, tags: 2, maker: 2 },
        combineWith: 'AND',
      },
      // Keep dots so "2024.0012" is one term.
      tokenize: (text) => text.split(/[\s,;:!?()"'[\]{}/]+/u).filter(Boolean),
    });
  }

  /** Scores of the matching print ids (deleted prints included; callers filter). */
  async search(query: string): Promise<Map<number, number>> {
    await this.ready();
    const results = this.index.search(query);
    return new Map(results.map((result) => [Number(result.id), result.score]));
  }

  /**
   * Takes a print as just written (with its paper and negative loaded). Before any search
   * there is no index to update; during the first build, the change waits for it to finish,
   * since the build may have read the table before this write committed.
   */
  put(print: Print): void {
    const document = toDocument(print);
    const apply = () => {
      if (this.index.has(document.id)) this.index.discard(document.id);
      this.index.add(document);
    };
    if (this.isBuilt) apply();
    else void this.built?.then(apply);
  }

  private ready(): Promise<void> {
    this.built ??= this.build();
    return this.built;
  }

  private async build(): Promise<void> {
    const prints = await Print.findAll({
      include: [
        { model: Paper, as: 'paper', attributes: ['name'] },
        { model: Negative, as: 'negative', attributes: ['code'] },
      ],
      paranoid: false,
    });
    const index = PrintSearchIndex.empty();
    index.addAll(prints.map(toDocument));
    this.index = index;
    this.isBuilt = true;
  }
}

function toDocument(print: Print): PrintDocument {
  return {
    id: print.id,
    accessionNumber: print.accessionNumber,
    title: print.title,
    maker: print.maker ?? '',
    description: print.description ?? '',
    tags: print.tags.join(' '),
    process: print.process,
    paper: print.paper?.name ?? '',
    negative: print.negative?.code ?? '',
  };
}
