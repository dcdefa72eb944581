import { patchName } from '@shared/domain/tone/patches';

/** "deepest shadow (dmax)" for standard patches, the name itself for custom spots. */
export function patchLabel(patch: string): string {
  const name = patchName(patch);
  return name === patch ? patch : `${name} (${patch})`;
}
