/** Accession numbers follow `YYYY.NNNN`: the year of accession and a running number. */
export const ACCESSION_PATTERN = /^(\d{4})\.(\d{4,})$/;

export function formatAccessionNumber(year: number, sequence: number): string {
  return `${year}.${String(sequence).padStart(4, '0')}`;
}

/** The year and running number of a default-pattern accession number, or null. */
export function parseAccessionNumber(value: string): { year: number; sequence: number } | null {
  const match = ACCESSION_PATTERN.exec(value);
  if (!match) return null;
  return { year: Number(match[1]), sequence: Number(match[2]) };
}
