import type { FixityCheckView } from '../../shared/types/asset';
import type { FixityCheck } from '../models';

export function presentFixityCheck(check: FixityCheck): FixityCheckView {
  return {
    id: check.id,
    status: check.status,
    checked: check.checked,
    total: check.total,
    mismatches: check.mismatches,
    missing: check.missing,
    startedAt: check.createdAt.toISOString(),
    finishedAt: check.finishedAt ? check.finishedAt.toISOString() : null,
  };
}
