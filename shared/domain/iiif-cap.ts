/**
 * The largest size a role may see through the IIIF Image API: the web size (2048 px on
 * the long side) for viewers, the full original for curators and above (contract).
 */
export function iiifSizeCap(
  width: number,
  height: number,
  longSide: number | null,
): { maxWidth: number; maxHeight: number } {
  if (longSide === null || Math.max(width, height) <= longSide) {
    return { maxWidth: width, maxHeight: height };
  }
  const scale = longSide / Math.max(width, height);
  return { maxWidth: Math.round(width * scale), maxHeight: Math.round(height * scale) };
}

/** Scale factors (1 = full resolution) whose whole-image size fits within the cap. */
export function allowedScaleFactors(
  scaleFactors: number[],
  width: number,
  height: number,
  cap: { maxWidth: number; maxHeight: number },
): number[] {
  return scaleFactors.filter(
    (factor) =>
      Math.ceil(width / factor) <= cap.maxWidth + 1 &&
      Math.ceil(height / factor) <= cap.maxHeight + 1,
  );
}
