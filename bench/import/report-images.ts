/**
 * Gives print `printId` a condition report for the PDF figure. Images are attached once
 * the images area is merged (assets upload); until then the report has none.
 * Returns how many images the report carries.
 */
export async function attachReportImages(
  url: string,
  _archivist: Record<string, string>,
  conservator: Record<string, string>,
  printId: number,
): Promise<number> {
  const response = await fetch(`${url}/api/prints/${printId}/condition-reports`, {
    method: 'POST',
    headers: { ...conservator, 'content-type': 'application/json' },
    body: JSON.stringify({
      reportedOn: '2026-03-02',
      grade: 'vulnerable',
      observations: [{ term: 'silvering', location: 'image, shadows', severity: 'moderate' }],
      recommendation: 'Rehouse before any loan.',
    }),
  });
  if (response.status !== 201) throw new Error(`condition report answered ${response.status}`);
  return 0;
}
