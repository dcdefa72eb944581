import type { PrintListResponse } from '@shared/types/catalogue';
import { api, ApiError } from './api-client';

/** Accession numbers typed or scanned one a line (or separated by commas or spaces). */
export const accessionNumbersIn = (text: string): string[] => [
  ...new Set(text.split(/[\s,;]+/).filter(Boolean)),
];

/**
 * The print ids of accession numbers, each looked up through search (an accession number
 * stays one word there); a number no live print carries is named in the error.
 */
export async function printIdsOf(numbers: readonly string[]): Promise<number[]> {
  const found = await Promise.all(
    numbers.map(async (number) => {
      const page = await api<PrintListResponse>('/prints', {
        query: { q: number, pageSize: 20 },
      });
      return page.items.find((item) => item.accessionNumber === number)?.id ?? null;
    }),
  );
  const missing = numbers.filter((_number, index) => found[index] === null);
  if (missing.length) {
    throw new ApiError(422, 'Invalid input', `No print numbered ${missing.join(', ')}.`);
  }
  return found as number[];
}
