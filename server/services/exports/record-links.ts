/** Links a record's linked-data document points to once the print has images. */
export interface RecordLinks {
  imageUrl: string | null;
  manifestUrl: string | null;
}

/**
 * The recto image and IIIF manifest of each print, for the JSON-LD documents. Until the
 * images area is merged there are no assets, so no links.
 */
export async function recordLinksOf(
  printIds: readonly number[],
): Promise<Map<number, RecordLinks>> {
  return new Map(printIds.map((id) => [id, { imageUrl: null, manifestUrl: null }]));
}
