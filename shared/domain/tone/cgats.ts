/** A CGATS.17 (ISO 28178) ASCII measurement file, read as text. */
export interface CgatsFile {
  /** Header keywords and their values, quotes removed (`CREATED`, `ORIGINATOR`, …). */
  keywords: Record<string, string>;
  fields: string[];
  /** Each data row with its 1-based line number in the file. */
  rows: Array<{ line: number; values: Record<string, string> }>;
}

export class CgatsError extends Error {
  constructor(
    readonly line: number,
    message: string,
  ) {
    super(`Line ${line}: ${message}`);
  }
}

/** Splits a line into tokens: runs of non-blanks or "quoted strings"; `#` starts a comment. */
export function tokenize(text: string, line: number): string[] {
  const tokens: string[] = [];
  let i = 0;
  while (i < text.length) {
    const ch = text[i]!;
    if (ch === ' ' || ch === '\t' || ch === '\r') {
      i += 1;
    } else if (ch === '#') {
      break;
    } else if (ch === '"') {
      const end = text.indexOf('"', i + 1);
      if (end < 0) throw new CgatsError(line, 'a quoted string is not closed');
      tokens.push(text.slice(i + 1, end));
      i = end + 1;
    } else {
      let end = i;
      while (end < text.length && !/[\s#"]/.test(text[end]!)) end += 1;
      tokens.push(text.slice(i, end));
      i = end;
    }
  }
  return tokens;
}

type Section = 'header' | 'format' | 'data' | 'done';

/** Parses the file; throws CgatsError naming the line of the first malformation. */
export function parseCgats(text: string): CgatsFile {
  const lines = text.split('\n');
  const file: CgatsFile = { keywords: {}, fields: [], rows: [] };
  let section = 'header' as Section;
  let sawFormat = false;
  for (const [index, raw] of lines.entries()) {
    const line = index + 1;
    const tokens = tokenize(raw, line);
    if (tokens.length === 0) continue;
    const [first, ...rest] = tokens as [string, ...string[]];
    if (section === 'header') {
      if (first === 'BEGIN_DATA_FORMAT') {
        section = 'format';
        sawFormat = true;
      } else if (first === 'BEGIN_DATA') {
        if (!sawFormat) throw new CgatsError(line, 'BEGIN_DATA before any BEGIN_DATA_FORMAT');
        section = 'data';
      } else if (/^[A-Z][A-Z0-9_./-]*$/i.test(first)) {
        file.keywords[first] = rest.join(' ');
      } else {
        throw new CgatsError(line, `unexpected "${first}" in the header`);
      }
    } else if (section === 'format') {
      if (first === 'END_DATA_FORMAT') section = 'header';
      else file.fields.push(...tokens);
      if (tokens.includes('END_DATA_FORMAT') && first !== 'END_DATA_FORMAT') {
        throw new CgatsError(line, 'END_DATA_FORMAT must stand on its own line');
      }
    } else if (section === 'data') {
      if (first === 'END_DATA') {
        section = 'done';
        continue;
      }
      if (tokens.length !== file.fields.length) {
        throw new CgatsError(
          line,
          `${tokens.length} values where the data format names ${file.fields.length} fields`,
        );
      }
      const values: Record<string, string> = {};
      file.fields.forEach((field, i) => (values[field] = tokens[i]!));
      file.rows.push({ line, values });
    }
  }
  const last = lines.length;
  if (!sawFormat) throw new CgatsError(last, 'no BEGIN_DATA_FORMAT … END_DATA_FORMAT section');
  if (section === 'format') throw new CgatsError(last, 'END_DATA_FORMAT is missing');
  if (section === 'data') throw new CgatsError(last, 'END_DATA is missing');
  if (section === 'header') throw new CgatsError(last, 'no BEGIN_DATA … END_DATA section');
  return file;
}
