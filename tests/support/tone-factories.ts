import type { ToneCheckCreateInput } from '../../shared/schemas/tone';

type Readings = ToneCheckCreateInput['readings'];

/** The four standard patches of a sound salt print, as a spectrophotometer might read them. */
export function buildReadings(change: { dminB?: number; dmaxL?: number } = {}): Readings {
  return [
    { patch: 'dmax', L: change.dmaxL ?? 28.4, a: 6.1, b: 9.8 },
    { patch: 'mid', L: 55.0, a: 4.0, b: 12.0 },
    { patch: 'highlight', L: 88.0, a: 1.0, b: 6.0 },
    { patch: 'dmin', L: 93.0, a: 0.4, b: change.dminB ?? 4.1 },
  ];
}

export function buildToneCheck(
  overrides: Partial<ToneCheckCreateInput> = {},
): ToneCheckCreateInput {
  return {
    checkedOn: '2024-03-02',
    method: 'spectrophotometer',
    instrument: 'Test spectrophotometer',
    illuminant: 'D50',
    observer: '2',
    readings: buildReadings(),
    ...overrides,
  };
}
