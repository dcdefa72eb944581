import { describe, expect, it } from 'vitest';
import {
  hasProcessingRisk,
  processingRiskReasons,
  totalMinutes,
  type TimedStep,
} from '../../../shared/domain/processing';

const salt = (fixing: number, washing: number, prewash = true): TimedStep[] => [
  { stage: 'salting', minutes: 3 },
  { stage: 'sensitizing' },
  { stage: 'exposure', minutes: 40 },
  ...(prewash ? [{ stage: 'prewash' as const, minutes: 2 }] : []),
  { stage: 'fixing', minutes: fixing },
  { stage: 'washing', minutes: washing },
];
const codes = (
  steps: TimedStep[],
  process: Parameters<typeof processingRiskReasons>[1] = 'salt print',
) => processingRiskReasons(steps, process).map((reason) => reason.code);

describe('totals', () => {
  it('sums every bath of a stage and says null when the stage is absent', () => {
    expect(totalMinutes([...salt(6, 10), { stage: 'fixing', minutes: 5 }], 'fixing')).toBe(11);
    expect(totalMinutes(salt(6, 10), 'toning')).toBeNull();
  });
});

// Rules of thumb of salt printing (common practice): fix at least 10 minutes in sodium
// thiosulfate; wash at least 5 minutes, better 10 or more; pre-wash before the fixer.
describe('processing risk', () => {
  it('finds nothing wrong with a print fixed 10 and washed 10 minutes after a pre-wash', () => {
    expect(codes(salt(10, 10))).toEqual([]);
  });

  it('flags a fix under 10 minutes', () => {
    expect(codes(salt(9.5, 20))).toEqual(['short-fixing']);
  });

  it('flags a wash under 5 minutes as a risk and 5–9 minutes as advice only', () => {
    expect(codes(salt(12, 4))).toEqual(['short-washing']);
    const brief = processingRiskReasons(salt(12, 5), 'salt print');
    expect(brief.map((reason) => [reason.code, reason.severity])).toEqual([
      ['brief-washing', 'advice'],
    ]);
    expect(hasProcessingRisk(brief)).toBe(false);
  });

  it('flags a missing pre-wash and a missing fix', () => {
    expect(codes(salt(12, 20, false))).toEqual(['no-prewash']);
    expect(codes(salt(12, 20).filter((step) => step.stage !== 'fixing'))).toEqual(['no-fixing']);
  });

  // Common practice: the sensitiser is soluble silver nitrate; water before exposure washes
  // it off, so a pre-wash there is a mistake and does not count as the pre-wash.
  it('flags a pre-wash placed before exposure, and says the print had no pre-wash', () => {
    const steps = salt(12, 20);
    const prewash = steps.find((step) => step.stage === 'prewash')!;
    const early = [steps[0]!, steps[1]!, prewash, steps[2]!, steps[4]!, steps[5]!];
    const reasons = processingRiskReasons(early, 'salt print');
    expect(reasons.map((reason) => reason.code)).toEqual(['prewash-before-exposure', 'no-prewash']);
    expect(reasons[0]!.basis).toMatch(/common practice/i);
  });

  // A history of fixing and washing alone (an import of two columns) says nothing of what
  // came before the fixer: not knowing is not the same as no pre-wash.
  it('does not claim a missing pre-wash when the history does not record the exposure', () => {
    expect(
      codes([
        { stage: 'fixing', minutes: 12 },
        { stage: 'washing', minutes: 20 },
      ]),
    ).toEqual([]);
  });

  it('does not ask a cyanotype to be fixed or pre-washed, only washed', () => {
    const cyanotype: TimedStep[] = [
      { stage: 'exposure', minutes: 12 },
      { stage: 'washing', minutes: 3 },
    ];
    expect(codes(cyanotype, 'cyanotype')).toEqual(['short-washing']);
  });

  it('says nothing when no history was recorded', () => {
    expect(codes([])).toEqual([]);
  });
});

