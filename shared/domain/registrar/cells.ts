import { MARK_KINDS, MARK_POSITIONS, type MarkKind, type MarkPosition } from './vocabulary';

/**
 * The registrar's lists as one spreadsheet cell each, written by the CSV export and read
 * by the CSV import, so a file exported and imported again keeps them:
 *
 * - earlier owners, oldest first: `Edith Ollis (1931 to 1990s); A. Dealer (from 1995)`
 * - marks: `verso, pencil inscription: Lerwick, Aug. 1907 | mount, blind stamp: J. T.`
 */
export interface OwnerCell {
  owner: string;
  from: string | null;
  to: string | null;
}

export interface MarkCell {
  position: MarkPosition;
  kind: MarkKind;
  transcription: string;
}

const OWNER_SEPARATOR = '; ';
const MARK_SEPARATOR = ' | ';

function ownerDates(link: OwnerCell): string {
  if (link.from && link.to) return ` (${link.from} to ${link.to})`;
  if (link.from) return ` (from ${link.from})`;
  if (link.to) return ` (until ${link.to})`;
  return '';
}

export function formatOwners(links: readonly OwnerCell[]): string {
  return links.map((link) => `${link.owner}${ownerDates(link)}`).join(OWNER_SEPARATOR);
}

/** Each owner of the cell with its dates as written; an empty cell is no owners. */
export function parseOwners(cell: string): OwnerCell[] {
  return cell
    .split(';')
    .map((part) => part.trim())
    .filter(Boolean)
    .map((part) => {
      const match = part.match(/^(.*?)\s*\(([^()]*)\)$/);
      if (!match) return { owner: part, from: null, to: null };
      const owner = match[1]!.trim();
      const dates = match[2]!.trim();
      const range = dates.match(/^(.+?)\s+to\s+(.+)$/i);
      if (range) return { owner, from: range[1]!.trim(), to: range[2]!.trim() };
      const from = dates.match(/^from\s+(.+)$/i);
      if (from) return { owner, from: from[1]!.trim(), to: null };
      const until = dates.match(/^until\s+(.+)$/i);
      if (until) return { owner, from: null, to: until[1]!.trim() };
      return { owner, from: dates, to: dates };
    });
}

export function formatMarks(marks: readonly MarkCell[]): string {
  return marks
    .map((mark) => `${mark.position}, ${mark.kind}: ${mark.transcription}`)
    .join(MARK_SEPARATOR);
}

export const MARKS_CELL_HINT =
  'Write each mark as “verso, pencil inscription: text”, marks separated by “ | ”';

/** The marks of a cell, or the number (from 1) of the first one that cannot be read. */
export function parseMarks(cell: string): { marks: MarkCell[] } | { unreadable: number } {
  const marks: MarkCell[] = [];
  const parts = cell
    .split(MARK_SEPARATOR.trim())
    .map((part) => part.trim())
    .filter(Boolean);
  for (const [index, part] of parts.entries()) {
    const match = part.match(/^([^,:]+),\s*([^:]+):\s*(.+)$/);
    const position = MARK_POSITIONS.find((p) => p === match?.[1]?.trim().toLowerCase());
    const kind = MARK_KINDS.find((k) => k === match?.[2]?.trim().toLowerCase());
    if (!match || !position || !kind) return { unreadable: index + 1 };
    marks.push({ position, kind, transcription: match[3]!.trim() });
  }
  return { marks };
}
