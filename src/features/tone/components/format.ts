import { patchName } from '@shared/domain/tone/patches';

/** A signed number with a true minus sign, as the reasons print them. */
export function signed(value: number, digits = 1): string {
  const text = Math.abs(value).toFixed(digits);
  if (Number(text) === 0) return text;
  return `${value > 0 ? '+' : '−'}${text}`;
}

/** "deepest shadow (dmax)" for standard patches, the name itself for custom spots. */
export function patchLabel(patch: string): string {
  const name = patchName(patch);
  return name === patch ? patch : `${name} (${patch})`;
}

export const today = () => new Date().toISOString().slice(0, 10);