// Batch rules (common practice): a fixer marked exhausted no longer fixes; a bath fixes a
// limited number of sheets. They apply only when the caller knows the batch facts.
describe('processing risk from fixer batches', () => {
  const steps = salt(12, 20);
  const batch = {
    id: 1,
    code: 'FIX-1',
    exhaustedOn: '2024-03-01',
    sheetsThrough: 10,
    capacitySheets: 40,
  };
  const batchCodes = (context: Parameters<typeof processingRiskReasons>[2]) =>
    processingRiskReasons(steps, 'salt print', context).map((reason) => reason.code);

  it('says nothing more without a context, as before', () => {
    expect(processingRiskReasons(steps, 'salt print')).toEqual([]);
  });

  it('flags a print made after its fixer was marked exhausted, not one made that day or before', () => {
    expect(batchCodes({ madeFrom: '2024-03-02', fixerBatches: [batch] })).toEqual([
      'exhausted-fixer',
    ]);
    expect(batchCodes({ madeFrom: '2024-03-01', fixerBatches: [batch] })).toEqual([]);
    expect(batchCodes({ madeFrom: null, fixerBatches: [batch] })).toEqual([]);
  });

  // "c. 2025" spans 2023-01-01 to 2027-12-31 (CIRCA_SPREAD_YEARS): a batch exhausted in
  // 2024 may have fixed it after it was spent.
  it('flags an exhausted fixer as possible when an approximate date reaches past it', () => {
    const circa = { madeFrom: '2023-01-01', madeTo: '2027-12-31', fixerBatches: [batch] };
    const [reason] = processingRiskReasons(steps, 'salt print', circa);
    expect(reason?.code).toBe('possibly-exhausted-fixer');
    expect(reason?.message).toMatch(/may have been fixed/);
    expect(reason?.basis).toMatch(/common practice/i);
    expect(
      batchCodes({ madeFrom: '2020-01-01', madeTo: '2024-02-28', fixerBatches: [batch] }),
    ).toEqual([]);
    expect(
      batchCodes({ madeFrom: '2024-03-01', madeTo: '2024-03-01', fixerBatches: [batch] }),
    ).toEqual([]);
  });

  it('flags a bath used past its capacity, and cites the basis of each rule', () => {
    const over = { ...batch, exhaustedOn: null, sheetsThrough: 40.5 };
    const [reason] = processingRiskReasons(steps, 'salt print', { fixerBatches: [over] });
    expect(reason?.code).toBe('fixer-over-capacity');
    expect(reason?.basis).toMatch(/common practice/i);
    expect(batchCodes({ fixerBatches: [{ ...over, sheetsThrough: 40 }] })).toEqual([]);
    expect(batchCodes({ fixerBatches: [{ ...over, capacitySheets: null }] })).toEqual([]);
  });

  it('does not apply fixer rules to processes that are not fixed', () => {
    const cyanotype = [{ stage: 'washing' as const, minutes: 20 }];
    const context = { madeFrom: '2025-01-01', fixerBatches: [batch] };
    expect(processingRiskReasons(cyanotype, 'cyanotype', context)).toEqual([]);
  });

  // A check of the records, not a rule of thumb: a bath mixed after the print was made cannot
  // have fixed it. Advice, so the print is not counted as a processing concern for it.
  it('advises when the fixer was mixed after the print was made, even at an approximate date', () => {
    const mixed = { ...batch, exhaustedOn: null, madeOn: '2025-04-12' };
    const [early] = processingRiskReasons(steps, 'salt print', {
      madeFrom: '2023-04-01',
      madeTo: '2023-04-30',
      fixerBatches: [mixed],
    });
    expect(early).toMatchObject({ code: 'fixer-mixed-after-print', severity: 'advice' });
    expect(early?.message).toContain('2023-04-01 to 2023-04-30');
    expect(hasProcessingRisk([early!])).toBe(false);
    // Made that day, later, or at a date that may reach the mixing: nothing to say.
    expect(batchCodes({ madeFrom: '2025-04-12', fixerBatches: [mixed] })).toEqual([]);
    expect(batchCodes({ madeFrom: '2026-01-01', fixerBatches: [mixed] })).toEqual([]);
    expect(
      batchCodes({ madeFrom: '2023-01-01', madeTo: '2027-12-31', fixerBatches: [mixed] }),
    ).toEqual([]);
    // No mixing date on the record, or no date on the print: nothing to compare.
    expect(
      batchCodes({ madeFrom: '2023-04-01', fixerBatches: [{ ...mixed, madeOn: null }] }),
    ).toEqual([]);
    expect(batchCodes({ madeFrom: null, fixerBatches: [mixed] })).toEqual([]);
  });
});
