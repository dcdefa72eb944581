import { describe, expect, it } from 'vitest';
import {
  formatMarks,
  formatOwners,
  parseMarks,
  parseOwners,
} from '../../../../shared/domain/registrar/cells';

describe('registrar cells', () => {
  it('writes and reads back a chain of owners, dates as written', () => {
    const links = [
      { owner: 'The maker', from: 'c. 1905', to: '1931' },
      { owner: 'Edith Ollis', from: '1931', to: null },
      { owner: 'A. Dealer', from: null, to: '2017–2019' },
      { owner: 'Marguerite Ollis', from: null, to: null },
    ];
    const cell = formatOwners(links);
    expect(cell).toBe(
      'The maker (c. 1905 to 1931); Edith Ollis (from 1931); A. Dealer (until 2017–2019); Marguerite Ollis',
    );
    expect(parseOwners(cell)).toEqual(links);
    expect(parseOwners('Jane Roe (1950s)')).toEqual([
      { owner: 'Jane Roe', from: '1950s', to: '1950s' },
    ]);
    expect(parseOwners('  ')).toEqual([]);
  });

  it('writes and reads back marks, and names the first unreadable one', () => {
    const marks = [
      {
        position: 'verso' as const,
        kind: 'pencil inscription' as const,
        transcription: 'No. 4, proof: A',
      },
      { position: 'mount' as const, kind: 'blind stamp' as const, transcription: 'J. T. STUDIO' },
    ];
    const cell = formatMarks(marks);
    expect(cell).toBe(
      'verso, pencil inscription: No. 4, proof: A | mount, blind stamp: J. T. STUDIO',
    );
    expect(parseMarks(cell)).toEqual({ marks });
    expect(parseMarks('Verso, Ink Stamp: OK | back, pencil: x')).toEqual({ unreadable: 2 });
    expect(parseMarks('just some words')).toEqual({ unreadable: 1 });
  });
});
