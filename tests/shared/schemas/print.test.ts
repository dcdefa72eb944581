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

  it('refuses unknown fields on update and unreadable dates', () => {
    expect(paths(PrintUpdateSchema.safeParse({ colour: 'red' }))).toEqual(['']);
    expect(
      paths(PrintCreateSchema.safeParse({ title: 'x', process: 'salt print', madeOn: 'someday' })),
    ).toEqual(['madeOn']);
  });
});
