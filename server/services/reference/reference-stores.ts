import type { Transaction } from 'sequelize';
import { batchKindProblem } from '../../../shared/domain/chemistry/chemicals';
import type { BatchKind } from '../../../shared/domain/vocabulary';
import { problems } from '../../middleware/problem';
import {
  locationStore,
  negativeStore,
  paperStore,
  solutionBatchStore,
} from '../../repositories/reference-repository';
import { descendantIds, locationPaths } from '../locations/location-paths';

export type { ReferenceStore } from '../../repositories/reference-repository';

/** The lists the catalogue links to, each through its repository. */
export const referenceStores = {
  paper: paperStore,
  negative: negativeStore,
  batch: solutionBatchStore,
  location: locationStore,
};

/** Every place's full name (root first), for presenting places. */
export async function allLocationPaths(transaction?: Transaction): Promise<Map<number, string>> {
  return locationPaths(await locationStore.list(transaction));
}

/** A place's parent must exist and must not be the place itself or below it. */
export async function checkLocationParent(
  input: Record<string, unknown>,
  id: number | null,
  transaction: Transaction,
): Promise<void> {
  const parentId = input.parentId;
  if (typeof parentId !== 'number') return;
  if (!(await locationStore.find(parentId, transaction))) {
    throw problems.invalid([{ path: 'parentId', message: `No place with id ${parentId}` }]);
  }
  if (id !== null && (await descendantIds(id, transaction)).has(parentId)) {
    throw problems.invalid([{ path: 'parentId', message: 'A place cannot sit inside itself' }]);
  }
}

/** A batch's kind must fit its chemical: sodium thiosulfate makes a fixer, never a sensitiser. */
export async function checkBatchKind(
  input: Record<string, unknown>,
  id: number | null,
  transaction: Transaction,
): Promise<void> {
  if (input.kind === undefined && input.chemical === undefined) return;
  const stored = id === null ? null : await solutionBatchStore.find(id, transaction);
  const kind = (input.kind ?? stored?.kind) as BatchKind | undefined;
  const chemical = (input.chemical ?? stored?.chemical) as string | undefined;
  if (!kind || !chemical) return;
  const problem = batchKindProblem(kind, chemical);
  if (problem) throw problems.invalid([{ path: 'kind', message: problem }]);
}
