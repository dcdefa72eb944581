import type {
  AcquisitionMethod,
  MarkKind,
  MarkPosition,
  SourceKind,
} from '../domain/registrar/vocabulary';
import type { ImageArea } from '../schemas/condition';

/** How a print came in, as stored beside its `source_id` column. */
export interface StoredAcquisition {
  method: AcquisitionMethod;
  acquiredOn: string;
  reference: string | null;
  creditLine: string | null;
  price: number | null;
}

export interface StoredProvenanceLink {
  owner: string;
  from: string | null;
  to: string | null;
  evidence: string | null;
}

export interface StoredRights {
  holder: string | null;
  note: string | null;
}

export interface StoredMark {
  position: MarkPosition;
  kind: MarkKind;
  transcription: string;
  reading: string | null;
  assetId: number | null;
  area: ImageArea | null;
  private: boolean;
}

export interface SourceRef {
  id: number;
  name: string;
  kind: SourceKind;
}

/** A source as `/api/sources` answers; `contact` only for archivists and admins. */
export interface SourceView extends SourceRef {
  contact?: string | null;
  /** How many (live) prints came from it. */
  prints: number;
}

/** `price` only for archivists and admins. */
export interface AcquisitionView {
  method: AcquisitionMethod;
  sourceId: number;
  source: SourceRef | null;
  acquiredOn: string;
  reference: string | null;
  creditLine: string | null;
  price?: number | null;
}

export interface RightsView {
  statement: string;
  /** The statement's English label as RightsStatements.org publishes it. */
  label: string;
  holder: string | null;
  note: string | null;
}

/** The registrar's part of a print's answer; private marks only for archivists and admins. */
export interface RegistrarView {
  acquisition: AcquisitionView | null;
  provenance: StoredProvenanceLink[];
  rights: RightsView | null;
  marks: StoredMark[];
}
