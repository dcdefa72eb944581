import type { ReportInput } from '../../server/services/report/render-report';
import type { ToneReportData } from '../../server/services/report/tone-source';

/**
 * What `renderReport` needs for `print`: produced by a conservator on 2026-06-01, no condition
 * report, treatments or images unless `overrides` give them, and a tone section from a
 * 2024-01-10 baseline to a 2026-01-12 check (status watch, noticeable at ΔE00 2) with these
 * comparison rows and trend.
 */
export function buildReportInput(
  print: ReportInput['print'],
  tone: Pick<ToneReportData, 'comparison' | 'trend'>,
  overrides: Partial<ReportInput> = {},
): ReportInput {
  return {
    print,
    producedBy: { name: 'Ada Example', role: 'conservator' },
    producedAt: new Date('2026-06-01T10:00:00Z'),
    condition: null,
    treatments: [],
    recto: null,
    conditionImages: [],
    tone: {
      baselineOn: '2024-01-10',
      latestOn: '2026-01-12',
      status: 'watch',
      noticeableDE00: 2,
      ...tone,
    },
    ...overrides,
  };
}
