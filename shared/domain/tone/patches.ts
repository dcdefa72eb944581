/** The four standard patches; conservators may add named spots of their own. */
export const STANDARD_PATCHES = ['dmax', 'mid', 'highlight', 'dmin'] as const;

const PATCH_NAMES: Record<string, string> = {
  dmax: 'deepest shadow',
  mid: 'midtone',
  highlight: 'highlight',
  dmin: 'bare paper',
};

/** The plain name of a patch for reasons and tables. */
export const patchName = (patch: string): string => PATCH_NAMES[patch] ?? patch;

/** Patches whose loss of density is fading. */
export const SHADOW_PATCHES: ReadonlySet<string> = new Set(['dmax', 'mid']);
/** Patches whose loss of lightness is darkening and gain of b* is yellowing. */
export const LIGHT_PATCHES: ReadonlySet<string> = new Set(['dmin', 'highlight']);
