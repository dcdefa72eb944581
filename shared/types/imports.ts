/** Where an import stands; `queued` and `running` are shown with a progress bar. */
export type ImportStatus = 'queued' | 'running' | 'done' | 'failed';

export interface ImportFailure {
  /** The record's number in the file, the header being row 1 (a quoted newline does not start a row). */
  row: number;
  errors: Array<{ field: string; message: string }>;
}

export type ImportRowAction = 'create' | 'update' | 'unchanged' | 'invalid';

/** One row as a dry run sees it. */
export interface ImportPreviewRow {
  row: number;
  accessionNumber: string | null;
  title: string | null;
  action: ImportRowAction;
  errors: ImportFailure['errors'];
}

export interface ImportJobView {
  id: number;
  status: ImportStatus;
  dryRun: boolean;
  fileName: string | null;
  encoding: string | null;
  rows: number;
  processed: number;
  imported: number;
  updated: number;
  unchanged: number;
  failed: ImportFailure[];
  /** Dry runs only: the rows with what would happen to each (first rows, and every bad one). */
  preview: ImportPreviewRow[];
  error: string | null;
  createdAt: string;
  finishedAt: string | null;
}

/** What the server read from a file before mapping: its columns and a suggested mapping. */
export interface ImportInspection {
  encoding: string;
  headers: string[];
  sample: Array<Record<string, string>>;
  mapping: Record<string, string>;
  /** True when the mapping is the one saved from the last import of this layout. */
  savedMapping: boolean;
}
