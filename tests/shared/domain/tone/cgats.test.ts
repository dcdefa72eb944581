import { describe, expect, it } from 'vitest';
import { CgatsError, parseCgats } from '../../../../shared/domain/tone/cgats';

// The layout of ANSI CGATS.17 / ISO 28178: header keywords, the data format between
// BEGIN_DATA_FORMAT and END_DATA_FORMAT, rows between BEGIN_DATA and END_DATA, quoted
// strings, # comments, tabs or spaces between values.
const FILE = [
  'CGATS.17',
  'ORIGINATOR\t"Store room spectrophotometer"',
  'CREATED "2026-06-01"  # the day of the round',
  'NUMBER_OF_FIELDS 5',
  'BEGIN_DATA_FORMAT',
  'SAMPLE_ID SAMPLE_NAME',
  'LAB_L\tLAB_A LAB_B',
  'END_DATA_FORMAT',
  'NUMBER_OF_SETS 2',
  'BEGIN_DATA',
  '1 "2024.0001/dmax" 28.40 6.10 9.80',
  '# a comment between rows',
  '2\t"2024.0001/bare paper, left"\t93.0\t0.4\t4.1',
  'END_DATA',
].join('\n');

describe('CGATS.17 reader', () => {
  it('reads keywords, fields over several lines, quoted names with spaces and tabs', () => {
    const file = parseCgats(FILE);
    expect(file.keywords.CREATED).toBe('2026-06-01');
    expect(file.keywords.ORIGINATOR).toBe('Store room spectrophotometer');
    expect(file.fields).toEqual(['SAMPLE_ID', 'SAMPLE_NAME', 'LAB_L', 'LAB_A', 'LAB_B']);
    expect(file.rows).toEqual([
      {
        line: 11,
        values: {
          SAMPLE_ID: '1',
          SAMPLE_NAME: '2024.0001/dmax',
          LAB_L: '28.40',
          LAB_A: '6.10',
          LAB_B: '9.80',
        },
      },
      {
        line: 13,
        values: {
          SAMPLE_ID: '2',
          SAMPLE_NAME: '2024.0001/bare paper, left',
          LAB_L: '93.0',
          LAB_A: '0.4',
          LAB_B: '4.1',
        },
      },
    ]);
  });

  it('names the line of a row with the wrong number of values', () => {
    const broken = FILE.replace(
      '1 "2024.0001/dmax" 28.40 6.10 9.80',
      '1 "2024.0001/dmax" 28.40 6.10',
    );
    expect(() => parseCgats(broken)).toThrow(CgatsError);
    expect(() => parseCgats(broken)).toThrow(/^Line 11: 4 values/);
  });

  it('names the line of an unclosed quote, and says what section is missing', () => {
    expect(() => parseCgats(FILE.replace('"2024.0001/dmax"', '"2024.0001/dmax'))).toThrow(
      /^Line 11:/,
    );
    expect(() => parseCgats(FILE.replace('END_DATA\n', '').replace(/\nEND_DATA$/, ''))).toThrow(
      /END_DATA is missing/,
    );
    expect(() => parseCgats('CGATS.17\nCREATED "x"')).toThrow(/no BEGIN_DATA_FORMAT/);
    expect(() => parseCgats('CGATS.17\n12.5 bad')).toThrow(/^Line 2: unexpected/);
  });
});
