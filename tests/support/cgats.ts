/**
 * A CGATS.17 instrument file as the tone import reads it: `rows` are data lines
 * (`<id> "<accession>/<patch>" L a b`), `keywords` further header lines (`ORIGINATOR`, …).
 */
export function buildCgatsFile(
  rows: string[],
  options: { created?: string; keywords?: Record<string, string> } = {},
): Buffer {
  return Buffer.from(
    [
      'CGATS.17',
      `CREATED "${options.created ?? '2026-06-01'}"`,
      ...Object.entries(options.keywords ?? {}).map(([key, value]) => `${key} "${value}"`),
      'BEGIN_DATA_FORMAT',
      'SAMPLE_ID SAMPLE_NAME LAB_L LAB_A LAB_B',
      'END_DATA_FORMAT',
      'BEGIN_DATA',
      ...rows,
      'END_DATA',
      '',
    ].join('\n'),
  );
}
