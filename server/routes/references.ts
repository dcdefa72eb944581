import type { Transaction } from 'sequelize';
import { batchKindProblem } from '../../shared/domain/chemistry/chemicals';
import type { BatchKind } from '../../shared/domain/vocabulary';
import {
  LocationSchema,
  LocationUpdateSchema,
  NegativeSchema,
  NegativeUpdateSchema,
  PaperSchema,
  PaperUpdateSchema,
  SolutionBatchSchema,
} from '../../shared/schemas/reference';
import type { AppContext } from '../context';
import { problems } from '../middleware/problem';
import { Location, Negative, Paper, SolutionBatch } from '../models';
import {
  presentLocation,
  presentNegative,
  presentPaper,
  presentSolutionBatch,
} from '../presenters/reference';
import { refreshFixerRisk } from '../services/chemistry/fixer-risk';
import { descendantIds, locationPaths } from '../services/locations/location-paths';
import { referenceRouter } from './reference-router';

export const papersRouter = (ctx: AppContext) =>
  referenceRouter(ctx, {
    entity: 'paper',
    label: 'paper',
    model: Paper,
    createSchema: PaperSchema,
    updateSchema: PaperUpdateSchema,
    readAbility: 'catalogue:read',
    order: [['name', 'ASC']],
    present: async (papers) => papers.map(presentPaper),
    shownOnPrints: 'paper',
  });

export const negativesRouter = (ctx: AppContext) =>
  referenceRouter(ctx, {
    entity: 'negative',
    label: 'negative',
    model: Negative,
    createSchema: NegativeSchema,
    updateSchema: NegativeUpdateSchema,
    readAbility: 'catalogue:read',
    order: [['code', 'ASC']],
    present: async (negatives) => negatives.map(presentNegative),
    shownOnPrints: 'negative',
  });

export const solutionBatchesRouter = (ctx: AppContext) =>
  referenceRouter(ctx, {
    entity: 'solution-batch',
    label: 'solution batch',
    model: SolutionBatch,
    createSchema: SolutionBatchSchema,
    updateSchema: SolutionBatchSchema.partial().strict(),
    readAbility: 'catalogue:read',
    order: [['code', 'ASC']],
    present: async (batches) => batches.map(presentSolutionBatch),
    check: checkBatchKind,
    // A new exhausted date or volume changes the fixer rules of the prints made with it.
    afterChangeInTransaction: (id, transaction) => refreshFixerRisk([id], transaction),
    shownOnPrints: 'batch',
  });

/** Places are never shown to viewers: knowing where a print sleeps is a security matter. */
export const locationsRouter = (ctx: AppContext) =>
  referenceRouter(ctx, {
    entity: 'location',
    label: 'place',
    model: Location,
    createSchema: LocationSchema,
    updateSchema: LocationUpdateSchema,
    readAbility: 'locations:read',
    order: [['code', 'ASC']],
    present: async (locations, transaction) => {
      const paths = locationPaths(await Location.findAll({ transaction }));
      return locations.map((location) =>
        presentLocation(location, paths.get(location.id) ?? location.name),
      );
    },
    check: checkLocationParent,
    shownOnPrints: 'location',
  });

async function checkLocationParent(
  input: Record<string, unknown>,
  id: number | null,
  transaction: Transaction,
): Promise<void> {
  const parentId = input.parentId;
  if (typeof parentId !== 'number') return;
  if (!(await Location.findByPk(parentId, { transaction }))) {
    throw problems.invalid([{ path: 'parentId', message: `No place with id ${parentId}` }]);
  }
  if (id !== null && (await descendantIds(id, transaction)).has(parentId)) {
    throw problems.invalid([{ path: 'parentId', message: 'A place cannot sit inside itself' }]);
  }
}

/** A batch's kind must fit its chemical: sodium thiosulfate makes a fixer, never a sensitiser. */
async function checkBatchKind(
  input: Record<string, unknown>,
  id: number | null,
  transaction: Transaction,
): Promise<void> {
  if (input.kind === undefined && input.chemical === undefined) return;
  const stored = id === null ? null : await SolutionBatch.findByPk(id, { transaction });
  const kind = (input.kind ?? stored?.kind) as BatchKind | undefined;
  const chemical = (input.chemical ?? stored?.chemical) as string | undefined;
  if (!kind || !chemical) return;
  const problem = batchKindProblem(kind, chemical);
  if (problem) throw problems.invalid([{ path: 'kind', message: problem }]);
}
