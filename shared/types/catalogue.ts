import type { AssetRecord } from './asset';
import type { StoredRiskReason } from '../domain/print-derived';
import type { ToneFlag } from '../domain/tone/status';
import type { Ability, Role } from '../domain/roles';
import type {
  BatchKind,
  NegativeKind,
  PrintStatus,
  Process,
  Stage,
  ToneStatus,
} from '../domain/vocabulary';
import type { RegistrarView } from './registrar';

export interface PaperView {
  id: number;
  name: string;
  manufacturer: string | null;
  fibre: string | null;
  weightGsm: number | null;
  surface: string | null;
  sizing: string | null;
  notes: string | null;
}

export interface NegativeView {
  id: number;
  code: string;
  kind: NegativeKind;
  format: string | null;
  subject: string | null;
  densityRange: number | null;
  notes: string | null;
}

export interface LocationView {
  id: number;
  code: string;
  name: string;
  parentId: number | null;
  /** "Store room > Cabinet 2 > Drawer 3", root first. */
  path: string;
  notes: string | null;
}

export interface SolutionBatchView {
  id: number;
  code: string;
  kind: BatchKind;
  chemical: string;
  concentrationPercent: number | null;
  volumeMl: number | null;
  madeOn: string | null;
  madeBy: string | null;
  notes: string | null;
  exhaustedOn: string | null;
}

export interface ProcessingStepView {
  position: number;
  stage: Stage;
  chemical: string | null;
  concentrationPercent: number | null;
  solutionBatch: { id: number; code: string } | null;
  method: string | null;
  coats: number | null;
  minutes: number | null;
  temperatureC: number | null;
  lightSource: string | null;
  notes: string | null;
}

export interface ToneSummary {
  status: ToneStatus;
  flags: ToneFlag[];
  nextCheckDue: string | null;
}

/** A row of the prints list. */
export interface PrintListItem {
  id: number;
  accessionNumber: string;
  title: string;
  maker: string | null;
  madeOn: string | null;
  process: Process;
  paper: { id: number; name: string } | null;
  fixingMinutes: number | null;
  washingMinutes: number | null;
  toneStatus: ToneStatus;
  processingRisk: boolean;
  status: PrintStatus;
  /** The recto's thumbnail, or null when the print has no recto image. */
  thumbnailUrl: string | null;
}

export interface PrintView extends PrintListItem, RegistrarView {
  negative: { id: number; code: string; kind: NegativeKind; format: string | null } | null;
  /** Omitted for viewers. */
  location?: { id: number; code: string; path: string } | null;
  imageWidthMm: number | null;
  imageHeightMm: number | null;
  sheetWidthMm: number | null;
  sheetHeightMm: number | null;
  edition: string | null;
  description: string | null;
  tags: string[];
  riskReasons: StoredRiskReason[];
  processing: ProcessingStepView[];
  assets: AssetRecord[];
  tone: ToneSummary;
  createdAt: string;
  updatedAt: string;
  deletedAt: string | null;
  /** What the caller may do with this record, so the client need not repeat role rules. */
  can: { edit: boolean; editCuratorial: boolean; delete: boolean };
}

export interface Facet<K extends string | number> {
  value: K;
  count: number;
}

/** Matches whose fixing (washing) minutes fall in [from, to); `to` null: no upper end. */
export interface MinuteBand {
  from: number;
  to: number | null;
  count: number;
}

export interface PrintListResponse {
  items: PrintListItem[];
  total: number;
  page: number;
  pageSize: number;
  facets: {
    process: Facet<Process>[];
    paperId: Facet<number>[];
    toneStatus: Facet<ToneStatus>[];
    fixingBands: MinuteBand[];
    washingBands: MinuteBand[];
    /** RightsStatements.org URIs. */
    rightsStatement: Facet<string>[];
  };
  /** Indexed words the query matched (already normalised), for highlighting. */
  matchedWords: string[];
}

export interface SessionUser {
  id: number;
  email: string;
  name: string;
  role: Role;
}

export interface SessionResponse {
  user: SessionUser;
  csrfToken: string;
  abilities: Ability[];
  demo: boolean;
}

export interface AuditEventView {
  at: string;
  /** `name` beside the contract's id and e-mail: people read names, as everywhere else. */
  user: { id: number; email: string; name: string } | null;
  action: string;
  entity: string;
  entityId: number;
  before: unknown;
  after: unknown;
}

export interface SavedSearchView {
  id: number;
  name: string;
  /** The query string of `GET /api/prints`. */
  query: string;
}

export interface ChecklistSummary {
  id: number;
  name: string;
  printIds: number[];
  updatedAt: string;
}

/** A print on a checklist: its list row and the sizes a loan or exhibition list needs. */
export interface ChecklistItem extends PrintListItem {
  imageWidthMm: number | null;
  imageHeightMm: number | null;
  sheetWidthMm: number | null;
  sheetHeightMm: number | null;
}

/** A checklist with its prints, in the checklist's order. */
export interface ChecklistView extends ChecklistSummary {
  items: ChecklistItem[];
}
