import type { AppContext } from '../../context';
import type { ReportImage } from './render-report';

/**
 * Images for the PDF. Until the images area (assets, storage) is merged, prints have no
 * images, so there is nothing to load.
 */
export async function loadRecto(ctx: AppContext, printId: number): Promise<ReportImage | null> {
  void ctx;
  void printId;
  return null;
}

/** The web-size image of an asset as JPEG bytes, or null when it is gone. */
export async function loadAssetImage(
  ctx: AppContext,
  assetId: number,
): Promise<ReportImage | null> {
  void ctx;
  void assetId;
  return null;
}
