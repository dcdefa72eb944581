import { eightByTenEquivalents } from './sheets';

/** A print that went through a fixer bath. */
export interface BathSheet {
  printId: number;
  /** The earliest day the print can have been made; undated prints count last. */
  madeFrom: string | null;
  sheetWidthMm: number | null;
  sheetHeightMm: number | null;
}

/**
 * Sheets (8×10 in equivalents) through one bath up to and including each print, taking the
 * prints in the order they were made (undated last, then by id). Prints fixed twice in
 * the same bath count twice.
 */
export function sheetsThroughBath(sheets: readonly BathSheet[]): Map<number, number> {
  const ordered = [...sheets].sort(
    (a, b) => (a.madeFrom ?? '9999').localeCompare(b.madeFrom ?? '9999') || a.printId - b.printId,
  );
  const through = new Map<number, number>();
  let total = 0;
  for (const sheet of ordered) {
    total += eightByTenEquivalents(sheet.sheetWidthMm, sheet.sheetHeightMm);
    through.set(sheet.printId, total);
  }
  return through;
}

/** Sheets a bath of `volumeMl` fixes at `sheetsPerLitre`; null when the volume is unknown. */
export function bathCapacity(volumeMl: number | null, sheetsPerLitre: number): number | null {
  return volumeMl ? (volumeMl / 1000) * sheetsPerLitre : null;
}
