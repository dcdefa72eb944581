import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { SolutionQuerySchema } from '../../../shared/schemas/chemistry';
import { MESSAGES } from '../../../shared/schemas/messages';
import { PrintCreateSchema, PrintQuerySchema } from '../../../shared/schemas/print';
import { ToneCheckCreateSchema } from '../../../shared/schemas/tone';

/** zod's own English wording, which must never reach people. */
const RAW =
  /Invalid input|expected .* received|Too small|Too big|Invalid option|Invalid string|Unrecognized key/i;

const messages = (result: { success: boolean; error?: z.ZodError }) =>
  result.error?.issues.map((issue) => issue.message) ?? [];

describe('validation messages in our own words', () => {
  const cases: Array<[string, { success: boolean; error?: z.ZodError }]> = [
    [
      'print create',
      PrintCreateSchema.safeParse({
        title: null,
        process: 'daguerreotype',
        status: 42,
        tags: [''],
        processing: [{ stage: 'washing', minutes: 'ten' }],
        imageWidthMm: 'wide',
      }),
    ],
    [
      'tone check',
      ToneCheckCreateSchema.safeParse({
        checkedOn: null,
        method: 'eyeball',
        illuminant: '',
        observer: 5,
        baseline: 'yes',
        readings: [{ patch: 'Dmax', L: null, a: 'x', b: undefined }],
      }),
    ],
    ['tone check, nothing sent', ToneCheckCreateSchema.safeParse(null)],
    ['solution query', SolutionQuerySchema.safeParse({ chemical: null, percent: 'lots' })],
    ['print query', PrintQuerySchema.safeParse({ page: 'two', sort: 'sideways' })],
  ];

  it.each(cases)('%s: no message is zod text', (_name, result) => {
    const said = messages(result);
    expect(said.length).toBeGreaterThan(0);
    for (const message of said) {
      expect(message).not.toMatch(RAW);
      expect(message.trim()).not.toBe('');
    }
  });

  it('says what to do for a missing number, a wrong type and an unknown choice', () => {
    const schema = z.object({ n: z.number(), s: z.string(), pick: z.enum(['x', 'y']) });
    const said = messages(schema.safeParse({ n: null, s: 3, pick: 'z' }));
    expect(said).toEqual([MESSAGES.required, MESSAGES.text, MESSAGES.choice]);
  });

  it('gives limits in plain words', () => {
    expect(messages(z.number().min(2).safeParse(1))).toEqual(['Use 2 or more.']);
    expect(messages(z.string().max(3).safeParse('abcd'))).toEqual(['Use at most 3 characters.']);
    expect(messages(z.string().min(1).safeParse(''))).toEqual([MESSAGES.required]);
  });

  it('says a day that does not exist is not a date, and asks for the form otherwise', () => {
    expect(messages(z.iso.date().safeParse('2026-02-30'))).toEqual([
      '2026-02-30 is not a date: February 2026 has 28 days.',
    ]);
    expect(messages(z.iso.date().safeParse('next week'))).toEqual([MESSAGES.date]);
  });
});
