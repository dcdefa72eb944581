import type { StoredMark } from '../../../shared/types/registrar';

/** The marks with any region on this image dropped (the mark itself stays). */
export function marksWithoutImage(marks: readonly StoredMark[], assetId: number): StoredMark[] {
  return marks.map((mark) =>
    mark.assetId === assetId ? { ...mark, assetId: null, area: null } : mark,
  );
}
