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
import {
  presentLocation,
  presentNegative,
  presentPaper,
  presentSolutionBatch,
} from '../presenters/reference';
import { refreshFixerRisk } from '../services/chemistry/fixer-risk';
import {
  allLocationPaths,
  checkBatchKind,
  checkLocationParent,
  referenceStores,
} from '../services/reference/reference-stores';
import { referenceRouter } from './reference-router';

export const papersRouter = (ctx: AppContext) =>
  referenceRouter(ctx, {
    entity: 'paper',
    label: 'paper',
    store: referenceStores.paper,
    createSchema: PaperSchema,
    updateSchema: PaperUpdateSchema,
    readAbility: 'catalogue:read',
    present: async (papers) => papers.map(presentPaper),
    shownOnPrints: 'paper',
  });

export const negativesRouter = (ctx: AppContext) =>
  referenceRouter(ctx, {
    entity: 'negative',
    label: 'negative',
    store: referenceStores.negative,
    createSchema: NegativeSchema,
    updateSchema: NegativeUpdateSchema,
    readAbility: 'catalogue:read',
    present: async (negatives) => negatives.map(presentNegative),
    shownOnPrints: 'negative',
  });

export const solutionBatchesRouter = (ctx: AppContext) =>
  referenceRouter(ctx, {
    entity: 'solution-batch',
    label: 'solution batch',
    store: referenceStores.batch,
    createSchema: SolutionBatchSchema,
    updateSchema: SolutionBatchSchema.partial().strict(),
    readAbility: 'catalogue:read',
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
    store: referenceStores.location,
    createSchema: LocationSchema,
    updateSchema: LocationUpdateSchema,
    readAbility: 'locations:read',
    present: async (locations, transaction) => {
      const paths = await allLocationPaths(transaction);
      return locations.map((location) =>
        presentLocation(location, paths.get(location.id) ?? location.name),
      );
    },
    check: checkLocationParent,
    shownOnPrints: 'location',
  });
