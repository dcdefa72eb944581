import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import { PROCESSES, TONE_STATUSES } from '../../../shared/domain/vocabulary';
import { dialectOf, type SqlDialect } from '../../db/dialect';
import { locationPaths } from '../locations/location-paths';
import type { SearchDocument } from './engine';
import { dateNumber } from './filters';
import { rightsColumn } from './rights-column';
import type { StoredMark } from '../../../shared/types/registrar';
import { readJson } from '../../repositories/decode-columns';

/**
 * More words for a print from another area (condition observations, tone words): called
 * with the ids of a batch of prints, answers the text of those that have any. Register
 * one with `PrintSearchIndex.addTextSource`; its words land in the `extra` field.
 */
export interface SearchTextSource {
  name: string;
  textFor: (printIds: number[], transaction?: Transaction) => Promise<Map<number, string>>;
}

interface PrintRow {
  id: number;
  accession_number: string;
  title: string;
  maker: string | null;
  made_on: string | null;
  made_from: string | null;
  made_to: string | null;
  process: string;
  paper_id: number | null;
  location_id: number | null;
  description: string | null;
  tags: string | null;
  fixing_minutes: number | null;
  washing_minutes: number | null;
  tone_status: string;
  has_processing_risk: number;
  source_id: number | null;
  rights_statement: string | null;
  marks: string | null;
  deleted_at: string | null;
  paper_name: string | null;
  paper_fibre: string | null;
  negative_code: string | null;
  negative_subject: string | null;
  processing: string | null;
}

/**
 * The SELECT of search documents. A print's processing history is one text built by the
 * database: "fixing sodium thiosulfate 15 tray, agitated 12 20 FIX-24A …". Numbers stay
 * bare ("15", not the REAL text "15.0"), so "thiosulfate 15%" finds it.
 */
function printSql(dialect: SqlDialect): string {
  const number = (column: string) =>
    `CASE WHEN ${column} IS NULL THEN '' ELSE ' ' || ${dialect.numberText(column)} END`;
  const text = (column: string) => `coalesce(' ' || ${column}, '')`;
  const processing = `(SELECT ${dialect.stringAgg(
    `s.stage || ${text('s.chemical')}
  || ${number('s.concentration_percent')} || ${text('s.method')} || ${number('s.coats')}
  || ${number('s.minutes')} || ${number('s.temperature_c')} || ${text('s.light_source')}
  || ${text('b.code')} || ${text('s.notes')}`,
    "' '",
  )}
  FROM processing_steps s LEFT JOIN solution_batches b ON b.id = s.solution_batch_id
  WHERE s.print_id = p.id)`;
  return `SELECT p.id, p.accession_number, p.title, p.maker, p.made_on, p.made_from,
  p.made_to, p.process, p.paper_id, p.location_id, p.description, p.tags, p.fixing_minutes,
  p.washing_minutes, p.tone_status, p.has_processing_risk, p.source_id, p.rights_statement,
  p.marks, p.deleted_at,
  pa.name AS paper_name, pa.fibre AS paper_fibre, n.code AS negative_code,
  n.subject AS negative_subject, ${processing} AS processing
  FROM prints p LEFT JOIN papers pa ON pa.id = p.paper_id
  LEFT JOIN negatives n ON n.id = p.negative_id`;
}

/** Reads prints straight from the tables (no model instances: a build reads 100,000). */
export class DocumentReader {
  private places: Map<number, string> | null = null;
  private readonly printSql: string;

  constructor(
    private sequelize: Sequelize,
    private sources: readonly SearchTextSource[],
  ) {
    this.printSql = printSql(dialectOf(sequelize));
  }

  /** Documents of the prints with id in (after, after + limit], in id order, and the last id. */
  async chunk(
    after: number,
    limit: number,
  ): Promise<{ documents: SearchDocument[]; last: number }> {
    const prints = await this.select<PrintRow>(
      `${this.printSql} WHERE p.id > :after ORDER BY p.id LIMIT :limit`,
      { after, limit },
    );
    if (!prints.length) return { documents: [], last: after };
    return { documents: await this.assemble(prints), last: prints[prints.length - 1]!.id };
  }

