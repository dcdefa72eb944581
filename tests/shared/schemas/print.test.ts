import { describe, expect, it } from 'vitest';
import { PrintCreateSchema, PrintUpdateSchema } from '../../../shared/schemas/print';
import { ProcessingStepSchema } from '../../../shared/schemas/processing-step';

const paths = (result: { success: boolean; error?: { issues: Array<{ path: PropertyKey[] }> } }) =>
  result.error?.issues.map((issue) => issue.path.join('.')) ?? [];

describe('processing step schema', () => {
  it('needs minutes on a fixing or washing step but not on sensitizing', () => {
    expect(paths(ProcessingStepSchema.safeParse({ stage: 'fixing' }))).toEqual(['minutes']);
    expect(paths(ProcessingStepSchema.safeParse({ stage: 'washing' }))).toEqual(['minutes']);
    expect(ProcessingStepSchema.safeParse({ stage: 'sensitizing', coats: 2 }).success).toBe(true);
  });

  it('keeps concentrations within 0–100 % and temperatures plausible', () => {
    expect(
      paths(ProcessingStepSchema.safeParse({ stage: 'salting', concentrationPercent: 101 })),
    ).toEqual(['concentrationPercent']);
    expect(
      paths(ProcessingStepSchema.safeParse({ stage: 'washing', minutes: 5, temperatureC: 80 })),
    ).toEqual(['temperatureC']);
  });
});

describe('print schemas', () => {
  it('fills defaults on create and turns blank text into null', () => {
    const parsed = PrintCreateSchema.parse({ title: 'Weir', process: 'salt print', maker: '  ' });
    expect(parsed).toMatchObject({ status: 'in storage', tags: [], processing: [], maker: null });
  });

  it('keeps an update partial: absent fields stay absent', () => {
    expect(PrintUpdateSchema.parse({ title: 'New' })).toEqual({ title: 'New' });
  });

  it('says a made date that does not exist is not a date; other text gets the forms', () => {
    const message = (madeOn: string) =>
      PrintCreateSchema.safeParse({ title: 'x', process: 'salt print', madeOn }).error?.issues[0]
        ?.message;
    expect(message('2024-02-31')).toBe('2024-02-31 is not a date: February 2024 has 29 days.');
    expect(message('someday')).toMatch(/^Use a date like 2026-05-14, 2026-05, 2026/);
  });

  it('refuses unknown fields on update and unreadable dates', () => {
    expect(paths(PrintUpdateSchema.safeParse({ colour: 'red' }))).toEqual(['']);
    expect(
      paths(PrintCreateSchema.safeParse({ title: 'x', process: 'salt print', madeOn: 'someday' })),
    ).toEqual(['madeOn']);
  });
});

const messagesAt = (input: unknown) => {
  const result = PrintCreateSchema.safeParse(input);
  if (result.success) return {};
  return Object.fromEntries(
    result.error.issues.map((issue) => [issue.path.join('.'), issue.message]),
  );
};

describe('print schema: sizes and numbers in plain words', () => {
  // A 4×5 in image on a 5×7 in sheet is usual (common practice); the image cannot be
  // wider or higher than the paper it is printed on.
  it('refuses a sheet smaller than its image, on the sheet field, in plain words', () => {
    const messages = messagesAt({
      title: 'Weir',
      process: 'salt print',
      imageWidthMm: 127,
      imageHeightMm: 178,
      sheetWidthMm: 101.6,
      sheetHeightMm: 178,
    });
    expect(messages).toEqual({
      sheetWidthMm: 'The sheet must be at least as wide as the image (127 mm)',
    });
    expect(
      PrintCreateSchema.safeParse({
        title: 'Weir',
        process: 'salt print',
        imageWidthMm: 101.6,
        imageHeightMm: 127,
        sheetWidthMm: 127,
        sheetHeightMm: 178,
      }).success,
    ).toBe(true);
  });

  // What a form sends for "ten" typed into Minutes: not a number, never "missing".
  it('says "Enter minutes as a number" for minutes that are not a number', () => {
    const messages = messagesAt({
      title: 'Weir',
      process: 'salt print',
      processing: [{ stage: 'fixing', minutes: Number.NaN }],
    });
    expect(messages['processing.0.minutes']).toBe('Enter minutes as a number');
  });
});
