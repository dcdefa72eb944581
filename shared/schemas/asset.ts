import { z } from 'zod';
import './messages';
import { ASSET_SIZES, ASSET_VIEWS } from '../domain/asset-views';

/** The form fields beside the file in `POST /api/prints/:id/assets`. */
export const AssetUploadSchema = z.object({
  view: z.enum(ASSET_VIEWS, { error: `Choose one of: ${ASSET_VIEWS.join(', ')}` }),
  /**
   * `refuse`: the same file (by SHA-256) already on this print is answered 409 instead of
   * stored again. The app's upload panel sends it; without it an upload is stored, as the
   * contract's `POST /api/prints/:id/assets` promises for any image.
   */
  repeat: z.enum(['refuse', 'store']).default('store'),
});
export type AssetUploadInput = z.infer<typeof AssetUploadSchema>;

export const AssetSizeParamsSchema = z.object({
  id: z.coerce.number().int().positive(),
  size: z.enum(ASSET_SIZES),
});

const pixel = z.number().int('Whole pixels').nonnegative();

/** A rectangle in the original's pixels (after orientation), for a colour sample. */
export const SampleRegionSchema = z.object({
  x: pixel,
  y: pixel,
  width: pixel.positive(),
  height: pixel.positive(),
});
export type SampleRegionInput = z.infer<typeof SampleRegionSchema>;
