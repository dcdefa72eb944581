import { roleCan, type Role } from '../../shared/domain/roles';
import { rightsStatementByUri } from '../../shared/domain/registrar/rights-statements';
import type { SourceKind } from '../../shared/domain/registrar/vocabulary';
import type {
  RegistrarView,
  SourceView,
  StoredAcquisition,
  StoredMark,
  StoredProvenanceLink,
  StoredRights,
} from '../../shared/types/registrar';

export interface PresentableRegistrar {
  sourceId: number | null;
  acquisition: StoredAcquisition | null;
  provenance: StoredProvenanceLink[] | null;
  rightsStatement: string | null;
  rights: StoredRights | null;
  marks: StoredMark[] | null;
  source?: { id: number; name: string; kind: SourceKind } | null;
}

/**
 * The registrar's part of a print for the given role: the credit line, the chain of
 * owners, the rights and the marks are for everyone; the price paid and marks kept
 * private only for archivists and admins (issue 19). Sources' contacts are never part of
 * a print's answer (they are read at `/api/sources`).
 */
export function presentRegistrar(print: PresentableRegistrar, role: Role): RegistrarView {
  const confidential = roleCan(role, 'registrar:confidential');
  const stored = print.acquisition;
  const acquisition =
    stored && print.sourceId !== null
      ? {
          method: stored.method,
          sourceId: print.sourceId,
          source: print.source
            ? { id: print.source.id, name: print.source.name, kind: print.source.kind }
            : null,
          acquiredOn: stored.acquiredOn,
          reference: stored.reference,
          creditLine: stored.creditLine,
          ...(confidential ? { price: stored.price } : {}),
        }
      : null;
  const statement = print.rightsStatement ? rightsStatementByUri(print.rightsStatement) : null;
  return {
    acquisition,
    provenance: (print.provenance ?? []).map((link) => ({
      owner: link.owner,
      from: link.from,
      to: link.to,
      evidence: link.evidence,
    })),
    rights: statement
      ? {
          statement: statement.uri,
          label: statement.label,
          holder: print.rights?.holder ?? null,
          note: print.rights?.note ?? null,
        }
      : null,
    marks: (print.marks ?? [])
      .filter((mark) => confidential || !mark.private)
      .map((mark) => ({
        position: mark.position,
        kind: mark.kind,
        transcription: mark.transcription,
        reading: mark.reading,
        assetId: mark.assetId,
        area: mark.area,
        private: mark.private,
      })),
  };
}

/** A source as `/api/sources` answers: its contact only for archivists and admins. */
export function presentSource(
  source: { id: number; name: string; kind: SourceKind; contact: string | null },
  prints: number,
  role: Role,
): SourceView {
  return {
    id: source.id,
    name: source.name,
    kind: source.kind,
    ...(roleCan(role, 'registrar:confidential') ? { contact: source.contact } : {}),
    prints,
  };
}
