import { readFile } from 'node:fs/promises';
import sharp from 'sharp';
import type { AppContext } from '../../context';
import { Asset } from '../../models';
import type { ReportImage } from './render-report';

/**
 * An asset's image for the PDF: the web-size JPEG derivative, or the thumbnail while the
 * web image is still being made in the background; null when neither exists yet.
 */
async function imageOf(ctx: AppContext, asset: Asset): Promise<ReportImage | null> {
  for (const size of ['web', 'thumbnail'] as const) {
    if (!ctx.images.derivatives.has(asset.sha256, size)) continue;
    const bytes = await readFile(ctx.images.derivatives.fileOf(asset.sha256, size));
    const { width, height } = await sharp(bytes).metadata();
    if (width && height) return { bytes, width, height };
  }
  return null;
}

/** The print's first recto image, if it has one. */
export async function loadRecto(ctx: AppContext, printId: number): Promise<ReportImage | null> {
  const asset = await Asset.findOne({ where: { printId, view: 'recto' }, order: [['id', 'ASC']] });
  return asset ? imageOf(ctx, asset) : null;
}

/** The image of an asset, or null when it is gone. */
export async function loadAssetImage(
  ctx: AppContext,
  assetId: number,
): Promise<ReportImage | null> {
  const asset = await Asset.findByPk(assetId);
  return asset ? imageOf(ctx, asset) : null;
}
