import { buildJpeg } from '../../tests/support/images';

/**
 * Gives print `printId` a recto and two detail photographs (uploaded as the archivist)
 * and a condition report that attaches the details, so the PDF figure includes images.
 * Returns how many images the PDF carries.
 */
export async function attachReportImages(
  url: string,
  archivist: Record<string, string>,
  conservator: Record<string, string>,
  printId: number,
): Promise<number> {
  // Three different scans: the same file twice on one print is refused (409).
  const upload = async (view: string, rgb: [number, number, number]) => {
    const form = new FormData();
    form.set('view', view);
    const bytes = new Uint8Array(await buildJpeg(1600, 1200, rgb));
    form.set('file', new Blob([bytes], { type: 'image/jpeg' }), `${view}.jpg`);
    const response = await fetch(`${url}/api/prints/${printId}/assets`, {
      method: 'POST',
      headers: archivist,
      body: form,
    });
    if (response.status !== 201) throw new Error(`upload answered ${response.status}`);
    return ((await response.json()) as { id: number }).id;
  };
  await upload('recto', [150, 110, 80]);
  const details = [await upload('detail', [160, 118, 86]), await upload('raking', [140, 104, 76])];
  const response = await fetch(`${url}/api/prints/${printId}/condition-reports`, {
    method: 'POST',
    headers: { ...conservator, 'content-type': 'application/json' },
    body: JSON.stringify({
      reportedOn: '2026-03-02',
      grade: 'vulnerable',
      observations: [{ term: 'silvering', location: 'image, shadows', severity: 'moderate' }],
      recommendation: 'Rehouse before any loan.',
      images: details.map((assetId) => ({
        assetId,
        area: { x: 0.2, y: 0.2, width: 0.4, height: 0.3 },
        caption: 'Marked area',
      })),
    }),
  });
  if (response.status !== 201) throw new Error(`condition report answered ${response.status}`);
  // Let the background web images finish, so the PDF embeds web size, not thumbnails.
  await new Promise((resolve) => setTimeout(resolve, 3000));
  return 1 + details.length;
}
