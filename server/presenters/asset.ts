import type { AssetRecord } from '../../shared/types/asset';
import type { Asset } from '../models';

/** Where an asset's files are served (contract: `GET /api/assets/:id/:size`). */
export function assetUrls(id: number): AssetRecord['urls'] {
  return {
    original: `/api/assets/${id}/original`,
    web: `/api/assets/${id}/web`,
    thumbnail: `/api/assets/${id}/thumbnail`,
    iiif: `/api/iiif/${id}`,
  };
}

/** The list thumbnail of a print whose recto is known. */
export function thumbnailUrl(rectoAssetId: number | null | undefined): string | null {
  return rectoAssetId ? assetUrls(rectoAssetId).thumbnail : null;
}

/**
 * What anyone reading a record sees of an image that failed; the exception itself goes to
 * the server log (`ImageJobs`), never to the client.
 */
export const IMAGE_FAILED = 'This image could not be processed.';

/** What an asset's answer is made from: a model instance or a record read in plain SQL. */
export type PresentableAsset = Pick<
  Asset,
  | 'id'
  | 'printId'
  | 'view'
  | 'originalName'
  | 'mediaType'
  | 'bytes'
  | 'sha256'
  | 'width'
  | 'height'
  | 'exif'
  | 'status'
  | 'progress'
  | 'error'
  | 'lastFixityAt'
  | 'lastFixityResult'
  | 'createdAt'
>;

export function presentAsset(asset: PresentableAsset): AssetRecord {
  return {
    id: asset.id,
    printId: asset.printId,
    view: asset.view,
    originalName: asset.originalName,
    mediaType: asset.mediaType,
    bytes: asset.bytes,
    sha256: asset.sha256,
    width: asset.width,
    height: asset.height,
    exif: asset.exif,
    status: asset.status,
    progress: asset.progress,
    error: asset.status === 'failed' || asset.error ? IMAGE_FAILED : null,
    urls: assetUrls(asset.id),
    fixity:
      asset.lastFixityAt && asset.lastFixityResult
        ? { checkedAt: asset.lastFixityAt.toISOString(), result: asset.lastFixityResult }
        : null,
    createdAt: asset.createdAt.toISOString(),
  };
}
