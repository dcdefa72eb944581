import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { renderReport } from '../../../server/services/report/render-report';
import { buildPrint } from '../../support/factories';
import { buildReportInput } from '../../support/report';
import { readPdfItems, type PdfTextItem } from '../../support/read-pdf';
import { startTestApp, type TestApp } from '../../support/test-app';

let t: TestApp;
let print: Parameters<typeof renderReport>[0]['print'];
beforeAll(async () => {
  t = await startTestApp();
  const created = await (await t.as('archivist')).post('/api/prints').send(buildPrint());
  print = (await (await t.as('curator')).get(`/api/prints/${created.body.id}`)).body;
});
afterAll(() => t.close());

async function toneTable(): Promise<PdfTextItem[]> {
  const pdf = await renderReport(
    buildReportInput(print, {
      comparison: [
        {
          patch: 'dmax',
          dL: 1.25,
          da: -0.4,
          db: 0.8,
          dE00: 1.37,
          density: 1.4213,
          dDensity: -0.0512,
        },
      ],
      trend: [{ patch: 'dmax', series: [{ checkedOn: '2024-01-10', dE00: 0 }] }],
    }),
  );
  return readPdfItems(pdf);
}

/** The pieces of text on the same baseline as `first`, left to right. */
function lineOf(items: PdfTextItem[], first: string): PdfTextItem[] {
  const anchor = items.find((item) => item.text === first);
  if (!anchor) throw new Error(`no "${first}" in the PDF`);
  return items
    .filter((item) => item.page === anchor.page && Math.abs(item.y - anchor.y) < 1)
    .sort((a, b) => a.x - b.x);
}

describe('the report PDF tone table', () => {
  it('sets each Δ heading beside its letters, never over them, in reading order', async () => {
    const header = lineOf(await toneTable(), 'Patch');
    for (let i = 1; i < header.length; i += 1) {
      const before = header[i - 1]!;
      // Pieces of one line may touch (Δ then L*) but never overlap.
      expect(header[i]!.x, `${before.text} / ${header[i]!.text}`).toBeGreaterThanOrEqual(
        before.x + before.width - 0.5,
      );
    }
    expect(
      header
        .map((item) => item.text)
        .join('')
        .replace(/\s+/g, ''),
    ).toBe('PatchΔL*Δa*Δb*ΔE00DensityΔD');
  });

  it('gives density and its change with 3 decimals, as the screen does', async () => {
    const row = lineOf(await toneTable(), 'dmax').map((item) => item.text.trim());
    expect(row).toContain('1.421');
    expect(row).toContain('−0.051');
  });
});