  /** Documents of the given prints (deleted ones included); missing ids are absent. */
  async byIds(ids: readonly number[], transaction?: Transaction): Promise<SearchDocument[]> {
    if (!ids.length) return [];
    const prints = await this.select<PrintRow>(
      `${this.printSql} WHERE p.id IN (:ids)`,
      { ids: [...ids] },
      transaction,
    );
    return this.assemble(prints, transaction);
  }

  /**
   * Forget cached place names: a changed place is a `linked` change, published even when
   * no print is there (db/prints-changed.ts), and a new place is read when a print names it.
   */
  forgetPlaces(): void {
    this.places = null;
  }

  private async assemble(prints: PrintRow[], transaction?: Transaction) {
    if (prints.some((print) => print.location_id && !this.places?.has(print.location_id)))
      this.places = null;
    const places = await this.placeNames(transaction);
    const ids = prints.map((print) => print.id);
    const extras = await Promise.all(this.sources.map((s) => s.textFor(ids, transaction)));
    return prints.map((print) =>
      toDocument(
        print,
        places,
        extras.map((e) => e.get(print.id)),
      ),
    );
  }

  private async placeNames(transaction?: Transaction): Promise<Map<number, string>> {
    if (this.places) return this.places;
    const rows = await this.select<{
      id: number;
      name: string;
      code: string;
      parent_id: number | null;
    }>('SELECT id, name, code, parent_id FROM locations', {}, transaction);
    const paths = locationPaths(
      rows.map((row) => ({ id: row.id, name: row.name, parentId: row.parent_id })),
    );
    this.places = new Map(
      rows.map((row) => [row.id, `${row.code} ${paths.get(row.id) ?? row.name}`]),
    );
    return this.places;
  }

  private select<T extends object>(
    sql: string,
    replacements: Record<string, unknown>,
    transaction?: Transaction,
  ): Promise<T[]> {
    return this.sequelize.query<T>(sql, { type: QueryTypes.SELECT, replacements, transaction });
  }
}

const PROCESS_INDEX = new Map<string, number>(PROCESSES.map((p, i) => [p, i]));
const TONE_INDEX = new Map<string, number>(TONE_STATUSES.map((t, i) => [t, i]));

/** A mark's words: what is written and how it reads. */
const markText = (marks: StoredMark[]) =>
  marks.map((mark) => [mark.transcription, mark.reading].filter(Boolean).join(' ')).join(' ');

function toDocument(
  print: PrintRow,
  places: Map<number, string>,
  extras: Array<string | undefined>,
): SearchDocument {
  const tags = print.tags ? readJson<string[]>(print.tags) : [];
  const marks = print.marks ? readJson<StoredMark[]>(print.marks) : [];
  return {
    printId: print.id,
    accessionNumber: print.accession_number,
    title: print.title,
    process: PROCESS_INDEX.get(print.process) ?? 255,
    paperId: print.paper_id ?? 0,
    toneStatus: TONE_INDEX.get(print.tone_status) ?? 0,
    fixingMinutes: print.fixing_minutes ?? Number.NaN,
    washingMinutes: print.washing_minutes ?? Number.NaN,
    madeFrom: dateNumber(print.made_from),
    madeTo: dateNumber(print.made_to),
    risk: Boolean(print.has_processing_risk),
    deleted: print.deleted_at != null,
    sourceId: print.source_id ?? 0,
    rights: rightsColumn(print.rights_statement),
    text: {
      accessionNumber: print.accession_number,
      title: print.title,
      maker: print.maker ?? '',
      tags: tags.join(' '),
      process: print.process,
      paper: [print.paper_name, print.paper_fibre].filter(Boolean).join(' '),
      negative: [print.negative_code, print.negative_subject].filter(Boolean).join(' '),
      description: [print.description, print.made_on].filter(Boolean).join(' '),
      processing: print.processing ?? '',
      extra: extras.filter(Boolean).join(' '),
      marks: markText(marks.filter((mark) => !mark.private)),
      place: print.location_id ? (places.get(print.location_id) ?? '') : '',
      privateMarks: markText(marks.filter((mark) => mark.private)),
    },
  };
}
