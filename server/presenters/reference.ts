import type {
  LocationView,
  NegativeView,
  PaperView,
  SolutionBatchView,
} from '../../shared/types/catalogue';
import type { Location, Negative, Paper, SolutionBatch } from '../models';

export function presentPaper(paper: Paper): PaperView {
  return {
    id: paper.id,
    name: paper.name,
    manufacturer: paper.manufacturer,
    fibre: paper.fibre,
    weightGsm: paper.weightGsm,
    surface: paper.surface,
    sizing: paper.sizing,
    notes: paper.notes,
  };
}

export function presentNegative(negative: Negative): NegativeView {
  return {
    id: negative.id,
    code: negative.code,
    kind: negative.kind,
    format: negative.format,
    subject: negative.subject,
    densityRange: negative.densityRange,
    notes: negative.notes,
  };
}

export function presentLocation(location: Location, path: string): LocationView {
  return {
    id: location.id,
    code: location.code,
    name: location.name,
    parentId: location.parentId,
    path,
    notes: location.notes,
  };
}

export function presentSolutionBatch(batch: SolutionBatch): SolutionBatchView {
  return {
    id: batch.id,
    code: batch.code,
    kind: batch.kind,
    chemical: batch.chemical,
    concentrationPercent: batch.concentrationPercent,
    volumeMl: batch.volumeMl,
    madeOn: batch.madeOn,
    madeBy: batch.madeBy,
    notes: batch.notes,
    exhaustedOn: batch.exhaustedOn,
  };
}
