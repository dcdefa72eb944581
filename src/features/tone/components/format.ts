import { patchName } from '@shared/domain/tone/patches';

/** "deepest shadow (dmax)" for standard patches, the name itself for custom spots. */
export function patchLabel(patch: string): string {
  const name = patchName(patch);
  return name === patch ? patch : `${name} (${patch})`;
}

/** A typed reading (a decimal comma allowed); empty or not a number is NaN, which the server refuses by field. */
export function readingNumber(text: string): number {
  return text.trim() === '' ? Number.NaN : Number(text.replace(',', '.'));
}
