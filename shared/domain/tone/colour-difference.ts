import { differenceCie76, differenceCie94, differenceCiede2000 } from 'culori';

/** A measured CIELAB value, as the instrument gave it (D50/2° in this product). */
export interface Lab {
  L: number;
  a: number;
  b: number;
}

export interface LabDifference {
  dL: number;
  da: number;
  db: number;
  dE76: number;
  dE94: number;
  dE00: number;
}

/*
 * culori's difference functions convert both inputs to its `lab65` mode first. A colour
 * tagged `lab` (D50) would be adapted D50 → D65 on the way and ΔE00 would drift by up to
 * 0.6 on published test data. Tagging the measured values `lab65` makes culori's converter
 * return them untouched, so the numbers are compared exactly as measured, whatever
 * illuminant they were measured under (tests/shared/domain/tone/colour-difference.test.ts
 * proves it on Sharma, Wu and Dalal 2005).
 */
const asGiven = (lab: Lab) => ({ mode: 'lab65' as const, l: lab.L, a: lab.a, b: lab.b });

const cie76 = differenceCie76();
// Graphic-arts weights of CIE 116-1995: kL = 1, K1 = 0.045, K2 = 0.015.
const cie94 = differenceCie94(1, 0.045, 0.015);
const ciede2000 = differenceCiede2000(1, 1, 1);

/** ΔE*ab (1976) between a reference and a sample. */
export const deltaE76 = (reference: Lab, sample: Lab): number =>
  cie76(asGiven(reference), asGiven(sample));

/** ΔE*94 (graphic arts); the reference's chroma weights the sample, as CIE 116 defines. */
export const deltaE94 = (reference: Lab, sample: Lab): number =>
  cie94(asGiven(reference), asGiven(sample));

/** ΔE00 (CIEDE2000, kL = kC = kH = 1). */
export const deltaE00 = (reference: Lab, sample: Lab): number =>
  ciede2000(asGiven(reference), asGiven(sample));

/** Every difference of a sample against its reference; deltas are sample − reference. */
export function labDifference(reference: Lab, sample: Lab): LabDifference {
  return {
    dL: sample.L - reference.L,
    da: sample.a - reference.a,
    db: sample.b - reference.b,
    dE76: deltaE76(reference, sample),
    dE94: deltaE94(reference, sample),
    dE00: deltaE00(reference, sample),
  };
}
