import { signedFixed } from '@shared/domain/tone/numbers';
import { patchName } from '@shared/domain/tone/patches';

/** A signed number with a true minus sign, as the reasons print them. */
export function signed(value: number, digits = 1): string {
  return signedFixed(value, digits);
}

/** "deepest shadow (dmax)" for standard patches, the name itself for custom spots. */
export function patchLabel(patch: string): string {
  const name = patchName(patch);
  return name === patch ? patch : `${name} (${patch})`;
}

export const today = () => new Date().toISOString().slice(0, 10);
