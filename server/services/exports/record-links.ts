import { findAssetViewsOfPrints } from '../../repositories/asset-repository';

/** Links a record's linked-data document points to once the print has images (paths on this server). */
export interface RecordLinks {
  imageUrl: string | null;
  manifestUrl: string | null;
}

/** The recto image (web size) and IIIF manifest of each print, for the JSON-LD documents. */
export async function recordLinksOf(
  printIds: readonly number[],
): Promise<Map<number, RecordLinks>> {
  const links = new Map<number, RecordLinks>(
    printIds.map((id) => [id, { imageUrl: null, manifestUrl: null }]),
  );
  const assets = await findAssetViewsOfPrints(printIds);
  for (const asset of assets) {
    const link = links.get(asset.printId)!;
    link.manifestUrl = `/api/prints/${asset.printId}/manifest.json`;
    if (asset.view === 'recto' && !link.imageUrl) link.imageUrl = `/api/assets/${asset.id}/web`;
  }
  return links;
}
