import type { PrintCreateInput } from '../../shared/schemas/print';
import type { ProcessingStepInput } from '../../shared/schemas/processing-step';

/** The six steps of a sound salt print, as in the contract's example body. */
export function buildSaltSteps(
  overrides: { fixing?: number; washing?: number } = {},
): ProcessingStepInput[] {
  return [
    {
      stage: 'salting',
      chemical: 'sodium chloride',
      concentrationPercent: 2,
      method: 'floated',
      minutes: 3,
    },
    {
      stage: 'sensitizing',
      chemical: 'silver nitrate',
      concentrationPercent: 12,
      method: 'swabbed',
      coats: 2,
    },
    { stage: 'exposure', lightSource: 'open shade', minutes: 40 },
    { stage: 'prewash', minutes: 2 },
    {
      stage: 'fixing',
      chemical: 'sodium thiosulfate',
      concentrationPercent: 15,
      minutes: overrides.fixing ?? 12,
      temperatureC: 20,
    },
    { stage: 'washing', minutes: overrides.washing ?? 20 },
  ];
}

export function buildPrint(overrides: Partial<PrintCreateInput> = {}): PrintCreateInput {
  return {
    title: 'Mill pond at dusk',
    maker: 'Test Maker',
    madeOn: '2026-05-14',
    process: 'salt print',
    imageWidthMm: 101.6,
    imageHeightMm: 127,
    sheetWidthMm: 127,
    sheetHeightMm: 178,
    status: 'in storage',
    description: 'A test print.',
    tags: ['pond', 'dusk'],
    processing: buildSaltSteps(),
    ...overrides,
  };
}
