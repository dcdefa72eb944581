import { labDifference, type Lab, type LabDifference } from './colour-difference';
import { densityFromLightness } from './density';

export interface Reading extends Lab {
  patch: string;
}

export interface PatchComparison extends LabDifference {
  patch: string;
  density: number;
  dDensity: number;
}

/**
 * Each reading of a check against the same patch of the baseline. Patches the baseline did
 * not measure have nothing to compare with and are left out.
 */
export function compareWithBaseline(
  baseline: readonly Reading[],
  readings: readonly Reading[],
): PatchComparison[] {
  const byPatch = new Map(baseline.map((reading) => [reading.patch, reading]));
  const result: PatchComparison[] = [];
  for (const reading of readings) {
    const reference = byPatch.get(reading.patch);
    if (!reference) continue;
    const density = densityFromLightness(reading.L);
    result.push({
      patch: reading.patch,
      ...labDifference(reference, reading),
      density,
      dDensity: density - densityFromLightness(reference.L),
    });
  }
  return result;
}
