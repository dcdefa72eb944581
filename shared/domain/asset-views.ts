/** What an image of a print shows (design §3, Asset). */
export const ASSET_VIEWS = [
  'recto',
  'verso',
  'detail',
  'raking',
  'ultraviolet',
  'reference',
] as const;
export type AssetView = (typeof ASSET_VIEWS)[number];

/** Sizes served by `GET /api/assets/:id/:size` (contract). */
export const ASSET_SIZES = ['thumbnail', 'web', 'original'] as const;
export type AssetSize = (typeof ASSET_SIZES)[number];

/** Long side of each derivative, in pixels (contract: ≤ 400 and ≤ 2048). */
export const DERIVATIVE_LONG_SIDE = { thumbnail: 400, web: 2048 } as const;

export const ASSET_STATUSES = ['processing', 'ready', 'failed'] as const;
export type AssetStatus = (typeof ASSET_STATUSES)[number];

export const FIXITY_RESULTS = ['ok', 'mismatch', 'missing'] as const;
export type FixityResult = (typeof FIXITY_RESULTS)[number];

/** Labels for the view picker and captions. */
export const ASSET_VIEW_LABELS: Record<AssetView, string> = {
  recto: 'Recto',
  verso: 'Verso',
  detail: 'Detail',
  raking: 'Raking light',
  ultraviolet: 'Ultraviolet',
  reference: 'Reference target',
};
