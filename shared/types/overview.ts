import type { Role } from '../domain/roles';

/** One line of the start page: how many of something, in words, and the page that deals with it. */
export interface OverviewItem {
  kind: string;
  /** Null where there is nothing to count yet (no backup made, no fixity check run). */
  count: number | null;
  label: string;
  href: string;
}

/** `GET /api/overview`: the start page's summary for the asker's role. */
export interface OverviewResponse {
  role: Role;
  items: OverviewItem[];
}
