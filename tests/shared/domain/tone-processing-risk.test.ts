import { describe, expect, it } from 'vitest';
import { derivePrintFields } from '../../../shared/domain/print-derived';
import { toneBaselineRiskReasons } from '../../../shared/domain/tone-processing-risk';

// Common practice of salt printers: tones shift for days as a print dries down, so a
// baseline measured on the day the print was made is not a fair reference.
describe('baseline measured on the day the print was made', () => {
  it('is a processing risk with a plain reason', () => {
    const [reason] = toneBaselineRiskReasons('2026-05-14', '2026-05-14', '2026-05-14');
    expect(reason).toMatchObject({ code: 'early-baseline', severity: 'risk' });
    expect(reason!.message).toMatch(/2026-05-14, the day the print was made/);
  });

  it('not when measured later, nor when the making date is only approximate', () => {
    expect(toneBaselineRiskReasons('2026-05-14', '2026-05-14', '2026-06-01')).toEqual([]);
    expect(toneBaselineRiskReasons('2026-01-01', '2026-12-31', '2026-01-01')).toEqual([]);
    expect(toneBaselineRiskReasons('2026-05-14', '2026-05-14', null)).toEqual([]);
  });

  it('is stored with the processing reasons and makes the print searchable as at risk', () => {
    const fields = derivePrintFields({
      madeOn: '2026-05-14',
      process: 'cyanotype',
      processing: [{ stage: 'washing', minutes: 20 }],
      toneBaselineOn: '2026-05-14',
    });
    expect(fields.riskReasons.map((r) => r.code)).toEqual(['early-baseline']);
    expect(fields.hasProcessingRisk).toBe(true);
  });
});
